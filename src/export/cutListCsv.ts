/**
 * The cut list as CSV through papaparse: one row per part, units in the header, quantities and
 * sizes as plain numbers so a spreadsheet sums and sorts them.
 */
import Papa from 'papaparse';
import type { PieceResult } from '../../shared/engine/types.ts';
import { partLetters } from '../../shared/drawing/partLetters.ts';

const MM_PER_IN = 25.4;

/** Rounds to 0.001 in or 0.1 mm: finer than a maker marks, coarse enough to read. */
function value(mm: number, units: 'in' | 'mm'): number {
  return units === 'in' ? Math.round((mm / MM_PER_IN) * 1000) / 1000 : Math.round(mm * 10) / 10;
}

/** The cut list of `result` as CSV text, lengths in `units`. */
export function cutListCsv(result: PieceResult, units: 'in' | 'mm'): string {
  const letters = partLetters(result);
  const u = units;
  const fields = ['Letter', 'Part', 'Material', 'Quantity', `Finished length (${u})`, `Finished width (${u})`, `Finished thickness (${u})`, `Rough length (${u})`, `Rough width (${u})`, `Rough thickness (${u})`, 'Grain', 'Notes'];
  const data = result.derived.cutList.flatMap((g) =>
    g.rows.map((r) => [
      letters.get(r.partId) ?? '', r.name, g.material, r.quantity,
      ...r.finished.map((v) => value(v, units)), ...r.rough.map((v) => value(v, units)),
      r.grain, r.notes.join('; '),
    ]),
  );
  return Papa.unparse({ fields, data }, { newline: '\r\n' });
}
