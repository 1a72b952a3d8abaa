/**
 * A solid-wood face frame on the front of a carcass: two stiles the full height, rails across
 * between them above, between and below the rows of openings, and mullions between the columns
 * of each row. Rails and mullions are pocket-screwed and glued; the frame is glued to the
 * carcass's front edges (long grain to sheet edge, both stable across the frame's width).
 */
import type { JointDraft, PartDraft } from '../assembly.ts';
import { boxBetween } from '../geometry/box.ts';
import type { Box3, Material } from '../types.ts';
import { drawerNamer } from './drawerBox.ts';
import { fixedName, plainPart } from './plainPart.ts';

/** Options for {@link faceFrame}; world coordinates, mm. */
export interface FaceFrameOptions {
  /** The frame's outer box: full width and height of the carcass front, its thickness in Y. */
  box: Box3;
  material: Material;
  stileWidthMm: number;
  /** Opening heights, top row first: each row's [bottom, top] in world Z. */
  rows: readonly (readonly [number, number])[];
  /** Opening columns, left first: each column's [left, right] in world X; the same in every row. */
  columns: readonly (readonly [number, number])[];
  explodeMm: number;
}

/** The frame's parts and joints. */
export interface FaceFrame {
  drafts: PartDraft[];
  joints: JointDraft[];
  stiles: PartDraft[];
  rails: PartDraft[];
  mullions: PartDraft[];
}

/** Builds the face frame for a grid of openings. */
export function faceFrame(o: FaceFrameOptions): FaceFrame {
  const [x0, y0, z0] = o.box.min;
  const [x1, y1, z1] = o.box.max;
  const sw = o.stileWidthMm;
  const out = [0, -o.explodeMm, 0] as const;
  const stile = (which: 'left' | 'right') => plainPart({
    group: 'face-frame/stile', member: which, label: `${which} face-frame stile`, role: 'face-frame', material: o.material, grain: 'length',
    world: which === 'left' ? boxBetween([x0, y0, z0], [x0 + sw, y1, z1]) : boxBetween([x1 - sw, y0, z0], [x1, y1, z1]),
    axes: which === 'left' ? { length: '+Z', width: '+X', thickness: '+Y' } : { length: '+Z', width: '-X', thickness: '-Y' },
    explodeMm: out, name: fixedName('face-frame-stile', 'Face-frame stile'),
  });
  const stiles = [stile('left'), stile('right')];

  // Rails: above the top row, between rows, below the bottom row.
  const rows = o.rows;
  const bands: { which: 'top' | 'mid' | 'bottom'; z: [number, number] }[] = [
    { which: 'top', z: [rows[0]![1], z1] },
    ...rows.slice(1).map((row, i) => ({ which: 'mid' as const, z: [row[1], rows[i]![0]] as [number, number] })),
    { which: 'bottom', z: [z0, rows[rows.length - 1]![0]] },
  ];
  const railName = { top: fixedName('face-frame-top-rail', 'Face-frame top rail'), mid: fixedName('face-frame-rail', 'Face-frame rail'), bottom: fixedName('face-frame-bottom-rail', 'Face-frame bottom rail') };
  const rails = bands.map((b, i) => plainPart({
    group: `face-frame/${b.which}-rail`, member: `rail-${i}`, label: `face-frame ${b.which} rail${b.which === 'mid' ? ` ${i}` : ''}`, role: 'face-frame', material: o.material, grain: 'length',
    world: boxBetween([x0 + sw, y0, b.z[0]], [x1 - sw, y1, b.z[1]]), axes: { length: '+X', width: '+Z', thickness: '-Y' },
    explodeMm: out, name: railName[b.which],
  }));

  const mullions = rows.flatMap((row, r) => o.columns.slice(1).map((col, c) => plainPart({
    group: 'face-frame/mullion', member: `row-${r + 1}`, label: `face-frame mullion, row ${r + 1}`, role: 'face-frame', material: o.material, grain: 'length',
    world: boxBetween([o.columns[c]![1], y0, row[0]], [col[0], y1, row[1]]), axes: { length: '+Z', width: '+X', thickness: '+Y' },
    explodeMm: out, name: drawerNamer('face-frame-mullion', 'Face-frame mullion'),
  })));

  const joints: JointDraft[] = [];
  const pocket = (a: PartDraft, b: PartDraft, note: string) => joints.push({ type: 'pocket-screw', a: { draft: a, featureIds: [] }, b: { draft: b, featureIds: [] }, clearanceMm: 0, glued: true, floating: false, note });
  for (const rail of rails) for (const s of stiles) pocket(rail, s, 'Rail pocket-screwed and glued to the stile from the back.');
  mullions.forEach((m, i) => {
    const r = Math.floor(i / Math.max(1, o.columns.length - 1));
    pocket(m, rails[r]!, 'Mullion pocket-screwed and glued to the rail above.');
    pocket(m, rails[r + 1]!, 'Mullion pocket-screwed and glued to the rail below.');
  });
  return { drafts: [...stiles, ...rails, ...mullions], joints, stiles, rails, mullions };
}
