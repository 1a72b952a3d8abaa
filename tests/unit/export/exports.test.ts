import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { buildPiece, defaultSpec, validateSpec } from '../../../shared/engine/index.ts';
import { cutListCsv } from '../../../src/export/cutListCsv.ts';
import { specJson } from '../../../src/export/specJson.ts';

const MM_PER_IN = 25.4; // exact by definition
const TOL_IN = 0.0006;
/** Millimetres are written to 0.1 mm. */
const TOL_MM = 0.05 + 1e-9;

describe('cutListCsv', () => {
  const result = buildPiece(defaultSpec('chest'));

  it('names the units in the header and writes quantities and sizes as numbers', () => {
    const parsed = Papa.parse<Record<string, string>>(cutListCsv(result, 'in'), { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toContain('Finished length (in)');
    const rows = parsed.data;
    expect(rows).toHaveLength(result.derived.cutList.reduce((n, g) => n + g.rows.length, 0));
    for (const part of result.parts) {
      const row = rows.find((r) => r.Part === part.name);
      expect(row, part.name).toBeDefined();
      expect(Number(row!.Quantity)).toBe(part.quantity);
      expect(Math.abs(Number(row!['Finished length (in)']) - part.lengthMm / MM_PER_IN)).toBeLessThan(TOL_IN);
      expect(Math.abs(Number(row!['Finished thickness (in)']) - part.thicknessMm / MM_PER_IN)).toBeLessThan(TOL_IN);
    }
  });

  it('writes millimetres when asked', () => {
    const parsed = Papa.parse<Record<string, string>>(cutListCsv(result, 'mm'), { header: true, skipEmptyLines: true });
    const leg = result.parts.find((p) => p.role === 'leg')!;
    const row = parsed.data.find((r) => r.Part === leg.name)!;
    expect(Math.abs(Number(row['Finished length (mm)']) - leg.lengthMm)).toBeLessThanOrEqual(TOL_MM);
  });
});

describe('specJson', () => {
  it('re-imports through validateSpec to the same spec, with its schema version', () => {
    const spec = validateSpec({ ...defaultSpec('chest'), params: { ...defaultSpec('chest').params, width: 1100 } });
    const text = specJson(spec);
    const back = validateSpec(JSON.parse(text));
    expect(JSON.parse(text).schemaVersion).toBe(1);
    expect(back).toEqual(spec);
    expect(buildPiece(back).bboxMm).toEqual(buildPiece(spec).bboxMm);
  });
});
