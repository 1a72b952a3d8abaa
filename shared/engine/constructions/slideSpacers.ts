/**
 * Slide spacers: in a case on corner legs the side frames stand back from the legs' inner faces
 * (and their panels further still), so metal slides have nothing flat and flush with the opening
 * to screw to. A strip as thick as that step, glued and screwed down onto the web-frame runner
 * under each row, brings the mounting face out to the opening's edge; between columns a block as
 * wide as the mullion carries the slides of the drawers on both sides of it.
 */
import { assert } from '../../assert.ts';
import type { JointDraft, PartDraft } from '../assembly.ts';
import { boxBetween } from '../geometry/box.ts';
import type { Material } from '../types.ts';
import { drawerNamer } from './drawerBox.ts';
import { plainPart } from './plainPart.ts';

/**
 * Spacer height (mm): 2 in, enough to cover the cabinet member of a common ball-bearing slide
 * (about 1-3/4 in tall: from memory, approximate) with room to spare. Common practice, no
 * published source.
 */
export const SLIDE_SPACER_HEIGHT_MM = 2 * 25.4;

/** Where one spacer goes (world mm). */
export interface SlideSpacerPlacement {
  /** Row of drawers, 0 at the top. */
  row: number;
  /** The column boundary it stands at: 0 the left side, the column count the right side, a mullion between. */
  boundary: number;
  /** A side strip (its thickness the step to the legs' faces) or a block behind a mullion (as wide as it). */
  kind: 'side' | 'centre';
  x: [number, number];
  y: [number, number];
  z: [number, number];
}

/** Options for {@link slideSpacers}. */
export interface SlideSpacerOptions {
  spacers: readonly SlideSpacerPlacement[];
  material: Material;
  /** The web-frame runner each spacer is fixed to. */
  runnerUnder: (row: number, boundary: number) => PartDraft;
  /** How far exploded views move a spacer up, mm. */
  explodeMm: number;
}

/** The spacers as parts, their joints to the runners, and a look-up by row and boundary. */
export interface SlideSpacers {
  drafts: PartDraft[];
  joints: JointDraft[];
  at: (row: number, boundary: number) => PartDraft;
}

/** Builds the spacers; each grain runs front to back, along the slide and the runner under it. */
export function slideSpacers(o: SlideSpacerOptions): SlideSpacers {
  const byKey = new Map<string, PartDraft>();
  const joints: JointDraft[] = [];
  const sideNamer = drawerNamer('slide-spacer', 'Slide spacer');
  const centreNamer = drawerNamer('centre-slide-spacer', 'Centre slide spacer');
  const right = Math.max(...o.spacers.map((s) => s.boundary));
  for (const s of o.spacers) {
    const mirrored = s.kind === 'side' && s.boundary === right;
    const draft = plainPart({
      group: s.kind === 'side' ? 'slide-spacer' : 'centre-slide-spacer', member: `row-${s.row + 1}`,
      label: `${s.kind === 'side' ? 'slide spacer' : 'centre slide spacer'}, row ${s.row + 1}, ${s.kind === 'side' ? (mirrored ? 'right' : 'left') : `between columns ${s.boundary} and ${s.boundary + 1}`}`,
      role: 'runner', material: o.material, grain: 'length',
      world: boxBetween([s.x[0], s.y[0], s.z[0]], [s.x[1], s.y[1], s.z[1]]),
      axes: mirrored ? { length: '-Y', width: '+Z', thickness: '-X' } : { length: '+Y', width: '+Z', thickness: '+X' },
      explodeMm: [0, 0, o.explodeMm], name: s.kind === 'side' ? sideNamer : centreNamer,
      notes: [s.kind === 'side'
        ? 'Glued and screwed to the runner; keep glue off the side frame and panel, which must move. Its face is flush with the legs\' inner faces.'
        : 'Glued and screwed to the runner behind the mullion; both faces flush with the openings beside it.'],
    });
    byKey.set(`${s.row}:${s.boundary}`, draft);
    joints.push({
      type: 'butt-screwed', a: { draft, featureIds: [] }, b: { draft: o.runnerUnder(s.row, s.boundary), featureIds: [] }, clearanceMm: 0, glued: true, floating: false,
      note: 'Glued and screwed down into the web-frame runner: both run front to back, so long grain meets long grain.',
    });
  }
  return {
    drafts: [...byKey.values()], joints,
    at: (row, boundary) => {
      const found = byKey.get(`${row}:${boundary}`);
      assert(found, `a slide spacer in row ${row} at boundary ${boundary}`);
      return found;
    },
  };
}
