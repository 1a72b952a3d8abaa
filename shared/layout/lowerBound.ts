/**
 * Lower bounds on the number of sheets: no layout can use fewer. They let the optimiser stop
 * as soon as it reaches one, and let a maker see how close a layout is to the best possible.
 */
import type { SheetItem } from './sheetItems.ts';

/**
 * The continuous (area) lower bound L0 = ⌈Σ item area / sheet area⌉ (Martello & Vigo 1998,
 * Management Science 44, "Exact solution of the two-dimensional finite bin packing problem").
 * Areas in mm²; `sheetArea` is the usable area of one sheet.
 */
export function areaLowerBound(itemAreas: readonly number[], sheetArea: number): number {
  let total = 0;
  for (const area of itemAreas) total += area;
  // Sizes in mm are rarely whole; a relative tolerance keeps 2.0000000001 from becoming 3.
  return total <= 0 ? 0 : Math.ceil(total / sheetArea - 1e-9);
}

/**
 * Items longer than half the sheet's length and wider than half its width in every orientation
 * they may take: two such items can be parted by no straight line, so each needs a sheet of its
 * own. Sizes in mm; the kerf between two items counts against them.
 */
export function largeItemBound(items: readonly SheetItem[], usableLength: number, usableWidth: number, kerf: number): number {
  const halfL = (usableLength - kerf) / 2;
  const halfW = (usableWidth - kerf) / 2;
  let count = 0;
  for (const item of items) {
    const large = item.orientations.every((rotated) => {
      const l = rotated ? item.widthMm : item.lengthMm;
      const w = rotated ? item.lengthMm : item.widthMm;
      return l > halfL && w > halfW;
    });
    if (large) count++;
  }
  return count;
}

/**
 * The one-dimensional bound L2 of Martello & Toth (1990, "Knapsack Problems", §8.3.1) for
 * items of `sizes` in bins of `capacity`: for each threshold q ≤ C/2, items above C − q sit
 * alone, items above C/2 sit one to a bin, and items from q to C/2 fill what those leave.
 */
export function oneDimensionalBound(sizes: readonly number[], capacity: number): number {
  const half = capacity / 2;
  const thresholds = [0, ...new Set(sizes.filter((s) => s <= half))];
  let best = 0;
  for (const q of thresholds) {
    let big = 0;
    let medium = 0;
    let mediumSum = 0;
    let smallSum = 0;
    for (const s of sizes) {
      if (s > capacity - q) big++;
      else if (s > half) {
        medium++;
        mediumSum += s;
      } else if (s >= q) smallSum += s;
    }
    const spill = Math.max(0, Math.ceil((smallSum - (medium * capacity - mediumSum)) / capacity - 1e-9));
    best = Math.max(best, big + medium + spill);
  }
  return best;
}

/**
 * Items taller than half the sheet's width in every orientation can only sit side by side
 * along its length, so their lengths alone form a one-dimensional problem (the reduction behind
 * Martello & Vigo's 1998 bound L1); likewise for items longer than half the sheet. Returns the
 * larger of the two {@link oneDimensionalBound}s. Sizes in mm; one kerf is added to each item
 * and to the sheet, so the kerf between neighbours is counted.
 */
export function stripBound(items: readonly SheetItem[], usableLength: number, usableWidth: number, kerf: number): number {
  const along: number[] = [];
  const across: number[] = [];
  for (const item of items) {
    let minL = Infinity;
    let minW = Infinity;
    let allTall = true;
    let allLong = true;
    for (const rotated of item.orientations) {
      const l = (rotated ? item.widthMm : item.lengthMm) + kerf;
      const w = (rotated ? item.lengthMm : item.widthMm) + kerf;
      minL = Math.min(minL, l);
      minW = Math.min(minW, w);
      if (w <= (usableWidth + kerf) / 2) allTall = false;
      if (l <= (usableLength + kerf) / 2) allLong = false;
    }
    if (allTall) along.push(minL);
    if (allLong) across.push(minW);
  }
  return Math.max(oneDimensionalBound(along, usableLength + kerf), oneDimensionalBound(across, usableWidth + kerf));
}
