import { describe, expect, it } from 'vitest';
import { buildPiece, defaultSpec, paramDefs } from '../../../shared/engine/index.ts';
import { paramCompareRows, partCompareRows } from '../../../src/editor/compareRows.ts';

const IN = 25.4;
const base = defaultSpec('chest');
const wider = { ...base, params: { ...base.params, width: 41.5 * IN } };

describe('paramCompareRows', () => {
  it('lists every parameter once and marks only the changed one', () => {
    const rows = paramCompareRows(paramDefs('chest'), base, wider);
    expect(rows).toHaveLength(paramDefs('chest').length);
    expect(rows.filter((r) => r.changed).map((r) => r.def.key)).toEqual(['width']);
  });

  it('reads a parameter missing from a stored spec as its default', () => {
    const { width: _omitted, ...rest } = base.params;
    const rows = paramCompareRows(paramDefs('chest'), { ...base, params: rest }, base);
    expect(rows.find((r) => r.def.key === 'width')?.changed).toBe(false);
  });
});

describe('partCompareRows', () => {
  it('marks the parts a wider chest resizes and leaves the side parts alone', () => {
    const rows = partCompareRows(buildPiece(base), buildPiece(wider));
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
    const removed = partCompareRows(one, none).filter((r) => r.change === 'removed');
    const added = partCompareRows(none, one).filter((r) => r.change === 'added');
    expect(removed.length).toBeGreaterThan(0);
    expect(added.map((r) => r.partId)).toEqual(removed.map((r) => r.partId));
  });
});
