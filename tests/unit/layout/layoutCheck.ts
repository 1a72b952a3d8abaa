/** Test helpers: independent checks of a sheet or board layout's geometry. */
import type { BoardPlan } from '../../../shared/layout/boardTypes.ts';
import { rectContains, rectsOverlap, type Rect } from '../../../shared/layout/rect.ts';
import type { SheetPlan } from '../../../shared/layout/sheetTypes.ts';

/** Float noise allowed on coordinates that are sums of mm sizes. */
export const GEOMETRY_TOLERANCE_MM = 1e-6;

/** The usable part of a sheet: inside its trim. */
export function usableRect(sheet: SheetPlan): Rect {
  return { x: sheet.trimMm, y: sheet.trimMm, length: sheet.lengthMm - 2 * sheet.trimMm, width: sheet.widthMm - 2 * sheet.trimMm };
}

interface PlacedRect extends Rect {
  partId: string;
  instance: number;
}

/** Pairs of parts closer than the kerf: grown by half a kerf each (less the tolerance), neighbours must still not overlap. */
function kerfProblems(parts: readonly PlacedRect[], kerfMm: number): string[] {
  const problems: string[] = [];
  const grow = kerfMm / 2 - GEOMETRY_TOLERANCE_MM;
  parts.forEach((p, i) => {
    for (const q of parts.slice(i + 1)) {
      const a = { x: p.x - grow, y: p.y - grow, length: p.length + 2 * grow, width: p.width + 2 * grow };
      const b = { x: q.x - grow, y: q.y - grow, length: q.length + 2 * grow, width: q.width + 2 * grow };
      if (rectsOverlap(a, b)) problems.push(`${p.partId}#${p.instance} and ${q.partId}#${q.instance} are closer than the kerf`);
    }
  });
  return problems;
}

/** Problems found on one sheet: overlaps closer than the kerf, parts outside the usable area. */
export function sheetProblems(sheet: SheetPlan, kerfMm: number): string[] {
  const usable = usableRect(sheet);
  const outside = sheet.parts.filter((p) => !rectContains(usable, p, GEOMETRY_TOLERANCE_MM)).map((p) => `${p.partId}#${p.instance} leaves the usable sheet`);
  return [...outside, ...kerfProblems(sheet.parts, kerfMm)];
}

/** Problems found on one board: parts off the board, parts over a defect, overlaps closer than the kerf. */
export function boardProblems(board: BoardPlan, kerfMm: number): string[] {
  const whole = { x: 0, y: 0, length: board.lengthMm, width: board.widthMm };
  // A defect with no edges given runs across the whole width.
  const defects = board.defects.map((d) => ({ x: d.startMm, y: d.fromEdgeMm ?? 0, length: d.endMm - d.startMm, width: (d.toEdgeMm ?? board.widthMm) - (d.fromEdgeMm ?? 0) }));
  const problems: string[] = [];
  for (const p of board.parts) {
    if (!rectContains(whole, p, GEOMETRY_TOLERANCE_MM)) problems.push(`${p.partId}#${p.instance} leaves the board`);
    if (defects.some((d) => rectsOverlap(p, d))) problems.push(`${p.partId}#${p.instance} covers a defect`);
  }
  return [...problems, ...kerfProblems(board.parts, kerfMm)];
}

/**
 * True when the parts in `region` can be separated by edge-to-edge cuts at least `kerf` wide,
 * recursively: the definition of a guillotine pattern.
 */
export function isGuillotine(parts: readonly Rect[], region: Rect, kerf: number): boolean {
  if (parts.length <= 1) return true;
  for (const axis of ['x', 'y'] as const) {
    const lo = (r: Rect) => (axis === 'x' ? r.x : r.y);
    const hi = (r: Rect) => (axis === 'x' ? r.x + r.length : r.y + r.width);
    for (const p of parts) {
      const at = hi(p);
      if (parts.some((q) => lo(q) < at + kerf - GEOMETRY_TOLERANCE_MM && hi(q) > at + GEOMETRY_TOLERANCE_MM)) continue;
      const low = parts.filter((q) => hi(q) <= at + GEOMETRY_TOLERANCE_MM);
      const high = parts.filter((q) => lo(q) >= at + kerf - GEOMETRY_TOLERANCE_MM);
      if (low.length === 0 || high.length === 0) continue;
      const [r1, r2] =
        axis === 'x'
          ? [{ ...region, length: at - region.x }, { ...region, x: at + kerf, length: region.x + region.length - at - kerf }]
          : [{ ...region, width: at - region.y }, { ...region, y: at + kerf, width: region.y + region.width - at - kerf }];
      return isGuillotine(low, r1, kerf) && isGuillotine(high, r2, kerf);
    }
  }
  return false;
}
