/**
 * Lid-support sizing. Torque about the hinge line = lid weight × distance from the hinge to the
 * lid's centre of gravity × cos(angle from horizontal); for a uniform lid the largest torque,
 * lid closed, is weight × depth / 2 (secondary: hinge manufacturers' sizing guides).
 */
import type { Part, PieceResult } from '../engine/types.ts';
import { instancesOf } from './instances.ts';
import { lengthText, type DrawingUnits } from './lengthText.ts';
import type { FlowBlock } from './types.ts';
import { SPECIES, isSpeciesId } from '../wood/species.ts';
import { getSheetGood, isSheetGoodId } from '../wood/sheetGoods.ts';

/** Standard gravity, m/s² (CGPM 1901). */
const G = 9.80665;
/** Newton-metres per pound-force inch: 1 lbf·in = 0.1130 N·m. */
const NM_PER_LBF_IN = 0.112985;
const KG_PER_LB = 0.45359237;

/** Density (kg/m³) of a part's material: species at 12 % MC, or the sheet good's approximate figure. */
function densityOf(part: Part): number | null {
  if (part.material.kind === 'solid') return isSpeciesId(part.material.speciesId) ? SPECIES[part.material.speciesId].densityKgM3At12 : null;
  return isSheetGoodId(part.material.sheetId) ? getSheetGood(part.material.sheetId).densityKgM3 : null;
}

/**
 * Largest torque (N·m) a uniform lid of `massKg` and `depthMm` puts on its hinge line, lid
 * closed: weight × depth / 2 (secondary: hinge manufacturers' sizing guides).
 */
export function lidTorqueNm(massKg: number, depthMm: number): number {
  return (massKg * G * (depthMm / 1000)) / 2;
}

/** Converts N·m to lbf·in (1 lbf·in = 0.1130 N·m). */
export function lbfInFromNm(nm: number): number {
  return nm / NM_PER_LBF_IN;
}

/** The lid's weight and the torque it puts on its supports. */
export interface LidTorque {
  /** Lid and battens together, kg. */
  massKg: number;
  /** Front-to-back depth of the lid, mm. */
  depthMm: number;
  /** Largest torque about the hinge line (lid closed), N·m and lbf·in. */
  torqueNm: number;
  torqueLbfIn: number;
  hinges: number;
}

/** Weight and torque of the lid (and battens fixed to it), or null when the piece has no lid. */
export function lidTorque(result: PieceResult): LidTorque | null {
  const lids = instancesOf(result).filter((i) => i.part.role === 'lid');
  if (lids.length === 0) return null;
  const attached = instancesOf(result).filter((i) => i.part.role === 'lid' || i.part.role === 'batten');
  let massKg = 0;
  for (const i of attached) {
    const d = densityOf(i.part);
    if (d === null) continue;
    massKg += (i.part.lengthMm * i.part.widthMm * i.part.thicknessMm * 1e-9) * d;
  }
  const depthMm = Math.max(...lids.map((i) => i.box.max[1] - i.box.min[1]));
  const torqueNm = lidTorqueNm(massKg, depthMm);
  const hingeParam = result.spec.params.hingeCount;
  const hinges = typeof hingeParam === 'number' && hingeParam > 0 ? hingeParam : 2;
  return { massKg, depthMm, torqueNm, torqueLbfIn: lbfInFromNm(torqueNm), hinges };
}

/** The hardware page: hinges and lid supports with the torque they must hold. */
export function hardwareBlocks(result: PieceResult, units: DrawingUnits): FlowBlock[] {
  const t = lidTorque(result);
  if (!t) {
    return [{ type: 'text', title: 'Hardware', paragraphs: ['This piece has no lid; see the parts and joinery pages for the fixings it needs.'] }];
  }
  const p = result.spec.params;
  const rating = typeof p.hingeTorqueRatingNm === 'number' ? p.hingeTorqueRatingNm : 0;
  const perHinge = t.torqueNm / t.hinges;
  const rows: string[][] = [
    ['Lid and battens, weight', `${t.massKg.toFixed(1)} kg`, `${(t.massKg / KG_PER_LB).toFixed(1)} lb`],
    ['Lid depth, hinge to front edge', lengthText(t.depthMm, 'mm'), lengthText(t.depthMm, 'in')],
    ['Largest torque about the hinges (lid closed)', `${t.torqueNm.toFixed(1)} N·m`, `${t.torqueLbfIn.toFixed(0)} lbf·in`],
    [`Torque per hinge or support (${t.hinges})`, `${perHinge.toFixed(1)} N·m`, `${(perHinge / NM_PER_LBF_IN).toFixed(0)} lbf·in`],
    ['Torque at 30° open', `${(t.torqueNm * Math.cos(Math.PI / 6)).toFixed(1)} N·m`, `${((t.torqueNm * Math.cos(Math.PI / 6)) / NM_PER_LBF_IN).toFixed(0)} lbf·in`],
  ];
  if (typeof p.hingeLength === 'number') rows.push(['Hinge leaf length', lengthText(p.hingeLength, units), `${String(t.hinges)} hinges`]);
  const verdict = rating > 0
    ? perHinge <= rating
      ? `The hinges are rated ${rating} N·m each, at least the ${perHinge.toFixed(1)} N·m each must hold.`
      : `The hinges are rated ${rating} N·m each, less than the ${perHinge.toFixed(1)} N·m each must hold: choose stronger supports or add one.`
    : `No hinge rating was given: choose lid supports rated for at least ${perHinge.toFixed(1)} N·m (${(perHinge / NM_PER_LBF_IN).toFixed(0)} lbf·in) each.`;
  return [
    {
      type: 'table', title: 'Hinges and lid supports', head: ['', 'metric', 'imperial'], rows, numericColumns: [1, 2],
      footnote: 'Torque = lid weight × distance from the hinge to its centre of gravity × cos(angle from horizontal); largest closed, weight × depth / 2 (hinge manufacturers\' sizing guides). Weight from WH2010 specific gravity at 12 % moisture content; sheet-good densities approximate.',
    },
    { type: 'text', title: 'Lid support', paragraphs: [verdict, 'Fit a support that holds the lid open at any position and needs no adjustment by the user; follow the hardware maker\'s sizing and mounting instructions.'] },
  ];
}
