/**
 * The finishing schedule: stages, coats, grits between coats and drying times, with the area
 * to cover computed from the parts (every face of every part, inside and out) and the finish to
 * buy. Coverage and drying times are typical manufacturer figures, approximate: the can's label
 * governs.
 */
import type { PieceResult } from '../engine/types.ts';
import type { FlowBlock } from './types.ts';

const M2_PER_FT2 = 0.09290304;
const LITRES_PER_US_QUART = 0.946353;

/** Coverage of a brushed or wiped oil-based varnish per coat, m² per litre (typical manufacturer coverage, approximate). */
export const VARNISH_COVERAGE_M2_PER_L = 11;
/** Coats of varnish in the schedule. */
export const VARNISH_COATS = 3;
/** Extra finish bought for loss in the can, rag and brush (common practice, no published source). */
export const FINISH_WASTE = 0.15;

/** Surface area of every face of every part, m². */
export function finishAreaM2(result: PieceResult): number {
  let mm2 = 0;
  for (const p of result.parts) {
    const { lengthMm: l, widthMm: w, thicknessMm: t } = p;
    mm2 += p.quantity * 2 * (l * w + l * t + w * t);
  }
  return mm2 * 1e-6;
}

/** Litres of finish for `coats` coats over `areaM2`, with the waste allowance. */
export function finishLitres(areaM2: number, coats: number = VARNISH_COATS, coverageM2PerL: number = VARNISH_COVERAGE_M2_PER_L): number {
  return (areaM2 * coats * (1 + FINISH_WASTE)) / coverageM2PerL;
}

/** The finishing page's blocks. */
export function finishingBlocks(result: PieceResult): FlowBlock[] {
  const area = finishAreaM2(result);
  const litres = finishLitres(area);
  return [
    {
      type: 'table',
      title: 'Finishing schedule',
      head: ['Stage', 'What', 'Grit', 'Dry before next'],
      rows: [
        ['1', 'Sand every part before glue-up; ease sharp edges', '120, then 150, then 180', '—'],
        ['2', 'Wipe with a damp cloth to raise the grain; sand lightly when dry', '220', '1 h'],
        ['3', 'Coat 1 of oil-based varnish, thinned about 1:1 as a sealer', '—', '24 h'],
        ['4', 'Scuff-sand; remove dust', '320', '—'],
        ['5', 'Coat 2, full strength', '—', '24 h'],
        ['6', 'Scuff-sand; remove dust', '320', '—'],
        ['7', 'Coat 3, full strength; rub out with 0000 steel wool or a fine pad when cured', '—', '72 h before use'],
      ],
      numericColumns: [0],
      footnote: 'Drying times are typical manufacturer figures at about 21 °C and 50 % relative humidity, approximate; the can\'s label governs. Finish both faces of panels, the lid and the bottom alike so they take up and lose moisture evenly (common practice).',
    },
    {
      type: 'table',
      title: 'Area and quantity',
      head: ['', 'metric', 'imperial'],
      rows: [
        ['Area to cover: every face of every part', `${area.toFixed(2)} m²`, `${(area / M2_PER_FT2).toFixed(1)} ft²`],
        [`Finish for ${VARNISH_COATS} coats, with ${Math.round(FINISH_WASTE * 100)} % for loss`, `${litres.toFixed(2)} L`, `${(litres / LITRES_PER_US_QUART).toFixed(2)} US qt`],
      ],
      numericColumns: [1, 2],
      footnote: `Coverage ${VARNISH_COVERAGE_M2_PER_L} m²/L per coat (about ${Math.round((VARNISH_COVERAGE_M2_PER_L / M2_PER_FT2) * 3.785411784)} ft²/US gal): typical manufacturer coverage, approximate.`,
    },
  ];
}
