/**
 * The attempts the sheet optimiser tries, in order: item orderings that the packing literature
 * finds strong (largest first by area, by longest side, by perimeter, by length, by width),
 * each with a few rule sets, then random restarts that jitter the area order and the rules.
 */
import { shuffled } from './prng.ts';
import type { FitRule, SplitRule } from './guillotineSheet.ts';
import type { PackingRules } from './sheetPacking.ts';
import type { SheetFill } from './sheetBySheet.ts';
import type { SheetItem } from './sheetItems.ts';

/**
 * One attempt: item by item in one order under one set of rules, or sheet by sheet choosing
 * the best of several fills for each sheet.
 */
export type SheetAttempt = { kind: 'items'; order: SheetItem[]; rules: PackingRules } | { kind: 'sheets'; fills: SheetFill[]; power: number };

type SortKey = (item: SheetItem) => number;

const SORT_KEYS: readonly SortKey[] = [
  (i) => i.lengthMm * i.widthMm,
  (i) => Math.max(i.lengthMm, i.widthMm),
  (i) => i.lengthMm + i.widthMm,
  (i) => i.lengthMm,
  (i) => i.widthMm,
  (i) => Math.min(i.lengthMm, i.widthMm),
];

const RULE_SETS: readonly PackingRules[] = [
  { mode: 'fill-sheet', fit: 'best-area', split: 'shorter-leftover' },
  { mode: 'best-fit', fit: 'best-short-side', split: 'min-area' },
  { mode: 'first-fit', fit: 'best-area', split: 'shorter-leftover' },
  { mode: 'fill-sheet', fit: 'best-short-side', split: 'max-area' },
  { mode: 'best-fit', fit: 'best-area', split: 'longer-leftover' },
  { mode: 'first-fit', fit: 'bottom-left', split: 'shorter-axis' },
];

const MODES: readonly PackingRules['mode'][] = ['first-fit', 'best-fit', 'fill-sheet'];
const FITS: readonly FitRule[] = ['best-area', 'best-short-side', 'best-long-side', 'bottom-left'];
const SPLITS: readonly SplitRule[] = ['shorter-leftover', 'longer-leftover', 'min-area', 'max-area', 'shorter-axis', 'longer-axis'];

/** Items sorted largest first by `key`, ties broken by area then input order. */
function sortedBy(items: readonly SheetItem[], key: SortKey): SheetItem[] {
  return items.slice().sort((a, b) => key(b) - key(a) || b.lengthMm * b.widthMm - a.lengthMm * a.widthMm || a.index - b.index);
}

/** Yields `count` attempts: the fixed ones first, then restarts drawn from `random`. */
export function* sheetAttempts(items: readonly SheetItem[], count: number, random: () => number): Generator<SheetAttempt> {
  let made = 0;
  const orders = SORT_KEYS.map((key) => sortedBy(items, key));
  const fixedFills = RULE_SETS.flatMap((rules) => orders.map((order) => ({ order, rules })));
  const sheetFills = fixedFills.filter((_, i) => i < 2 * orders.length);
  for (const power of [1, 1.3]) {
    if (made++ >= count) return;
    yield { kind: 'sheets', fills: sheetFills, power };
  }
  for (const { order, rules } of fixedFills) {
    if (made++ >= count) return;
    yield { kind: 'items', order, rules };
  }
  const pick = <T>(list: readonly T[]): T => list[Math.floor(random() * list.length)] as T;
  const randomRules = (): PackingRules => ({ mode: pick(MODES), fit: pick(FITS), split: pick(SPLITS) });
  while (made++ < count) {
    // Sheet-by-sheet attempts cost about as much as twenty item-by-item ones.
    if (made % 5 === 0) {
      const fills = Array.from({ length: 6 }, () => ({ order: jittered(items, random), rules: randomRules() }));
      yield { kind: 'sheets', fills: [...fills, ...fixedFills.slice(0, 6)], power: 1 + random() * 0.6 };
    } else {
      yield { kind: 'items', order: jittered(items, random), rules: randomRules() };
    }
  }
}

/** The area order with each area jittered by up to ±25 %, and now and then fully shuffled. */
function jittered(items: readonly SheetItem[], random: () => number): SheetItem[] {
  const jitter = 0.1 + random() * 0.4;
  const noisy = new Map(items.map((i) => [i.index, i.lengthMm * i.widthMm * (1 + jitter * (random() - 0.5))]));
  const order = items.slice().sort((a, b) => (noisy.get(b.index) ?? 0) - (noisy.get(a.index) ?? 0));
  return random() < 0.1 ? shuffled(order, random) : order;
}
