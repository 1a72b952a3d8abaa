/**
 * Turns a cut drawn in the world (boxes of removed material, a tongue's solid) into a feature
 * in the part's own frame with the numbers a maker sets a machine to: width, depth, offset,
 * start and stop. The chest is easiest to reason about in world coordinates; drawings and
 * joinery tables need each feature in its part's terms.
 */
import { assert } from '../../assert.ts';
import type { Box3, Feature, FeatureType, PartFace, Vec3, WorldAxis } from '../types.ts';
import { localFaceOf, worldBoxToLocal, type AxisMap } from './placement.ts';

/** A feature drawn in world coordinates, before it is mapped into its part. */
export interface FeatureDraft {
  /** Unique among the draft's features; joints refer to it. */
  id: string;
  /**
   * The id the feature takes in its part, when it should be named in the part's own terms:
   * `{face}` becomes the local face (`tongue-{face}` → `tongue-end-a`), `{n}` the feature's
   * 1-based order along the part among those with the same template. Default: `id`.
   */
  idTemplate?: string;
  type: FeatureType;
  label: string;
  /** World direction the cut face looks toward (out of the part). */
  faceDir: WorldAxis;
  /** Removed material, world boxes (mm); the first is the one measured. */
  removed: readonly Box3[];
  /** A tongue's own solid, world box (mm). */
  tongue?: Box3;
  /** Holes and slots: shank diameter (mm); slots also their length and direction. */
  diameterMm?: number;
  slot?: { lengthMm: number; alongDir: WorldAxis };
}

const NORMAL_AXIS: Record<PartFace, 0 | 1 | 2> = {
  'end-a': 0, 'end-b': 0, 'edge-a': 1, 'edge-b': 1, 'face-a': 2, 'face-b': 2,
};

/** The two local axes in the plane of a face, by the face's normal axis. */
const IN_PLANE: Readonly<Record<0 | 1 | 2, readonly [number, number]>> = [[1, 2], [0, 2], [0, 1]];

function extent(box: Box3, axis: number): number {
  return box.max[axis]! - box.min[axis]!;
}

// The axis of 0, 1, 2 that is neither `a` nor `b`.
function third(a: number, b: number): number {
  return 3 - a - b;
}

/** Maps a world {@link FeatureDraft} into the local frame of a placed part and measures it. */
export function describeFeature(draft: FeatureDraft, size: Vec3, axes: AxisMap, positionMm: Vec3): Feature {
  const removed: Box3[] = [];
  for (const box of draft.removed) removed.push(worldBoxToLocal(box, size, axes, positionMm));
  const face = localFaceOf(axes, draft.faceDir);
  const normal = NORMAL_AXIS[face];
  // Each feature is one literal, its common fields first: a spread, or Object.assign onto a
  // shared base, is markedly slower in V8, and this runs for every cut of every part.

  if (draft.type === 'tongue') {
    if (!draft.tongue) assert(false, `tongue ${draft.id} needs its solid`);
    const tongue = worldBoxToLocal(draft.tongue!, size, axes, positionMm);
    const across = normal === 2 ? 1 : 2;
    const along = third(normal, across);
    return { id: draft.id, face, label: draft.label, removed, type: 'tongue', tongue,
      lengthMm: extent(tongue, normal),
      thicknessMm: extent(tongue, across),
      widthMm: extent(tongue, along),
    };
  }

  const main = removed[0];
  if (!main) assert(false, `feature ${draft.id} removes nothing`);
  // The axis a groove runs along is the longer of the two in the face's plane.
  const inPlane = IN_PLANE[normal];
  const along = extent(main!, inPlane[1]!) > extent(main!, inPlane[0]!) ? inPlane[1]! : inPlane[0]!;
  const across = third(normal, along);

  switch (draft.type) {
    case 'groove':
      return { id: draft.id, face, label: draft.label, removed, type: 'groove', widthMm: extent(main!, across), depthMm: extent(main!, normal), offsetMm: main!.min[across]!, lengthMm: extent(main!, along) };
    case 'stopped-groove':
      return { id: draft.id, face, label: draft.label, removed, type: 'stopped-groove', widthMm: extent(main!, across), depthMm: extent(main!, normal),
        offsetMm: main!.min[across]!, startMm: main!.min[along]!, stopMm: main!.max[along]!,
      };
    case 'dado':
      return { id: draft.id, face, label: draft.label, removed, type: 'dado', widthMm: extent(main!, across), depthMm: extent(main!, normal), offsetMm: main!.min[across]! };
    case 'rabbet': {
      // A rabbet runs along an edge or end; its depth goes into the broad face.
      const depthAxis = normal === 2 ? 1 : 2;
      const runAxis = third(normal, depthAxis);
      return { id: draft.id, face, label: draft.label, removed, type: 'rabbet', widthMm: extent(main!, normal), depthMm: extent(main!, depthAxis), lengthMm: extent(main!, runAxis) };
    }
    case 'notch':
      return { id: draft.id, face, label: draft.label, removed, type: 'notch', lengthMm: extent(main!, 0), widthMm: extent(main!, 1), depthMm: extent(main!, 2), atMm: [main!.min[0], main!.min[1]] };
    case 'recess':
    case 'mortise':
      return { id: draft.id, face, label: draft.label, removed, type: draft.type, lengthMm: extent(main!, inPlane[0]!), widthMm: extent(main!, inPlane[1]!),
        depthMm: extent(main!, normal), atMm: [main!.min[inPlane[0]!]!, main!.min[inPlane[1]!]!],
      };
    case 'hole': {
      assert(draft.diameterMm !== undefined, `hole ${draft.id} needs a diameter`);
      const centre: [number, number] = [(main!.min[inPlane[0]!]! + main!.max[inPlane[0]!]!) / 2, (main!.min[inPlane[1]!]! + main!.max[inPlane[1]!]!) / 2];
      return { id: draft.id, face, label: draft.label, removed, type: 'hole', diameterMm: draft.diameterMm, depthMm: extent(main!, normal), atMm: centre };
    }
    case 'slot': {
      assert(draft.diameterMm !== undefined && draft.slot, `slot ${draft.id} needs a diameter and a length`);
      const runFace = localFaceOf(axes, draft.slot.alongDir);
      const centre: [number, number] = [(main!.min[inPlane[0]!]! + main!.max[inPlane[0]!]!) / 2, (main!.min[inPlane[1]!]! + main!.max[inPlane[1]!]!) / 2];
      return { id: draft.id, face, label: draft.label, removed, type: 'slot', diameterMm: draft.diameterMm, slotLengthMm: draft.slot.lengthMm, depthMm: extent(main!, normal),
        atMm: centre, along: NORMAL_AXIS[runFace] === 0 ? 'length' : 'width',
      };
    }
  }
}
