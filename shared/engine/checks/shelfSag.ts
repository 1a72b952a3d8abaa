/**
 * Shelf sag: mid-span deflection of a shelf under a uniform load, δ = 5wL⁴/(384EI) (simply
 * supported beam; see `structure/beam.ts` for the source), with the modulus of elasticity from
 * the species table (WH2010 Table 5-3) or the sheet-goods table, each with its confidence.
 * Compared with a visible-sag limit of 1/32 in per foot of span (span/384): a limit makers
 * commonly use — common practice, no published source. Fixed shelves are treated as simply
 * supported too, which errs on the safe side (a glued dado holds the ends a little).
 */
import { uniformLoadDeflectionMm, longestSpanMm } from '../structure/beam.ts';
import type { Check } from '../types.ts';
import { both, check } from './check.ts';

/** Visible sag limit: 1/32 in per 12 in of span. Common practice, no published source. */
export const SAG_LIMIT_PER_SPAN = 1 / 32 / 12;
/** Standard gravity, m/s² (exact by definition). */
const G = 9.80665;

/** One shelf's facts (mm, MPa, N·mm², kg/m). */
export interface ShelfSagFacts {
  id: string;
  title: string;
  partIds: readonly string[];
  spanMm: number;
  loadKgPerM: number;
  eiNmm2: number;
  /** The modulus used, its material and source, for the message. */
  modulusMPa: number;
  modulusSource: string;
  approximate: boolean;
  thicknessMm: number;
  /** EI of the same shelf one sheet or board size thicker, and with an edge strip, for the fixes; null when not offered. */
  thickerEiNmm2: number | null;
  thickerLabel: string;
  withStripEiNmm2: number | null;
}

/** The sag of one shelf under its load, against the visible-sag limit, with the fixes that pass. */
export function shelfSagCheck(f: ShelfSagFacts): Check {
  const w = (f.loadKgPerM * G) / 1000; // N/mm
  const sag = uniformLoadDeflectionMm(w, f.spanMm, f.eiNmm2);
  const limit = SAG_LIMIT_PER_SPAN * f.spanMm;
  const maxSpan = longestSpanMm(w, f.eiNmm2, SAG_LIMIT_PER_SPAN);
  const numbers: Record<string, number> = {
    spanMm: f.spanMm, loadKgPerM: f.loadKgPerM, loadNPerMm: w, modulusMPa: f.modulusMPa, eiNmm2: f.eiNmm2,
    sagMm: sag, limitMm: limit, longestSpanMm: maxSpan, centreSupportSagMm: uniformLoadDeflectionMm(w, f.spanMm / 2, f.eiNmm2),
  };
  const approx = f.approximate ? ' (approximate: the modulus is from memory)' : '';
  const facts = `Under ${Math.round(f.loadKgPerM)} kg per metre spread along it, a ${both(f.spanMm)} span sags about ${both(sag)} at mid-span${approx}; the visible-sag limit of 1/32 in per foot is ${both(limit)}. Modulus ${Math.round(f.modulusMPa)} MPa from ${f.modulusSource}; δ = 5wL⁴/384EI for a simply supported shelf.`;
  if (sag <= limit) {
    return check({ id: `shelf-sag:${f.id}`, severity: 'info', title: `Shelf sag: ${f.title}`, partIds: f.partIds, numbers, message: facts });
  }
  const fixes: string[] = [];
  if (f.thickerEiNmm2) {
    const s = uniformLoadDeflectionMm(w, f.spanMm, f.thickerEiNmm2);
    numbers.thickerSagMm = s;
    fixes.push(`a ${f.thickerLabel} shelf (${both(s)})`);
  }
  if (f.withStripEiNmm2) {
    const s = uniformLoadDeflectionMm(w, f.spanMm, f.withStripEiNmm2);
    numbers.withStripSagMm = s;
    fixes.push(`a solid edge strip on the front edge (${both(s)})`);
  }
  fixes.push(`a span no longer than ${both(maxSpan)}`, `a centre support, which cuts the sag to ${both(numbers.centreSupportSagMm!)}`);
  return check({
    id: `shelf-sag:${f.id}`, severity: 'warning', title: `Shelf sags: ${f.title}`, partIds: f.partIds, numbers,
    message: `${facts} It will sag visibly, and more over the years as wood and sheet goods creep under a steady load.`,
    fix: `Use ${fixes.join(', or ')}.`,
  });
}
