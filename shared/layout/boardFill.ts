/**
 * One board being filled. The saw first crosscuts the board into lengths (sections), then rips
 * each length into parts side by side, the usual order at the mill: the longest part of a
 * section sets its length. Defects are cut around: no part may cover one, and a kerf is left
 * between a part and a defect. A grain-matched run takes consecutive lengths in its order. The
 * class mutates itself (`tryPlace`); `clone` copies it for
 * look-ahead.
 */
import type { BoardItem } from './boardInput.ts';
import type { BoardDefect, BoardStock } from './boardTypes.ts';

interface Section {
  x: number;
  length: number;
  /** Width used so far across the board, kerfs included. */
  usedWidth: number;
}

/** An item placed on the board: its low corner, mm. */
export interface BoardSpot {
  item: BoardItem;
  x: number;
  y: number;
}

interface Region {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
}

/** The parts of a run at one order: one crosscut length, ripped side by side; mm. */
export interface RunSlot {
  items: BoardItem[];
  /** The longest part's length, and the parts' widths with a kerf between each two. */
  length: number;
  width: number;
}

/** Splits a run sorted by order into its slots, one per order. */
export function runSlots(run: readonly BoardItem[], kerf: number): RunSlot[] {
  const slots: RunSlot[] = [];
  let last: RunSlot | undefined;
  for (const item of run) {
    if (last && last.items[0]!.order === item.order) {
      last.items.push(item);
      last.length = Math.max(last.length, item.lengthMm);
      last.width += kerf + item.widthMm;
    } else {
      last = { items: [item], length: item.lengthMm, width: item.widthMm };
      slots.push(last);
    }
  }
  return slots;
}

/** A board's sections and placed items; sizes in mm. */
export class BoardFill {
  readonly spots: BoardSpot[] = [];
  private sections: Section[] = [];
  private cursor = 0;
  private readonly defects: readonly Region[];

  constructor(
    readonly stockIndex: number,
    readonly stock: BoardStock,
    readonly kerf: number,
  ) {
    this.defects = stock.defects.map((d: BoardDefect) => ({ x0: d.startMm, x1: d.endMm, y0: d.fromEdgeMm ?? 0, y1: d.toEdgeMm ?? stock.widthMm }));
  }

  /** A copy to try placements on without changing this board. */
  clone(): BoardFill {
    const copy = new BoardFill(this.stockIndex, this.stock, this.kerf);
    copy.spots.push(...this.spots);
    copy.sections = this.sections.map((s) => ({ ...s }));
    copy.cursor = this.cursor;
    return copy;
  }

  /** Places `item` beside others in the best-fitting section, or in a new section; false if it will not go. */
  tryPlace(item: BoardItem): boolean {
    let best: { section: Section; y: number; rest: number } | null = null;
    for (const section of this.sections) {
      if (item.lengthMm > section.length) continue;
      const y = this.clearY(section.x, item.lengthMm, section.usedWidth, item.widthMm);
      if (y === null) continue;
      const rest = (section.length - item.lengthMm) * item.widthMm + (this.stock.widthMm - y - item.widthMm) * section.length;
      if (best === null || rest < best.rest) best = { section, y, rest };
    }
    if (best) {
      this.put(item, best.section, best.y);
      return true;
    }
    for (let x = this.cursor; x + item.lengthMm <= this.stock.lengthMm; ) {
      const y = this.clearY(x, item.lengthMm, 0, item.widthMm);
      if (y !== null) {
        const section = { x, length: item.lengthMm, usedWidth: 0 };
        this.sections.push(section);
        this.cursor = x + item.lengthMm + this.kerf;
        this.put(item, section, y);
        return true;
      }
      // A defect across the whole usable width: start past the first one in the way.
      const blocking = this.defects.filter((d) => d.x0 < x + item.lengthMm && d.x1 > x).sort((a, b) => a.x1 - b.x1)[0];
      if (!blocking) return false;
      x = blocking.x1 + this.kerf;
    }
    return false;
  }

  /**
   * Places `run` (sorted by order) on fresh length of the board: one crosscut length per order,
   * end to end with a kerf between, parts of one order ripped side by side in it (the boards of a
   * glued-up front), all from one edge line; or nothing. False if it will not go.
   */
  tryPlaceRun(run: readonly BoardItem[]): boolean {
    const slots = runSlots(run, this.kerf);
    let total = -this.kerf;
    for (const slot of slots) total += slot.length + this.kerf;
    for (let x = this.cursor; x + total <= this.stock.lengthMm; ) {
      const y = this.runY(slots, x);
      if (y !== null) {
        let at = x;
        for (const slot of slots) {
          const section = { x: at, length: slot.length, usedWidth: 0 };
          this.sections.push(section);
          let across = y;
          for (const item of slot.items) {
            this.put(item, section, across);
            across += item.widthMm + this.kerf;
          }
          at += slot.length + this.kerf;
        }
        this.cursor = at;
        return true;
      }
      const blocking = this.defects.filter((d) => d.x0 < x + total && d.x1 > x).sort((a, b) => a.x1 - b.x1)[0];
      if (!blocking) return false;
      x = blocking.x1 + this.kerf;
    }
    return false;
  }

  /** Where the saw crosscuts the board, mm from its end: after each section but the last. */
  crosscuts(): number[] {
    return this.sections
      .map((s) => s.x + s.length)
      .filter((at) => at < this.stock.lengthMm)
      .sort((a, b) => a - b);
  }

  /** Rough area placed, mm². */
  area(): number {
    let total = 0;
    for (const spot of this.spots) total += spot.item.lengthMm * spot.item.widthMm;
    return total;
  }

  private put(item: BoardItem, section: Section, y: number): void {
    section.usedWidth = y + item.widthMm + this.kerf;
    this.spots.push({ item, x: section.x, y });
  }

  // The lowest edge line where every slot of a run, end to end from `x`, misses every defect.
  private runY(slots: readonly RunSlot[], x: number): number | null {
    let y = 0;
    for (let moved = true; moved; ) {
      moved = false;
      let at = x;
      for (const slot of slots) {
        const clear = this.clearY(at, slot.length, y, slot.width);
        if (clear === null) return null;
        if (clear > y) {
          y = clear;
          moved = true;
          break;
        }
        at += slot.length + this.kerf;
      }
    }
    return y;
  }

  // The lowest y ≥ `from` where a `length` × `width` part at `x` misses every defect and stays on the board.
  private clearY(x: number, length: number, from: number, width: number): number | null {
    let y = from;
    for (;;) {
      if (y + width > this.stock.widthMm) return null;
      const hit = this.defects.find((d) => d.x0 < x + length && d.x1 > x && d.y0 < y + width && d.y1 > y);
      if (!hit) return y;
      y = hit.y1 + this.kerf;
    }
  }
}
