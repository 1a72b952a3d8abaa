/**
 * The wood-movement page: the climate the piece was designed for, how much each solid part
 * moves across its grain through the seasons (WH2010 Eq. 13-2 through `shared/wood`), the
 * floats the engine's checks found, and the slot lengths cut for moving parts.
 */
import type { PieceResult } from '../engine/types.ts';
import { DEFAULT_CLIMATE } from '../wood/climate.ts';
import { seasonalSwing } from '../wood/movement.ts';
import { isSpeciesId } from '../wood/species.ts';
import { lengthText, type DrawingUnits } from './lengthText.ts';
import type { FlowBlock } from './types.ts';

/** The wood-movement blocks for `result`. */
export function movementBlocks(result: PieceResult, units: DrawingUnits): FlowBlock[] {
  const climate = result.spec.climate ?? DEFAULT_CLIMATE;
  const rows: string[][] = [];
  let approximate = false;
  for (const p of result.parts) {
    if (p.material.kind !== 'solid' || p.grain === 'none' || !isSpeciesId(p.material.speciesId)) continue;
    const across = p.grain === 'length' ? p.widthMm : p.lengthMm;
    const swing = seasonalSwing({ widthMm: across, species: p.material.speciesId, sawn: 'flat', climate });
    approximate ||= swing.approximate || !swing.withinPublishedRange;
    rows.push([
      p.name, String(p.quantity), lengthText(across, units),
      `−${lengthText(swing.shrinkMm, units)}`,
      `+${lengthText(swing.swellMm, units)}`,
      lengthText(swing.totalMm, units),
    ]);
  }
  const floats = result.checks.filter((c) => c.id.startsWith('panel-float') || c.title.toLowerCase().includes('float'));
  const slots = result.parts.flatMap((p) => p.features.filter((f) => f.type === 'slot').map((f) => ({ p, f })));
  const blocks: FlowBlock[] = [
    {
      type: 'text', title: 'Climate',
      paragraphs: [`Built at ${climate.buildMcPercent} % moisture content; in service between ${climate.lowMcPercent} % (driest season) and ${climate.highMcPercent} % (most humid). ${climate.label ?? ''}`.trim()],
    },
    {
      type: 'table', title: 'Seasonal movement across the grain (flat-sawn)',
      head: ['Part', 'Qty', 'Width across grain', 'To driest', 'To most humid', 'Total swing'],
      rows, numericColumns: [1, 2, 3, 4, 5],
      footnote: `WH2010 Eq. 13-2 with Table 13-5 coefficients (flat-sawn, the larger movement).${approximate ? ' Some values use unconfirmed coefficients or lie outside 6–14 % moisture content: approximate.' : ''} Sheet goods move too little to matter.`,
    },
  ];
  if (floats.length) {
    blocks.push({ type: 'text', title: 'Floats', bullets: true, paragraphs: floats.map((c) => `${c.title}: ${c.message}`) });
  }
  if (slots.length) {
    blocks.push({
      type: 'table', title: 'Slots for moving parts', head: ['Part', 'Slot', 'Width', 'Length'],
      rows: slots.map(({ p, f }) => [p.name, f.label, f.type === 'slot' ? lengthText(f.diameterMm, units) : '', f.type === 'slot' ? lengthText(f.slotLengthMm, units) : '']),
      numericColumns: [2, 3],
      footnote: 'Drive each screw at the centre of its slot, snug but not tight, so the part can slide.',
    });
  }
  return blocks;
}
