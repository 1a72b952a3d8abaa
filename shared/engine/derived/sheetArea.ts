/** Area of sheet goods the parts use, and the sheets that area needs at the least. */
import { SHEET_SIZE_MM } from '../checks/stock.ts';
import type { Part, SheetAreaRow } from '../types.ts';

const MM2_PER_FT2 = (12 * 25.4) ** 2;

/** Area per sheet good (finished sizes) and the sheets needed by area alone, a lower bound. */
export function sheetArea(parts: readonly Part[]): SheetAreaRow[] {
  const rows = new Map<string, { sheetName: string; mm2: number }>();
  for (const part of parts) {
    if (part.material.kind !== 'sheet') continue;
    const row = rows.get(part.material.sheetId) ?? { sheetName: part.material.sheetName, mm2: 0 };
    row.mm2 += part.quantity * part.lengthMm * part.widthMm;
    rows.set(part.material.sheetId, row);
  }
  const sheetMm2 = SHEET_SIZE_MM.length * SHEET_SIZE_MM.width;
  return [...rows.entries()].map(([sheetId, r]) => ({
    sheetId, sheetName: r.sheetName, areaM2: r.mm2 / 1e6, areaFt2: r.mm2 / MM2_PER_FT2, sheetsByArea: Math.ceil(r.mm2 / sheetMm2),
  }));
}
