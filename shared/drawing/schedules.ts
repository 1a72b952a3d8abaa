/**
 * The plan set's tables: cut list, joinery schedule, materials and glue-up, read from the
 * engine's derived outputs — nothing here recomputes what the engine already knows.
 */
import type { PieceResult } from '../engine/types.ts';
import { featureFaceText, featureKindText, featureSizeText } from './featureText.ts';
import { lengthText, type DrawingUnits } from './lengthText.ts';
import type { FlowBlock, TableBlock } from './types.ts';

const GRAIN_WORDS = { length: 'along length', width: 'across width', none: '—' } as const;

/** One cut-list table per material: finished and rough sizes, quantity, grain and notes. */
export function cutListBlocks(result: PieceResult, units: DrawingUnits, letters: ReadonlyMap<string, string>): TableBlock[] {
  const u = units === 'in' ? 'in' : 'mm';
  return result.derived.cutList.map((group) => ({
    type: 'table',
    title: `Cut list — ${group.material}`,
    head: ['', 'Part', 'Qty', `Length (${u})`, `Width (${u})`, `Thick (${u})`, `Rough L × W × T (${u})`, 'Grain', 'Notes'],
    rows: group.rows.map((r) => [
      letters.get(r.partId) ?? '',
      r.name,
      String(r.quantity),
      lengthText(r.finished[0], units),
      lengthText(r.finished[1], units),
      lengthText(r.finished[2], units),
      r.rough.map((v) => lengthText(v, units)).join(' × '),
      GRAIN_WORDS[r.grain],
      r.notes.map((n) => n.replace(/\.$/, '')).join('; '),
    ]),
    numericColumns: [2, 3, 4, 5, 6],
    unbrokenColumns: [0, 1, 7],
    footnote: 'Finished sizes include tongues. Rough sizes add the milling allowances; solid stock is rounded up to the next quarter-inch thickness.',
  }));
}

/** The joinery schedule: every joint with its cuts, count, fit and machine set-ups. */
export function joineryBlock(result: PieceResult, units: DrawingUnits): TableBlock {
  const names = new Map(result.parts.map((p) => [p.id, p.name]));
  const name = (id: string): string => names.get(id) ?? id;
  // The cut in the drawing's units, read from the part's own feature (the engine's summary is in mm).
  const features = new Map(result.parts.flatMap((p) => p.features.map((f) => [`${p.id}|${f.id}`, f] as const)));
  const cutText = (partId: string, featureId: string): string | null => {
    const f = features.get(`${partId}|${featureId}`);
    return f ? `${featureKindText(f).toLowerCase()} on ${featureFaceText(f)}, ${featureSizeText(f, units)}` : null;
  };
  const rows: string[][] = result.derived.joinery.length
    ? result.derived.joinery.map((j) => [
        j.type,
        `${name(j.parts[0])} into ${name(j.parts[1])}`,
        String(j.count),
        j.features.map((f) => `${name(f.partId)}: ${cutText(f.partId, f.featureId) ?? f.summary}`).join('\n'),
        j.setUps.map((s) => `${s.tool}: ${s.settings.map((x) => `${x.name} ${lengthText(x.valueMm, units)}`).join(', ')}${s.note ? ` (${s.note})` : ''}`).join('\n'),
        lengthText(j.clearanceMm, units),
        j.floating ? 'no — floats' : j.glued ? 'yes' : 'no',
      ])
    : result.joints.map((j) => [
        j.type,
        `${name(j.members[0].partId)} into ${name(j.members[1].partId)}`,
        String(j.count),
        j.members.map((m) => `${name(m.partId)}: ${m.featureIds.join(', ')}`).join('\n'),
        j.note,
        lengthText(j.clearanceMm, units),
        j.floating ? 'no — floats' : j.glued ? 'yes' : 'no',
      ]);
  return {
    type: 'table',
    title: 'Joinery schedule',
    head: ['Joint', 'Parts', 'Count', 'Cuts', 'Set-ups and notes', 'Clearance', 'Glue'],
    rows,
    numericColumns: [2, 5],
  };
}

/** Board feet by species and stock thickness, and sheet area by sheet good. */
export function materialsBlocks(result: PieceResult): TableBlock[] {
  const bf = result.derived.boardFeet;
  const blocks: TableBlock[] = [{
    type: 'table',
    title: 'Solid wood — board feet',
    head: ['Species', 'Stock', 'Board feet'],
    rows: [
      ...bf.bySpecies.flatMap((s) => Object.entries(s.byThickness).map(([stock, v]) => [s.speciesName, stock, v.toFixed(1)])),
      ['Total', '', bf.total.toFixed(1)],
    ],
    numericColumns: [2],
    footnote: 'Board feet from rough sizes: thickness (in, under 1 in counts as 1) × width (in) × length (ft) / 12 — NHLA rules. Buy 15–30 % more for defects and waste (common practice, no published source).',
  }];
  if (result.derived.sheetArea.length) {
    blocks.push({
      type: 'table',
      title: 'Sheet goods — area',
      head: ['Sheet good', 'Area (ft²)', 'Area (m²)', 'Sheets by area'],
      rows: result.derived.sheetArea.map((s) => [s.sheetName, s.areaFt2.toFixed(1), s.areaM2.toFixed(2), String(s.sheetsByArea)]),
      numericColumns: [1, 2, 3],
      footnote: 'Sheets by area is a lower bound for 48 × 96 in sheets; a cutting diagram may need more.',
    });
  }
  return blocks;
}

/** The glue-up sequence, one text block per stage, with the parts that must float. */
export function glueUpBlocks(result: PieceResult): FlowBlock[] {
  const names = new Map(result.parts.map((p) => [p.id, p.name]));
  return result.derived.glueUp.map((stage) => ({
    type: 'text',
    title: `Glue-up stage ${stage.stage}: ${stage.title}`,
    bullets: true,
    paragraphs: [
      ...stage.steps.map((s) => `${s.title} — ${s.partIds.map((id) => names.get(id) ?? id).join(', ')}${s.notes.length ? `. ${s.notes.join('. ')}` : ''}`),
      ...(stage.floatingPartIds.length
        ? [`Do not glue: ${stage.floatingPartIds.map((id) => names.get(id) ?? id).join(', ')} — it floats in its grooves so it can move with the seasons.`]
        : []),
      'Dry-fit the stage first; have clamps set and cauls ready before the glue is opened.',
    ],
  }));
}
