/**
 * A plain chest result for room-fit tests: legs, four panels, a bottom, a lid with two battens,
 * each part one box, built from width, depth and height the way the chest engine lays them out
 * (origin at the front-left leg on the floor, the lid overhanging to −X, −Y and +X, +Y). Room
 * fit reads only boxes, roles and the openings, so this stands in for the engine without its joinery.
 */
import { InputError } from '../../../../shared/errors.ts';
import { LID_OPEN_ANGLE_DEG } from '../../../../shared/engine/pieces/openings.ts';
import type { LidOpening, Part, PartRole, PieceResult, PieceSpec, Placement, Vec3 } from '../../../../shared/engine/types.ts';

/** Sizes of the test chest, mm. */
export interface BoxChestSize {
  width: number;
  depth: number;
  height: number;
  lidThickness?: number;
  lidOverhangFront?: number;
  lidOverhangSide?: number;
  lidOverhangBack?: number;
  legSize?: number;
  lidOpenAngle?: number;
}

/** Limits that mirror the chest parameters' (mm). */
const LIMITS = { width: [300, 2400], depth: [250, 1200], height: [250, 1200] } as const;

interface Draft {
  id: string;
  role: PartRole;
  boxes: { label: string; min: Vec3; size: Vec3 }[];
}

/** A chest result from `size`; throws an `InputError` outside the chest's limits, as the engine does. */
export function boxChestResult(size: BoxChestSize): PieceResult {
  for (const key of ['width', 'depth', 'height'] as const) {
    const [min, max] = LIMITS[key];
    if (!(size[key] >= min && size[key] <= max)) throw new InputError(key, `must be between ${min} and ${max} mm`, `${min}–${max} mm`);
  }
  const { width: w, depth: d, height: h } = size;
  const t = size.lidThickness ?? 19;
  const of = size.lidOverhangFront ?? 25;
  const os = size.lidOverhangSide ?? 25;
  const ob = size.lidOverhangBack ?? 6;
  const leg = size.legSize ?? 44;
  const caseTop = h - t;
  const panelZ = 80;
  const drafts: Draft[] = [
    { id: 'leg', role: 'leg', boxes: [[0, 0], [w - leg, 0], [0, d - leg], [w - leg, d - leg]].map(([x, y], i) => ({ label: `leg ${i + 1}`, min: [x!, y!, 0], size: [leg, leg, caseTop] })) },
    { id: 'front-back-panel', role: 'panel', boxes: [0, d - 19].map((y, i) => ({ label: i === 0 ? 'front panel' : 'back panel', min: [leg, y, panelZ], size: [w - 2 * leg, 19, caseTop - panelZ] })) },
    { id: 'side-panel', role: 'panel', boxes: [0, w - 19].map((x, i) => ({ label: i === 0 ? 'left panel' : 'right panel', min: [x, leg, panelZ], size: [19, d - 2 * leg, caseTop - panelZ] })) },
    { id: 'bottom', role: 'bottom', boxes: [{ label: 'bottom', min: [19, 19, panelZ], size: [w - 38, d - 38, 12] }] },
    { id: 'lid', role: 'lid', boxes: [{ label: 'lid', min: [-os, -of, caseTop], size: [w + 2 * os, d + of + ob, t] }] },
    { id: 'batten', role: 'batten', boxes: [60, w - 110].map((x, i) => ({ label: `batten ${i + 1}`, min: [x, 30, caseTop - 19], size: [50, d - 60, 19] })) },
  ];

  const parts: Part[] = drafts.map((draft) => {
    const [l, wd, th] = draft.boxes[0]!.size;
    return {
      id: draft.id, name: draft.id, role: draft.role,
      material: { kind: 'solid', speciesId: 'white-oak', speciesName: 'White oak' },
      grain: 'length', lengthMm: l, widthMm: wd, thicknessMm: th,
      rough: { lengthMm: l, widthMm: wd, thicknessMm: th, quarters: 4 },
      quantity: draft.boxes.length, features: [], notes: [],
    };
  });
  const placements: Placement[] = drafts.flatMap((draft) => draft.boxes.map((b, instance) => ({
    partId: draft.id, instance, label: b.label, positionMm: b.min,
    axes: { length: '+X', width: '+Y', thickness: '+Z' }, explodeMm: [0, 0, 0],
  })));

  const params: Record<string, unknown> = { width: w, depth: d, height: h, lidThickness: t };
  if (size.lidOpenAngle !== undefined) params['lidOpenAngle'] = size.lidOpenAngle;
  const spec: PieceSpec = { schemaVersion: 1, kind: 'chest', params };
  // Hinged at the back of the legs, level with the lid's underside; 90° unless the size says.
  const lid: LidOpening = {
    kind: 'lid', parts: placements.filter((pl) => pl.partId === 'lid' || pl.partId === 'batten').map((pl) => ({ partId: pl.partId, instance: pl.instance })),
    hingeAxis: { origin: [0, d, caseTop], direction: [1, 0, 0] }, openAngleDeg: size.lidOpenAngle ?? LID_OPEN_ANGLE_DEG,
  };
  return {
    spec, kind: 'chest', engineVersion: 'test', parts, joints: [], placements, checks: [],
    bboxMm: [w + 2 * os, d + of + ob, h], bboxMinMm: [-os, -of, 0], openings: [lid],
    derived: { cutList: [], joinery: [], boardFeet: { bySpecies: [], total: 0 }, sheetArea: [], glueUp: [] },
  };
}

/** The builder fit-to-niche calls: a spec's width, depth and height (and lid angle) to a result. */
export function buildBoxChest(spec: PieceSpec): PieceResult {
  const p = spec.params as Record<string, number | undefined>;
  return boxChestResult({ width: p['width'] ?? 1016, depth: p['depth'] ?? 483, height: p['height'] ?? 584, ...(p['lidOpenAngle'] !== undefined ? { lidOpenAngle: p['lidOpenAngle'] } : {}) });
}
