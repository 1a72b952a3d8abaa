/** One line per machining feature in a maker's words, with every number the cut needs. */
import { assertNever } from '../assert.ts';
import type { Feature } from '../engine/types.ts';
import { lengthText, type DrawingUnits } from './lengthText.ts';

const FACE_WORDS: Readonly<Record<Feature['face'], string>> = {
  'face-a': 'face A', 'face-b': 'face B', 'edge-a': 'edge A', 'edge-b': 'edge B', 'end-a': 'end A', 'end-b': 'end B',
};

/** The feature's kind in words. */
export function featureKindText(f: Feature): string {
  switch (f.type) {
    case 'groove': return 'Groove';
    case 'stopped-groove': return 'Stopped groove';
    case 'tongue': return 'Tongue';
    case 'rabbet': return 'Rabbet';
    case 'notch': return 'Notch';
    case 'recess': return 'Recess';
    case 'mortise': return 'Mortise';
    case 'dado': return 'Dado';
    case 'hole': return 'Hole';
    case 'slot': return 'Slot';
    default: return assertNever(f, 'feature');
  }
}

/** Where the feature is: the face or edge it is cut into. */
export function featureFaceText(f: Feature): string {
  return FACE_WORDS[f.face];
}

/** Every size of the cut, e.g. `1/4" wide × 3/8" deep, 1/4" from the reference edge`. */
export function featureSizeText(f: Feature, units: DrawingUnits): string {
  const t = (mm: number): string => lengthText(mm, units);
  switch (f.type) {
    case 'groove': return `${t(f.widthMm)} wide × ${t(f.depthMm)} deep, ${t(f.offsetMm)} in from the reference side, ${t(f.lengthMm)} long`;
    case 'stopped-groove': return `${t(f.widthMm)} wide × ${t(f.depthMm)} deep, ${t(f.offsetMm)} in from the reference side, from ${t(f.startMm)} to ${t(f.stopMm)} from end A`;
    case 'tongue': return `${t(f.lengthMm)} long × ${t(f.thicknessMm)} thick × ${t(f.widthMm)} wide`;
    case 'rabbet': return `${t(f.widthMm)} wide × ${t(f.depthMm)} deep, ${t(f.lengthMm)} long`;
    case 'notch': return `${t(f.lengthMm)} along the length × ${t(f.widthMm)} across × ${t(f.depthMm)} deep, corner at ${t(f.atMm[0])}, ${t(f.atMm[1])}`;
    case 'recess':
    case 'mortise': return `${t(f.lengthMm)} × ${t(f.widthMm)} × ${t(f.depthMm)} deep, corner at ${t(f.atMm[0])}, ${t(f.atMm[1])}`;
    case 'dado': return `${t(f.widthMm)} wide × ${t(f.depthMm)} deep, ${t(f.offsetMm)} from end A`;
    case 'hole': return `${t(f.diameterMm)} diameter × ${t(f.depthMm)} deep, centre at ${t(f.atMm[0])}, ${t(f.atMm[1])}`;
    case 'slot': return `${t(f.diameterMm)} wide × ${t(f.slotLengthMm)} long (along the ${f.along}), ${t(f.depthMm)} deep, centre at ${t(f.atMm[0])}, ${t(f.atMm[1])}`;
    default: return assertNever(f, 'feature');
  }
}
