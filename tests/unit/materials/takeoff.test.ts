import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildPiece, type Part, type PieceSpec } from '../../../shared/engine/index.ts';
import { boardPartsFor, sheetPartFor } from '../../../shared/materials/partsForLayout.ts';
import { materialsTakeoff } from '../../../shared/materials/takeoff.ts';

const IN = 25.4;
// Board feet are sums of products of mm sizes; far below the 0.01 BF a maker reads.
const BF_TOLERANCE = 1e-9;

const spec = JSON.parse(readFileSync(new URL('../../fixtures/specs/chest-blanket-coastal.json', import.meta.url), 'utf8')) as PieceSpec;
const result = buildPiece(spec);

describe('materialsTakeoff', () => {
  const takeoff = materialsTakeoff(result, { sheetAttempts: 20 });

  it('lays out every solid and sheet part of the chest, dropping none', () => {
    const solidCount = result.parts.filter((p) => p.material.kind === 'solid').reduce((n, p) => n + p.quantity * (p.glueUp?.boards ?? (p.rough.widthMm > 8 * IN ? Math.ceil(p.rough.widthMm / (8 * IN)) : 1)), 0);
    const placed = takeoff.boards.reduce((n, b) => n + b.layout.boards.flatMap((x) => x.parts).length + b.layout.unplaced.length, 0);
    expect(placed).toBe(solidCount);
    const sheetCount = result.parts.filter((p) => p.material.kind === 'sheet').reduce((n, p) => n + p.quantity, 0);
    expect(takeoff.sheets.reduce((n, s) => n + s.layout.sheets.flatMap((x) => x.parts).length, 0)).toBe(sheetCount);
  });

  it('counts rough board feet as the engine does (NHLA rules, secondary), and buys at least that much', () => {
    const rough = takeoff.boards.reduce((s, b) => s + b.layout.boardFeetRough, 0);
    expect(Math.abs(rough - result.derived.boardFeet.total)).toBeLessThan(BF_TOLERANCE);
    expect(takeoff.boardFeetBought).toBeGreaterThanOrEqual(rough);
    expect(takeoff.boardFeetFinished).toBeLessThan(rough);
  });

  it('matches hand arithmetic for the legs (8/4 stock)', () => {
    // Four legs, rough 23 1/4 × 2 in (engine: 1 in length and 1/4 in width allowance on a
    // 22 1/4 × 1 3/4 in leg). On the default boards one 8 ft × 4 in board holds them in a
    // single rip: 4 × 23 1/4 + 3 × 1/8 = 93 3/8 in ≤ 96 in; a 4 in board has no room for a
    // second 2 in rip after a 1/8 in kerf. 8/4 counts as 2 in thick (NHLA rules, secondary):
    //   bought = 2 × 4 × 96 / 144 = 5.3333 BF; rough = 4 × 2 × 2 × 23.25 / 144 = 2.5833 BF.
    const legs = takeoff.boards.find((b) => b.quarters === 8)!.layout;
    expect(legs.boards.map((b) => b.stockName)).toEqual(['Board 8 ft × 4 in']);
    expect(Math.abs(legs.boardFeetBought - (2 * 4 * 96) / 144)).toBeLessThan(BF_TOLERANCE);
    expect(Math.abs(legs.boardFeetRough - (4 * 2 * 2 * 23.25) / 144)).toBeLessThan(BF_TOLERANCE);
  });
});

describe('boardPartsFor', () => {
  const lid = result.parts.find((p) => p.glueUp) as Part;

  it('turns a glued-up part into its boards, one grain-match group per instance', () => {
    const inputs = boardPartsFor(lid, 8 * IN);
    expect(inputs).toHaveLength(lid.quantity);
    expect(inputs[0]?.quantity).toBe(lid.glueUp?.boards);
    expect(inputs[0]?.matchGroup).toBe(`${lid.id}#1`);
    expect((inputs[0]?.roughWidthMm ?? 0) * (lid.glueUp?.boards ?? 0)).toBeCloseTo(lid.rough.widthMm, 9);
  });

  it('splits a solid part wider than the widest board into a glue-up', () => {
    const panel = { ...lid, glueUp: undefined, rough: { ...lid.rough, widthMm: 13 * IN } } as Part;
    const inputs = boardPartsFor(panel, 6 * IN);
    expect(inputs[0]?.quantity).toBe(3);
  });
});

describe('sheetPartFor', () => {
  it('lets MDF parts turn either way, whatever grain the part names', () => {
    const bottom = result.parts.find((p) => p.material.kind === 'sheet') as Part;
    const mdf = { ...bottom, grain: 'length', material: { kind: 'sheet', sheetId: 'mdf-1/2', sheetName: 'MDF' } } as Part;
    expect(sheetPartFor(mdf).grain).toBe('none');
    expect(sheetPartFor({ ...bottom, grain: 'length' } as Part).grain).toBe('length');
  });
});
