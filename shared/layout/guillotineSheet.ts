/**
 * One sheet being filled, kept as a list of free rectangles that guillotine cuts have made
 * (after Jylänki, "A Thousand Ways to Pack the Bin", 2010, GUILLOTINE family). Each part goes
 * into the corner of a free rectangle and the rest of that rectangle is split by two cuts, so
 * every layout can be sawn with edge-to-edge cuts on a panel saw or track saw.
 *
 * The saw kerf is handled by growing every part and the usable sheet by one kerf: a part then
 * keeps a kerf's distance from its neighbours and still reaches the usable edge. This class
 * mutates itself (`place`), which keeps the optimiser's inner loop free of copying.
 */
import type { SawCut } from './sheetTypes.ts';

/** How a free rectangle is chosen for a part: lower score wins. */
export type FitRule = 'best-area' | 'best-short-side' | 'best-long-side' | 'bottom-left';

/** How the rest of a free rectangle is split after a part goes in. */
export type SplitRule = 'shorter-leftover' | 'longer-leftover' | 'min-area' | 'max-area' | 'shorter-axis' | 'longer-axis';

interface Free {
  x: number;
  y: number;
  l: number;
  w: number;
}

/** Where a part would go: free rectangle index, orientation and score. */
export interface Fit {
  freeIndex: number;
  rotated: boolean;
  score: number;
  tie: number;
}

/**
 * A part as placed, in usable-sheet coordinates (trim not added), mm, with the free rectangle
 * it went into and which cut came first, from which {@link cutsOf} rebuilds the saw cuts.
 */
export interface GuillotinePlacement {
  x: number;
  y: number;
  length: number;
  width: number;
  rotated: boolean;
  freeLength: number;
  freeWidth: number;
  acrossFirst: boolean;
}

/** A sheet's free space for the optimiser; sizes in mm. */
export class GuillotineSheet {
  readonly placements: GuillotinePlacement[] = [];
  private readonly free: Free[];

  constructor(
    readonly usableLength: number,
    readonly usableWidth: number,
    readonly kerf: number,
  ) {
    this.free = [{ x: 0, y: 0, l: usableLength + kerf, w: usableWidth + kerf }];
  }

  /** The best free rectangle for a `length` × `width` part in the allowed orientations, or null. */
  findFit(length: number, width: number, orientations: readonly boolean[], rule: FitRule): Fit | null {
    // The hot loop of every attempt: scores are kept in locals so nothing is allocated per try.
    let bestIndex = -1;
    let bestRotated = false;
    let bestScore = Infinity;
    let bestTie = Infinity;
    const l0 = length + this.kerf;
    const w0 = width + this.kerf;
    for (let i = 0; i < this.free.length; i++) {
      const f = this.free[i] as Free;
      for (let o = 0; o < orientations.length; o++) {
        const rotated = orientations[o] as boolean;
        const l = rotated ? w0 : l0;
        const w = rotated ? l0 : w0;
        if (l > f.l || w > f.w) continue;
        const restL = f.l - l;
        const restW = f.w - w;
        let score: number;
        let tie: number;
        if (rule === 'best-area') {
          score = f.l * f.w - l * w;
          tie = restL < restW ? restL : restW;
        } else if (rule === 'best-short-side') {
          score = restL < restW ? restL : restW;
          tie = restL < restW ? restW : restL;
        } else if (rule === 'best-long-side') {
          score = restL < restW ? restW : restL;
          tie = restL < restW ? restL : restW;
        } else {
          score = f.y + w;
          tie = f.x;
        }
        if (score < bestScore || (score === bestScore && tie < bestTie)) {
          bestIndex = i;
          bestRotated = rotated;
          bestScore = score;
          bestTie = tie;
        }
      }
    }
    return bestIndex < 0 ? null : { freeIndex: bestIndex, rotated: bestRotated, score: bestScore, tie: bestTie };
  }

  /** Puts a part where `fit` says and splits the free rectangle by `split`; mutates this sheet. */
  place(length: number, width: number, fit: Fit, split: SplitRule): GuillotinePlacement {
    const f = this.free[fit.freeIndex] as Free;
    const partL = fit.rotated ? width : length;
    const partW = fit.rotated ? length : width;
    const l = partL + this.kerf;
    const w = partW + this.kerf;
    this.free.splice(fit.freeIndex, 1);
    const restL = f.l - l;
    const restW = f.w - w;
    const acrossFirst = splitAcrossFirst(f, l, w, restL, restW, split);
    // Cutting across first (a line of constant y over the whole free width) leaves a strip
    // beside the part as long as the part; cutting along first leaves one above it as wide.
    if (acrossFirst) {
      this.addFree(f.x, f.y + w, f.l, restW);
      this.addFree(f.x + l, f.y, restL, w);
    } else {
      this.addFree(f.x + l, f.y, restL, f.w);
      this.addFree(f.x, f.y + w, l, restW);
    }
    const placed = { x: f.x, y: f.y, length: partL, width: partW, rotated: fit.rotated, freeLength: f.l, freeWidth: f.w, acrossFirst };
    this.placements.push(placed);
    return placed;
  }

  /** Area of the parts placed so far, mm². */
  partArea(): number {
    let area = 0;
    for (const p of this.placements) area += p.length * p.width;
    return area;
  }

  private addFree(x: number, y: number, l: number, w: number): void {
    if (l > this.kerf && w > this.kerf) this.free.push({ x, y, l, w });
  }
}

/**
 * The saw cuts of a filled sheet in the order they are made, in usable-sheet coordinates (mm).
 * Each placement's free rectangle was cut from the sheet before it, so placement order is a
 * valid cutting order. A free rectangle's last kerf belongs to the cut (or virtual edge) beyond
 * it, so a cut spans the free rectangle less one kerf.
 */
export function cutsOf(placements: readonly GuillotinePlacement[], kerf: number): SawCut[] {
  const cuts: SawCut[] = [];
  for (const p of placements) {
    const restL = p.freeLength - p.length - kerf;
    const restW = p.freeWidth - p.width - kerf;
    if (p.acrossFirst) {
      if (restW > 0) cuts.push({ axis: 'y', atMm: p.y + p.width, fromMm: p.x, toMm: p.x + p.freeLength - kerf });
      if (restL > 0) cuts.push({ axis: 'x', atMm: p.x + p.length, fromMm: p.y, toMm: p.y + p.width });
    } else {
      if (restL > 0) cuts.push({ axis: 'x', atMm: p.x + p.length, fromMm: p.y, toMm: p.y + p.freeWidth - kerf });
      if (restW > 0) cuts.push({ axis: 'y', atMm: p.y + p.width, fromMm: p.x, toMm: p.x + p.length });
    }
  }
  return cuts;
}

function splitAcrossFirst(f: Free, l: number, w: number, restL: number, restW: number, split: SplitRule): boolean {
  switch (split) {
    case 'shorter-leftover':
      return restL <= restW;
    case 'longer-leftover':
      return restL > restW;
    case 'min-area':
      return Math.max(f.l * restW, restL * w) <= Math.max(restL * f.w, l * restW);
    case 'max-area':
      return Math.max(f.l * restW, restL * w) > Math.max(restL * f.w, l * restW);
    case 'shorter-axis':
      return f.l <= f.w;
    case 'longer-axis':
      return f.l > f.w;
  }
}
