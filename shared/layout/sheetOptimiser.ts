/**
 * The sheet optimiser: lays sheet-good parts out on sheets with guillotine cuts, trying many
 * orderings and rules and keeping the layout that buys the fewest sheets, then uses the least
 * offcut area, then leaves the fullest sheets. Pure and deterministic for a given seed.
 */
import { runLayoutSteps, type LayoutControl, type LayoutSteps } from './control.ts';
import { areaLowerBound, largeItemBound, stripBound } from './lowerBound.ts';
import { seededRandom } from './prng.ts';
import { sheetAttempts } from './sheetAttempts.ts';
import { concentrateWeakSheet, emptyWeakSheets } from './sheetImprove.ts';
import { packSheetBySheet } from './sheetBySheet.ts';
import { checkSheetParts, sheetSettings } from './sheetInput.ts';
import { expandSheetParts, itemFits } from './sheetItems.ts';
import { packSheets, type PackingAttempt, type PackingRules, type PackingStock } from './sheetPacking.ts';
import { attemptScore, betterScore, outOfSheets, sheetPlanOf, tooLargeForSheets } from './sheetPlan.ts';
import type { SheetLayout, SheetLayoutOptions, SheetPartInput, SheetStock } from './sheetTypes.ts';

const IMPROVE_RULES: readonly PackingRules[] = (['best-short-side', 'best-area', 'bottom-left', 'best-long-side'] as const).flatMap((fit) =>
  (['shorter-leftover', 'min-area', 'max-area', 'longer-leftover'] as const).map((split) => ({ mode: 'first-fit' as const, fit, split })),
);
// Single-sheet repacks the local search may try: enough to reach its fixed point on 100 parts.
const IMPROVE_BUDGET = 20_000;
const IMPROVE_ROUNDS = 200;
// Attempts without a better layout after which the run stops: later restarts rarely gain.
const PATIENCE = 80;

/**
 * Lays `parts` out on sheets, running to the end unless `control` stops it (then the best
 * layout so far comes back with `cancelled: true`). Sizes in mm.
 */
export function layoutSheets(parts: readonly SheetPartInput[], options: SheetLayoutOptions = {}, control: LayoutControl = {}): SheetLayout {
  return runLayoutSteps(sheetLayoutSteps(parts, options), control);
}

/**
 * The same run as {@link layoutSheets}, one attempt per step: a Web Worker can call `next()`
 * in chunks, post the progress it yields, and pass `true` to `next` to stop.
 */
export function* sheetLayoutSteps(parts: readonly SheetPartInput[], options: SheetLayoutOptions = {}): LayoutSteps<SheetLayout> {
  checkSheetParts(parts);
  const settings = sheetSettings(options);
  const { stock, kerfMm, trimMm } = settings;
  const packStock: PackingStock[] = stock.map((s, stockIndex) => ({
    stockIndex,
    usableLength: s.lengthMm - 2 * trimMm,
    usableWidth: s.widthMm - 2 * trimMm,
    count: s.count,
  }));
  const items = expandSheetParts(parts);
  const fitsSome = (item: (typeof items)[number]) => packStock.some((p) => itemFits(item, p.usableLength, p.usableWidth));
  const placeable = items.filter(fitsSome);
  const tooLarge = items.filter((item) => !fitsSome(item));

  const saleIndex = Math.max(0, stock.findIndex((s) => s.count === null && !s.offcut));
  const sale = packStock[saleIndex] as PackingStock;
  const lowerBound = areaLowerBound(placeable.map((i) => i.lengthMm * i.widthMm), sale.usableLength * sale.usableWidth);
  // Stopping at the bound is safe only when one unlimited sheet size is all there is.
  const target = stock.length === 1 && stock[0]?.count === null ? Math.max(lowerBound, largeItemBound(placeable, sale.usableLength, sale.usableWidth, kerfMm), stripBound(placeable, sale.usableLength, sale.usableWidth, kerfMm)) : -1;

  let best: PackingAttempt = { sheets: [], unplaced: [] };
  let bestScore: readonly number[] | null = null;
  let done = 0;
  let lastGain = 0;
  let cancelled = false;
  const random = seededRandom(settings.seed);
  for (const attempt of sheetAttempts(placeable, settings.attempts, random)) {
    const result =
      attempt.kind === 'items' ? packSheets(attempt.order, packStock, kerfMm, attempt.rules) : packSheetBySheet(placeable, packStock, kerfMm, attempt.fills, attempt.power);
    const score = attemptScore(result, stock);
    done++;
    if (bestScore === null || betterScore(score, bestScore)) {
      best = result;
      bestScore = score;
      lastGain = done;
    }
    if (done - lastGain >= PATIENCE) break;
    if (best.unplaced.length === 0 && (bestScore[1] ?? 0) <= target) break;
    const stop = yield { done, total: settings.attempts, best: bestScore[1] ?? 0 };
    if (stop) {
      cancelled = true;
      break;
    }
  }
  if (!cancelled) best = improve(best, packStock, kerfMm, target);
  return summarise(best, stock, settings.kerfMm, trimMm, [...tooLarge.map(tooLargeForSheets), ...best.unplaced.map(outOfSheets)], lowerBound, done, cancelled);
}

// Alternates emptying and concentrating until neither changes the layout or the rounds run out.
function improve(start: PackingAttempt, packStock: readonly PackingStock[], kerfMm: number, target: number): PackingAttempt {
  let best = start;
  for (let round = 0; round < IMPROVE_ROUNDS && best.sheets.length > Math.max(1, target); round++) {
    best = emptyWeakSheets(best, packStock, kerfMm, IMPROVE_RULES, IMPROVE_BUDGET);
    const next = concentrateWeakSheet(best, packStock, kerfMm, IMPROVE_RULES);
    if (!next.changed) break;
    best = next.attempt;
  }
  return best;
}

function summarise(
  best: PackingAttempt,
  stock: readonly SheetStock[],
  kerfMm: number,
  trimMm: number,
  unplaced: SheetLayout['unplaced'],
  lowerBound: number,
  attemptsRun: number,
  cancelled: boolean,
): SheetLayout {
  const sheets = best.sheets.map((packed) => sheetPlanOf(packed, stock[packed.stockIndex] as SheetStock, trimMm));
  let partArea = 0;
  let sheetArea = 0;
  for (const packed of best.sheets) {
    const s = stock[packed.stockIndex] as SheetStock;
    partArea += packed.sheet.partArea();
    sheetArea += s.lengthMm * s.widthMm;
  }
  const offcutsUsed = sheets.filter((s) => s.offcut).length;
  return {
    sheets,
    unplaced,
    sheetsBought: sheets.length - offcutsUsed,
    offcutsUsed,
    lowerBound,
    yield: sheetArea === 0 ? 0 : partArea / sheetArea,
    kerfMm,
    trimMm,
    attemptsRun,
    cancelled,
  };
}
