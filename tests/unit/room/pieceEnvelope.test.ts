import { describe, expect, it } from 'vitest';
import { buildPiece, defaultSpec } from '../../../shared/engine/index.ts';
import { LID_OPEN_ANGLE_DEG } from '../../../shared/engine/pieces/openings.ts';
import { envelopeFromResult } from '../../../shared/room/pieceEnvelope.ts';
import { boxChestResult } from './support/boxChest.ts';

const TOLERANCE_MM = 1e-6;

describe('envelopeFromResult', () => {
  it("reads the chest lid's hinge line from the result's openings", () => {
    // Test chest 1016 × 483 × 584 with a 19 mm lid, hinged at Y 483, Z 584 − 19 = 565.
    const env = envelopeFromResult(boxChestResult({ width: 1016, depth: 483, height: 584 }));
    expect(env.lid?.hingeYMm).toBeCloseTo(483, 9);
    expect(env.lid?.hingeZMm).toBeCloseTo(565, 9);
    expect(env.lid?.openAngleDeg).toBe(LID_OPEN_ANGLE_DEG);
    expect(env.lid?.parts.map((p) => p.partId).sort()).toEqual(['batten', 'batten', 'lid']);
    expect(env.subassemblies.map((s) => s.id)).toEqual(['case', 'lid']);
    expect(env.assumptions.join(' ')).toContain('common practice, no published source');
  });

  it("reads the lid's opening angle from the result when it is not the usual stop", () => {
    expect(envelopeFromResult(boxChestResult({ width: 1016, depth: 483, height: 584, lidOpenAngle: 105 })).lid?.openAngleDeg).toBe(105);
  });

  it("matches the engine's chest box and lid", () => {
    const result = buildPiece(defaultSpec('chest'));
    const env = envelopeFromResult(result);
    for (let i = 0; i < 3; i++) {
      expect(Math.abs(env.box.min[i]! - result.bboxMinMm[i]!)).toBeLessThan(TOLERANCE_MM);
      expect(Math.abs(env.box.max[i]! - env.box.min[i]! - result.bboxMm[i]!)).toBeLessThan(TOLERANCE_MM);
    }
    expect(env.lid).not.toBeNull();
  });

  it("finds each of the engine's cabinet doors, hinged on the outside edges", () => {
    const env = envelopeFromResult(buildPiece(defaultSpec('cabinet')));
    expect(env.doors.map((d) => d.hinge)).toEqual(['left', 'right']);
    const [left, right] = env.doors;
    expect(left!.hingeXMm).toBeLessThan(right!.hingeXMm);
    for (const d of env.doors) expect(d.parts.every((p) => p.role.startsWith('door'))).toBe(true);
    expect(env.subassemblies.map((s) => s.id)).toContain('door-1');
  });

  it("finds each of the engine's dresser drawers, travelling the length of its sides", () => {
    const result = buildPiece(defaultSpec('dresser'));
    const env = envelopeFromResult(result);
    const sideCount = result.placements.filter((p) => result.parts.find((q) => q.id === p.partId)?.role === 'drawer-side').length;
    expect(env.drawers).toHaveLength(sideCount / 2);
    const side = result.parts.find((p) => p.role === 'drawer-side')!;
    for (const d of env.drawers) {
      expect(Math.abs(d.travelMm - side.lengthMm)).toBeLessThan(TOLERANCE_MM);
      expect(d.parts.filter((p) => p.role === 'drawer-front')).toHaveLength(1);
    }
  });

  it("swings the engine chest's lid about the hinge line the engine reports", () => {
    const result = buildPiece(defaultSpec('chest'));
    const hinge = result.openings.find((o) => o.kind === 'lid')!.hingeAxis.origin;
    const env = envelopeFromResult(result);
    expect(Math.abs(env.lid!.hingeYMm - hinge[1])).toBeLessThan(TOLERANCE_MM);
    expect(Math.abs(env.lid!.hingeZMm - hinge[2])).toBeLessThan(TOLERANCE_MM);
    expect(env.lid!.parts.some((p) => p.role === 'leg')).toBe(false);
  });

  it('keeps a pair of doors that meet at the middle as two leaves', () => {
    const spec = defaultSpec('cabinet');
    const env = envelopeFromResult(buildPiece({ ...spec, params: { ...spec.params, frontGap: 0 } }));
    expect(env.doors.map((d) => d.hinge)).toEqual(['left', 'right']);
  });
});
