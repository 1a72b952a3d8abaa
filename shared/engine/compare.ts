/** Summaries and comparisons of built pieces, for cards, revision lists and compare views. */
import type { PieceResult, Severity } from './types.ts';

/** The few numbers a design card or revision list shows. */
export interface ResultSummary {
  widthMm: number;
  depthMm: number;
  heightMm: number;
  /** Pieces to cut, counting quantities. */
  partCount: number;
  boardFeet: number;
  checkCounts: Record<Severity, number>;
}

/** Overall size, part count, board feet and checks by severity. */
export function summarizeResult(result: PieceResult): ResultSummary {
  const checkCounts: Record<Severity, number> = { error: 0, warning: 0, caution: 0, info: 0 };
  for (const c of result.checks) checkCounts[c.severity] += 1;
  return {
    widthMm: result.bboxMm[0], depthMm: result.bboxMm[1], heightMm: result.bboxMm[2],
    partCount: result.parts.reduce((s, p) => s + p.quantity, 0),
    boardFeet: result.derived.boardFeet.total,
    checkCounts,
  };
}

/** What changed between two built pieces. */
export interface ResultComparison {
  paramsChanged: { key: string; from: unknown; to: unknown }[];
  partsAdded: string[];
  partsRemoved: string[];
  partsResized: { id: string; name: string; from: [number, number, number]; to: [number, number, number] }[];
}

const SIZE_TOLERANCE_MM = 1e-6;

/**
 * True when two stored parameter values differ by more than arithmetic noise: numbers within
 * `SIZE_TOLERANCE_MM` of each other (a length typed in inches and read back, say) are the same.
 * How much a maker can see is the client's to judge, at the precision it shows.
 */
export function paramValuesDiffer(from: unknown, to: unknown): boolean {
  if (typeof from === 'number' && typeof to === 'number') return Math.abs(from - to) > SIZE_TOLERANCE_MM;
  return JSON.stringify(from) !== JSON.stringify(to);
}

/** Parameters changed, parts added and removed (by id), and parts whose finished size changed. */
export function compareResults(a: PieceResult, b: PieceResult): ResultComparison {
  const keys = [...new Set([...Object.keys(a.spec.params), ...Object.keys(b.spec.params)])];
  const paramsChanged = keys
    .filter((k) => paramValuesDiffer(a.spec.params[k], b.spec.params[k]))
    .map((key) => ({ key, from: a.spec.params[key], to: b.spec.params[key] }));
  for (const key of ['buildMcPercent', 'lowMcPercent', 'highMcPercent'] as const) {
    const from = a.spec.climate?.[key];
    const to = b.spec.climate?.[key];
    if (from !== to) paramsChanged.push({ key: `climate.${key}`, from, to });
  }
  const before = new Map(a.parts.map((p) => [p.id, p]));
  const after = new Map(b.parts.map((p) => [p.id, p]));
  const partsResized: ResultComparison['partsResized'] = [];
  for (const [id, p] of after) {
    const q = before.get(id);
    if (!q) continue;
    const from: [number, number, number] = [q.lengthMm, q.widthMm, q.thicknessMm];
    const to: [number, number, number] = [p.lengthMm, p.widthMm, p.thicknessMm];
    if (from.some((v, i) => Math.abs(v - to[i]!) > SIZE_TOLERANCE_MM)) partsResized.push({ id, name: p.name, from, to });
  }
  return {
    paramsChanged,
    partsAdded: [...after.keys()].filter((id) => !before.has(id)),
    partsRemoved: [...before.keys()].filter((id) => !after.has(id)),
    partsResized,
  };
}
