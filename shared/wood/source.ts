/**
 * Where a published value came from and how sure we are of it. The three levels follow the
 * project's reference list: "confirmed" was read in the source, "secondary" comes from a source
 * that cites it, "unconfirmed" is from memory and is shown to makers as approximate.
 */

/** How sure Casewright is of a value. */
export type Confidence = 'confirmed' | 'secondary' | 'unconfirmed';

/** The source of one value or group of values: table, edition and confidence. */
export interface SourceNote {
  /** Table and edition, e.g. `WH2010 Table 13-5 (FPL-GTR-190)`. */
  ref: string;
  confidence: Confidence;
  /** What a maker should know about the value, e.g. which species the row stands for. */
  note?: string;
}

/** True when a value should be shown with "approximate" beside it. */
export function isApproximate(source: SourceNote): boolean {
  return source.confidence === 'unconfirmed';
}

/** WH2010: USDA Forest Products Laboratory, Wood Handbook, FPL-GTR-190 (2010). */
export const WH2010 = 'USDA FPL Wood Handbook, FPL-GTR-190 (2010)';
