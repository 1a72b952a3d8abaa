import { describe, expect, it } from 'vitest';
import { buildPiece, defaultSpec, type DoorOpening, type DrawerOpening, type LidOpening, type PieceResult, type PieceSpec } from '../../../../shared/engine/index.ts';
import { SLIDE_RULES } from '../../../../shared/engine/constructions/slides.ts';
import { DOOR_SWING_DEG, LID_OPEN_ANGLE_DEG } from '../../../../shared/engine/pieces/openings.ts';

const TOLERANCE_MM = 1e-6;
const IN = 25.4;

const withParams = (kind: PieceSpec['kind'], params: Record<string, unknown>): PieceSpec => {
  const spec = defaultSpec(kind);
  return { ...spec, params: { ...spec.params, ...params } };
};
const lidOf = (r: PieceResult): LidOpening[] => r.openings.filter((o): o is LidOpening => o.kind === 'lid');
const doorsOf = (r: PieceResult): DoorOpening[] => r.openings.filter((o): o is DoorOpening => o.kind === 'door');
const drawersOf = (r: PieceResult): DrawerOpening[] => r.openings.filter((o): o is DrawerOpening => o.kind === 'drawer');
const key = (ref: { partId: string; instance: number }): string => `${ref.partId}#${ref.instance}`;

describe('buildPiece openings', () => {
  it("hinges the default chest's lid at the back rail's outer face, level with the lid's underside", () => {
    // Default chest: 19 in deep, 23 in high, 1 3/4 in legs, 3/4 in stock and lid. The back rail's
    // centre plane is half a leg in from the back, so its outer face is 7/8 − 3/8 = 1/2 in in:
    // hinge line Y = 19 − 1/2 = 18 1/2 in = 469.9 mm; the lid's underside Z = 23 − 3/4 in = 565.15 mm.
    const result = buildPiece(defaultSpec('chest'));
    const [lid, ...more] = lidOf(result);
    expect(more).toHaveLength(0);
    expect(result.openings).toHaveLength(1);
    expect(Math.abs(lid!.hingeAxis.origin[1] - 18.5 * IN)).toBeLessThan(TOLERANCE_MM);
    expect(Math.abs(lid!.hingeAxis.origin[2] - (23 - 0.75) * IN)).toBeLessThan(TOLERANCE_MM);
    expect(lid!.hingeAxis.direction).toEqual([1, 0, 0]);
    expect(lid!.openAngleDeg).toBe(LID_OPEN_ANGLE_DEG);
    expect(lid!.parts.map((p) => p.partId).sort()).toEqual(['batten', 'batten', 'lid']);
  });

  it('moves the lid hinge line with the back groove offset', () => {
    const moved = lidOf(buildPiece(withParams('chest', { backGrooveOffset: 3 })))[0]!;
    expect(Math.abs(moved.hingeAxis.origin[1] - (18.5 * IN + 3))).toBeLessThan(TOLERANCE_MM);
  });

  it("gives each of the default dresser's drawers the length of its 18 in side-mount slide as its travel", () => {
    // 20 in deep case: the longest stock side-mount slide that fits is 18 in (457.2 mm).
    const drawers = drawersOf(buildPiece(defaultSpec('dresser')));
    expect(drawers.map((d) => d.id)).toEqual(['drawer-1-1', 'drawer-1-2', 'drawer-2-1', 'drawer-2-2', 'drawer-3-1', 'drawer-3-2']);
    for (const d of drawers) {
      expect(Math.abs(d.travelMm - 18 * IN)).toBeLessThan(TOLERANCE_MM);
      expect(SLIDE_RULES['side-mount'].lengthsMm).toContain(d.travelMm);
      expect(d.direction).toEqual([0, -1, 0]);
    }
  });

  it('names every drawer part instance once, front and box together', () => {
    const result = buildPiece(defaultSpec('dresser'));
    const refs = drawersOf(result).flatMap((d) => d.parts.map(key));
    expect(new Set(refs).size).toBe(refs.length);
    const placed = new Set(result.placements.map(key));
    for (const ref of refs) expect(placed.has(ref)).toBe(true);
    const roles = new Map(result.parts.map((p) => [p.id, p.role]));
    for (const d of drawersOf(result)) {
      expect(d.parts.map((p) => roles.get(p.partId)).filter((r) => r === 'drawer-front')).toHaveLength(1);
      expect(d.parts.map((p) => roles.get(p.partId)).filter((r) => r === 'drawer-side')).toHaveLength(2);
    }
  });

  it('lets a drawer on wooden runners come out its whole box depth', () => {
    const result = buildPiece(withParams('dresser', { slideType: 'wood-runners', webFrames: 'open' }));
    const sideLengths = new Map(result.parts.filter((p) => p.role === 'drawer-side').map((p) => [p.id, p.lengthMm]));
    expect(drawersOf(result).length).toBeGreaterThan(0);
    for (const d of drawersOf(result)) {
      const side = d.parts.find((p) => sideLengths.has(p.partId))!;
      expect(Math.abs(d.travelMm - sideLengths.get(side.partId)!)).toBeLessThan(TOLERANCE_MM);
    }
  });

  it("hangs a pair of doors on their outer edges and a single door on the left, at the door's front face", () => {
    // Default cabinet: 30 in wide, 1 1/2 in face-frame stiles, doors overlaying them 1/2 in: the
    // hinge edges are 1 in in from each side; the 3/4 in doors sit in front of the frame (Y 0).
    const pair = doorsOf(buildPiece(defaultSpec('cabinet')));
    expect(pair.map((d) => d.side)).toEqual(['left', 'right']);
    expect(Math.abs(pair[0]!.hingeAxis.origin[0] - 1 * IN)).toBeLessThan(TOLERANCE_MM);
    expect(Math.abs(pair[1]!.hingeAxis.origin[0] - 29 * IN)).toBeLessThan(TOLERANCE_MM);
    for (const d of pair) {
      expect(Math.abs(d.hingeAxis.origin[1] + 0.75 * IN)).toBeLessThan(TOLERANCE_MM);
      expect(d.hingeAxis.direction).toEqual([0, 0, 1]);
      expect(d.swingDeg).toBe(DOOR_SWING_DEG);
    }
    const single = doorsOf(buildPiece(withParams('cabinet', { doorCount: 1 })));
    expect(single.map((d) => d.side)).toEqual(['left']);
    expect(doorsOf(buildPiece(withParams('cabinet', { doorCount: 0 })))).toHaveLength(0);
  });
});
