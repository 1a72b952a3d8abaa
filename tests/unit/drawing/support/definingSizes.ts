/**
 * The sizes a maker needs to make a part, read from the engine's part and its features: each is
 * one or more acceptable texts (a stopped groove's stop may be given from end A or as what is
 * left to end B), so tests can ask that a part drawing writes every one of them.
 */
import { lengthText, type DrawingUnits } from '../../../../shared/drawing/lengthText.ts';
import type { Feature, Part } from '../../../../shared/engine/types.ts';

/** One size to find: what it is, and the texts any one of which says it. */
export interface DefiningSize {
  what: string;
  texts: string[];
}

/** Sizes under this (mm) are not dimensioned (a zero offset, a cut flush with a face). */
const NOTHING_MM = 0.05;

function size(what: string, units: DrawingUnits, ...mm: number[]): DefiningSize[] {
  const kept = mm.filter((v) => v > NOTHING_MM);
  return kept.length ? [{ what, texts: kept.map((v) => lengthText(v, units)) }] : [];
}

/** Holes or slots alike (kind, face, diameter, depth, slot length) on one part. */
function likeKey(f: Extract<Feature, { type: 'hole' | 'slot' }>): string {
  return `${f.type}|${f.face}|${f.diameterMm.toFixed(2)}|${f.depthMm.toFixed(2)}|${f.type === 'slot' ? f.slotLengthMm.toFixed(2) : ''}`;
}

/**
 * Every defining size of `part`: finished length, width and thickness, and for each cut its
 * own sizes and position. A line of like holes needs its diameter, depth and the spacing of
 * the line (the first centre's setback is among the drawing's other sizes).
 */
export function definingSizes(part: Part, units: DrawingUnits): DefiningSize[] {
  const out: DefiningSize[] = [
    ...size('length', units, part.lengthMm), ...size('width', units, part.widthMm), ...size('thickness', units, part.thicknessMm),
  ];
  const holeGroups = new Map<string, Extract<Feature, { type: 'hole' | 'slot' }>[]>();
  for (const f of part.features) {
    const at = `${f.type} ${f.id}`;
    switch (f.type) {
      case 'groove':
      case 'dado':
        out.push(...size(`${at} width`, units, f.widthMm), ...size(`${at} depth`, units, f.depthMm), ...size(`${at} offset`, units, f.offsetMm));
        break;
      case 'stopped-groove':
        out.push(...size(`${at} width`, units, f.widthMm), ...size(`${at} depth`, units, f.depthMm), ...size(`${at} offset`, units, f.offsetMm));
        out.push(...size(`${at} start`, units, f.startMm), ...size(`${at} stop`, units, f.stopMm, part.lengthMm - f.stopMm));
        break;
      case 'tongue':
        out.push(...size(`${at} length`, units, f.lengthMm), ...size(`${at} thickness`, units, f.thicknessMm));
        break;
      case 'rabbet':
        out.push(...size(`${at} width`, units, f.widthMm), ...size(`${at} depth`, units, f.depthMm));
        break;
      case 'notch':
      case 'recess':
      case 'mortise':
        out.push(...size(`${at} length`, units, f.lengthMm), ...size(`${at} width`, units, f.widthMm), ...size(`${at} depth`, units, f.depthMm));
        break;
      case 'hole':
      case 'slot':
        holeGroups.set(likeKey(f), [...(holeGroups.get(likeKey(f)) ?? []), f]);
        break;
    }
  }
  for (const group of holeGroups.values()) {
    const f = group[0]!;
    const at = `${f.type}s like ${f.id} (${group.length})`;
    out.push(...size(`${at} diameter`, units, f.diameterMm), ...size(`${at} depth`, units, f.depthMm));
    if (f.type === 'slot') out.push(...size(`${at} slot length`, units, f.slotLengthMm));
    out.push(...lineSizes(group, at, units));
  }
  return out;
}

/** Local axes in the plane of each face. */
const IN_PLANE: Readonly<Record<Feature['face'], [number, number]>> = {
  'face-a': [0, 1], 'face-b': [0, 1], 'edge-a': [0, 2], 'edge-b': [0, 2], 'end-a': [1, 2], 'end-b': [1, 2],
};
const SPACING_TOLERANCE_MM = 0.05;

/**
 * For each row of three or more evenly spaced holes (one in-plane coordinate shared): the
 * spacing, the first centre's setback from the end and its distance from the edge.
 */
function lineSizes(group: readonly Extract<Feature, { type: 'hole' | 'slot' }>[], at: string, units: DrawingUnits): DefiningSize[] {
  const centres = group.flatMap((f) => {
    const m = f.removed[0];
    return m ? [[0, 1, 2].map((a) => (m.min[a]! + m.max[a]!) / 2)] : [];
  });
  const out: DefiningSize[] = [];
  const [p, q] = IN_PLANE[group[0]!.face];
  for (const [along, across] of [[p, q], [q, p]] as const) {
    const rows = new Map<string, number[]>();
    for (const c of centres) rows.set(c[across]!.toFixed(1), [...(rows.get(c[across]!.toFixed(1)) ?? []), c[along]!]);
    for (const [acrossText, xs] of rows) {
      const sorted = [...xs].sort((a, b) => a - b);
      if (sorted.length < 3) continue;
      const spacing = sorted[1]! - sorted[0]!;
      if (sorted.some((x, i) => i > 0 && Math.abs(x - sorted[i - 1]! - spacing) > SPACING_TOLERANCE_MM)) continue;
      out.push({ what: `${at} spacing`, texts: [`@ ${lengthText(spacing, units)}`] });
      out.push(...size(`${at} first centre from the end`, units, sorted[0]!), ...size(`${at} row from the edge`, units, Number(acrossText)));
    }
  }
  return out;
}

/** True when `text` writes `length` as a whole value, not as the tail of a longer one (`1/4"` in `11/4"`). */
export function writes(text: string, length: string): boolean {
  const escaped = length.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  return new RegExp(`(?<![\\d/.])(?<!\\d )${escaped}`).test(text);
}
