import { describe, expect, it } from 'vitest';
import { buildPiece, defaultSpec } from '../../../../shared/engine/index.ts';

const MM_TOLERANCE = 1e-6;
const r = buildPiece(defaultSpec('chest'));

describe('cutList', () => {
  it('groups parts by material, solid wood by stock thickness first, sheets last', () => {
    const materials = r.derived.cutList.map((g) => g.material);
    expect(materials).toEqual(['White oak 4/4', 'White oak 8/4', 'Hardwood plywood, 1/2 (15/32 in actual)']);
    const count = r.derived.cutList.flatMap((g) => g.rows).reduce((s, row) => s + row.quantity, 0);
    expect(count).toBe(r.parts.reduce((s, p) => s + p.quantity, 0));
  });

  it('gives rough sizes with the milling allowances (1 in long, 1/4 in wide, thickness to the quarter)', () => {
    const rail = r.derived.cutList.flatMap((g) => g.rows).find((row) => row.partId === 'front-top-rail')!;
    expect(rail.rough[0] - rail.finished[0]).toBeCloseTo(25.4, 9);
    expect(rail.rough[1] - rail.finished[1]).toBeCloseTo(6.35, 9);
    expect(rail.rough[2]).toBeCloseTo(25.4, 9);
  });
});

describe('joinerySchedule', () => {
  it('sets the router bit height to the groove depth and the fence to its offset, with stop marks for stopped grooves', () => {
    const row = r.derived.joinery.find((j) => j.type === 'stub-tenon' && j.parts[1] === 'leg')!;
    const router = row.setUps.find((s) => s.tool === 'router table')!;
    const value = (name: string) => router.settings.find((s) => s.name === name)!.valueMm;
    expect(value('bit height')).toBeCloseTo(12.7, 9);
    expect(value('straight bit diameter')).toBeCloseTo(6.35, 9);
    // Groove centred on a 1-3/4 in leg: (44.45 − 6.35) / 2 = 19.05 mm to the near side.
    expect(value('fence to near side of bit')).toBeCloseTo(19.05, 9);
    expect(value('start mark from end-a')).toBeCloseTo(76.2 + 12.7, 9);
    const saw = row.setUps.find((s) => s.tool === 'table saw')!;
    // Tongue cheeks: (19.05 − 6.35) / 2 = 6.35 mm deep, tongue 7/16 in long.
    expect(saw.settings[0]!.valueMm).toBeCloseTo(6.35, 9);
    expect(saw.settings[1]!.valueMm).toBeCloseTo(11.1125, 9);
    expect(row.glued).toBe(true);
  });

  it('marks panels as floating and never glued', () => {
    const panels = r.derived.joinery.filter((j) => j.type === 'panel-in-groove');
    expect(panels.length).toBeGreaterThan(0);
    expect(panels.every((j) => j.floating && !j.glued)).toBe(true);
  });
});

describe('sheetArea', () => {
  it('adds up the sheet parts and needs at least one 48 × 96 in sheet', () => {
    const ply = r.derived.sheetArea[0]!;
    const expected = r.parts.filter((p) => p.material.kind === 'sheet').reduce((s, p) => s + p.quantity * p.lengthMm * p.widthMm, 0) / 1e6;
    expect(Math.abs(ply.areaM2 - expected)).toBeLessThan(MM_TOLERANCE);
    expect(ply.sheetsByArea).toBe(1);
  });
});

describe('glueUpStages', () => {
  it('glues the ends first, then the front and back, and keeps every panel and the bottom dry', () => {
    const stages = r.derived.glueUp;
    expect(stages.map((s) => s.stage)).toEqual([1, 2, 3, 4]);
    expect(stages[0]!.floatingPartIds).toContain('side-panel');
    expect(stages[1]!.floatingPartIds).toContain('front-back-panel');
    expect(stages[2]!.floatingPartIds).toContain('bottom');
    expect(stages[0]!.steps[0]!.title).toMatch(/lid from 5 boards/);
  });
});
