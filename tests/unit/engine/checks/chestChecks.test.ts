import { describe, expect, it } from 'vitest';
import { buildPiece, defaultSpec } from '../../../../shared/engine/index.ts';
import type { Check, PieceResult } from '../../../../shared/engine/types.ts';

function chest(params: Record<string, unknown> = {}, climate?: { buildMcPercent: number; lowMcPercent: number; highMcPercent: number }): PieceResult {
  const spec = defaultSpec('chest');
  return buildPiece({ ...spec, params: { ...spec.params, ...params }, ...(climate ? { climate } : {}) });
}

const find = (r: PieceResult, id: string): Check | undefined => r.checks.find((c) => c.id === id);

describe('chest checks', () => {
  it('passes the default chest with no errors or warnings', () => {
    const r = chest();
    expect(r.checks.filter((c) => c.severity === 'error' || c.severity === 'warning')).toEqual([]);
  });

  it('fires panel float when solid panels sit in grooves too shallow for their seasonal movement, with the numbers and a fix', () => {
    // A flat-sawn white-oak panel ~330 mm across the grain, built at 6 % and living 4–14 %.
    const r = chest({ panelMaterial: 'solid', panelThickness: 9.525, frameGrooveDepth: 7 }, { buildMcPercent: 6, lowMcPercent: 4, highMcPercent: 14 });
    const c = find(r, 'panel-float:front and back')!;
    expect(c.severity).toBe('warning');
    expect(c.numbers.shortfallMm).toBeGreaterThan(0);
    expect(c.numbers.grooveDepthMm).toBe(7);
    expect(c.fix).toMatch(/groove/);
    expect(c.partIds).toContain('front-back-panel');
  });

  it('reports the float that passes as information', () => {
    const c = find(chest({ panelMaterial: 'solid', panelThickness: 9.525 }), 'panel-float:side')!;
    expect(c.severity).toBe('info');
    expect(c.numbers.gapEachSideMm).toBeGreaterThan(0);
  });

  it('fires when the rail tongues are longer than the leg grooves are deep', () => {
    const c = find(chest({ railTongueLength: 14 }), 'tongue-too-long:rail')!;
    expect(c.severity).toBe('error');
    expect(c.numbers.tongueLengthMm! - c.numbers.grooveDepthMm!).toBeCloseTo(14 - 12.7, 9);
  });

  it('warns when a tongue leaves no room at the bottom of its groove (about 1/16 in is common practice)', () => {
    expect(find(chest({ railTongueLength: 12.7 }), 'tongue-no-end-gap:rail')?.severity).toBe('warning');
  });

  it('fires when the grooves on two faces of a leg meet inside it', () => {
    const c = find(chest({ legGrooveDepth: 20, railTongueLength: 18 }), 'groove-breakthrough:leg')!;
    expect(c.severity).toBe('error');
    // Wood beyond a centred groove's far wall: 44.45 − (22.225 + 3.175) = 19.05 mm.
    expect(c.numbers.deepestWithoutMeetingMm).toBeCloseTo(19.05, 6);
  });

  it('warns when the back groove is moved close to the outer face', () => {
    // Groove centre 44.45 / 2 − offset from the back face; near wall 3.175 mm closer.
    // Offset 12.7 mm leaves 22.225 − 12.7 − 3.175 = 6.35 mm (enough); 14 mm leaves 5.05 mm.
    expect(find(chest({ backGrooveOffset: 12.7 }), 'groove-near-face:leg-back')).toBeUndefined();
    const c = find(chest({ backGrooveOffset: 14, stockThickness: 16, panelSheet: 'hardwood-plywood-1/4' }), 'groove-near-face:leg-back')!;
    expect(c.severity).toBe('warning');
    expect(c.numbers.wallMm).toBeCloseTo(5.05, 6);
  });

  it('warns when the leg grooves are not stopped and would show', () => {
    expect(find(chest({ legGrooveStop: 0 }), 'stopped-groove-shows:leg')?.severity).toBe('warning');
    expect(find(chest(), 'stopped-groove-shows:leg')).toBeUndefined();
  });

  it('flags parts longer than the longest board and solid panels wider than the widest', () => {
    const r = chest({ width: 2400, maxBoardLength: 2000, panelMaterial: 'solid', frontStileCount: 0 });
    expect(find(r, 'longer-than-stock:front-back-bottom-rail')?.severity).toBe('error');
    expect(find(r, 'wider-than-stock:front-back-panel')?.severity).toBe('caution');
  });

  it('says the bottom cannot go in square without clearance', () => {
    const c = find(chest({ bottomClearance: 0 }), 'bottom-no-room')!;
    expect(c.severity).toBe('warning');
    expect(c.numbers.clearanceMm).toBe(0);
  });

  it('warns when the lid battens are fastened without slots, with the lid movement', () => {
    const c = find(chest({ battenSlots: false }), 'battens-without-slots')!;
    expect(c.severity).toBe('warning');
    expect(c.numbers.totalMovementMm).toBeGreaterThan(0);
    const slotted = chest();
    const batten = slotted.parts.find((p) => p.id === 'batten')!;
    expect(batten.features.filter((f) => f.type === 'slot').length).toBeGreaterThan(0);
  });

  it('gives the child-safety caution naming the standards and claiming nothing', () => {
    const c = find(chest(), 'child-safety')!;
    expect(c.severity).toBe('caution');
    expect(c.message).toContain('ASTM F963');
    expect(c.message).toContain('ASTM F2598');
    expect(c.message).toMatch(/any position/);
    expect(c.message).toMatch(/ventilation/);
    expect(c.message).toMatch(/no latch/);
    expect(c.message).toMatch(/do not make a chest compliant or certify it safe/);
    expect(find(chest({ childAccess: false }), 'child-safety')).toBeUndefined();
  });

  it('warns that butt hinges need a separate lid support', () => {
    expect(find(chest({ hingeType: 'butt' }), 'lid-support')?.severity).toBe('warning');
  });
});
