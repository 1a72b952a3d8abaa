import { describe, expect, it } from 'vitest';
import { buildPiece, defaultSpec, paramDefs } from '../../../shared/engine/index.ts';
import type { ParamDef } from '../../../shared/engine/paramDef.ts';
import type { ParamValue } from '../../../shared/engine/types.ts';
import { formatLength } from '../../../shared/units/index.ts';
import { paramCompareRows, partCompareRows } from '../../../src/editor/compareRows.ts';

const IN = 25.4;
const base = defaultSpec('chest');
const wider = { ...base, params: { ...base.params, width: 41.5 * IN } };
/** Lengths as a maker reading sixteenths sees them. */
const sixteenths = (mm: number) => formatLength(mm, { unit: 'in', precision: 16 });
const show = (def: ParamDef, v: ParamValue) => (def.kind === 'length' && typeof v === 'number' ? sixteenths(v) : String(v));

describe('paramCompareRows', () => {
  it('lists every parameter once and marks only the changed one', () => {
    const rows = paramCompareRows(paramDefs('chest'), base, wider, show);
    expect(rows).toHaveLength(paramDefs('chest').length);
    expect(rows.filter((r) => r.changed).map((r) => r.def.key)).toEqual(['width']);
  });

  it('reads a parameter missing from a stored spec as its default', () => {
    const { width: _omitted, ...rest } = base.params;
    const rows = paramCompareRows(paramDefs('chest'), { ...base, params: rest }, base, show);
    expect(rows.find((r) => r.def.key === 'width')?.changed).toBe(false);
  });

  it('does not mark a value that reads the same at the shown precision, and keeps how far apart the two are', () => {
    // 0.5 mm is under a sixteenth (1.5875 mm), so 40" and 40" + 0.5 mm both read 40".
    const nudged = { ...base, params: { ...base.params, width: 40 * IN + 0.5 } };
    const row = paramCompareRows(paramDefs('chest'), base, nudged, show).find((r) => r.def.key === 'width')!;
    expect(row.fromText).toBe(row.toText);
    expect(row.changed).toBe(false);
    expect(row.hiddenDifference).toBeCloseTo(0.5, 9);
  });

  it('marks the same nudge when the page reads finer than the nudge', () => {
    const tenths = (def: ParamDef, v: ParamValue) => (typeof v === 'number' ? formatLength(v, { unit: 'mm', precision: 0.1 }) : String(v));
    const nudged = { ...base, params: { ...base.params, width: 40 * IN + 0.5 } };
    const row = paramCompareRows(paramDefs('chest'), base, nudged, tenths).find((r) => r.def.key === 'width')!;
    expect(row.changed).toBe(true);
    expect(row.hiddenDifference).toBeNull();
  });
});

describe('partCompareRows', () => {
  it('marks the parts a wider chest resizes and leaves the side parts alone', () => {
    const rows = partCompareRows(buildPiece(base), buildPiece(wider), sixteenths);
    const resized = rows.filter((r) => r.change === 'resized').map((r) => r.partId);
    expect(resized.length).toBeGreaterThan(0);
    for (const row of rows.filter((r) => r.change === 'resized')) {
      expect(row.to?.lengthMm).not.toBe(row.from?.lengthMm);
    }
    const same = rows.filter((r) => r.change === 'same');
    expect(same.length).toBeGreaterThan(0);
  });

  it('marks parts only one side has as added or removed', () => {
    const one = buildPiece(base);
    const none = { ...one, parts: one.parts.filter((p) => p.role !== 'batten') };
    const removed = partCompareRows(one, none, sixteenths).filter((r) => r.change === 'removed');
    const added = partCompareRows(none, one, sixteenths).filter((r) => r.change === 'added');
    expect(removed.length).toBeGreaterThan(0);
    expect(added.map((r) => r.partId)).toEqual(removed.map((r) => r.partId));
  });

  it('leaves a part whose sizes read the same at the shown precision unmarked', () => {
    const one = buildPiece(base);
    const nudged = { ...one, parts: one.parts.map((p) => ({ ...p, lengthMm: p.lengthMm + 0.2 })) };
    expect(partCompareRows(one, nudged, sixteenths).filter((r) => r.change === 'resized')).toEqual([]);
    const tenths = (mm: number) => formatLength(mm, { unit: 'mm', precision: 0.1 });
    expect(partCompareRows(one, nudged, tenths).every((r) => r.change === 'resized')).toBe(true);
  });
});
