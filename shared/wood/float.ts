/**
 * Panel float: a panel captured in grooves (a frame-and-panel side, a door) must have room at
 * each side to swell into at its most humid, and enough tongue left in each groove at its
 * driest. The gap each side at build is half the panel's swell plus a fit clearance; the
 * tongue left at the driest is the groove depth less that gap less half the panel's shrinkage.
 * Sheet goods move negligibly (see sheetGoods.ts) and get only the fit clearance.
 */
import { InputError } from '../errors.ts';
import { dual, type DualLength } from '../units/dual.ts';
import { MM_PER_INCH } from '../units/length.ts';
import { checkClimate, type Climate } from './climate.ts';
import { checkWidth, seasonalSwing, seasonalSwingMm, type Sawn, type SeasonalSwing, type SeasonalSwingInput, type SeasonalSwingMm } from './movement.ts';
import { resolveMaterial, type MaterialInput } from './resolve.ts';

/**
 * Clearance each side beyond the seasonal swell so the panel drops into its grooves at
 * assembly: 1/32 in. Common practice, no published source.
 */
export const PANEL_FIT_CLEARANCE_MM = MM_PER_INCH / 32;

/** Inputs for {@link panelFloat}. */
export interface PanelFloatInput {
  /** Panel width across the grain, tongues included, at the build moisture content, mm. */
  panelWidthMm: number;
  /** A species (solid panel), a sheet good, or `'plywood'` / `'mdf'`. */
  material: MaterialInput;
  /** How a solid panel was sawn; default `'unknown'` (the larger movement). */
  sawn?: Sawn;
  /** Depth of the groove at each side, mm. */
  grooveDepthMm: number;
  /**
   * Least tongue to keep in each groove at the driest, mm. Default half the groove depth
   * (common practice, no published source).
   */
  tongueEngagementMinMm?: number;
  /** Fit clearance each side, mm; default {@link PANEL_FIT_CLEARANCE_MM}. */
  fitClearanceMm?: number;
  climate: Climate;
}

/** Whether the groove can hold the panel through the seasons, and the fix if not. */
export interface FloatCheck {
  ok: boolean;
  /** How much engagement is missing at the driest, mm (0 when ok). */
  shortfallMm: number;
  shortfallIn: number;
  shortfall: DualLength;
  /** What to change when not ok; empty when ok. */
  fix: string;
  /** One sentence for the maker. */
  message: string;
}

/** The float a captured panel needs. */
export interface PanelFloat {
  material: { kind: 'solid' | 'sheet'; name: string };
  /** Gap to leave between the panel's edge and the groove bottom at each side, at build, mm. */
  gapEachSideMm: number;
  gapEachSideIn: number;
  gapEachSide: DualLength;
  /** Panel width across the grain at build, tongues included, mm (as given). */
  panelWidthMm: number;
  /** Seasonal swing of the panel; null for sheet goods (negligible movement). */
  movement: SeasonalSwing | null;
  /** Tongue in each groove at build and at the driest, and the least allowed, mm. */
  engagementAtBuildMm: number;
  engagementAtDriestMm: number;
  engagementMinMm: number;
  engagementAtBuild: DualLength;
  engagementAtDriest: DualLength;
  engagementMin: DualLength;
  check: FloatCheck;
  notes: string[];
}

const SHOW = { inchPrecision: 32, mmPrecision: 0.1 } as const;

/**
 * The gap at each side of a panel `panelWidthMm` wide in grooves `grooveDepthMm` deep so that
 * it neither bottoms out at its most humid nor pulls out at its driest, with a check that
 * reports the shortfall and the fix (narrower panel, deeper groove, or plywood).
 */
export function panelFloat(input: PanelFloatInput): PanelFloat {
  const f = floatOf(input, seasonalSwing);
  return {
    material: f.material,
    gapEachSideMm: f.gapEachSideMm,
    gapEachSideIn: f.gapEachSideMm / MM_PER_INCH,
    gapEachSide: dual(f.gapEachSideMm, SHOW),
    panelWidthMm: input.panelWidthMm,
    movement: f.movement,
    engagementAtBuildMm: f.engagementAtBuildMm,
    engagementAtDriestMm: f.engagementAtDriestMm,
    engagementMinMm: f.engagementMinMm,
    engagementAtBuild: dual(f.engagementAtBuildMm, SHOW),
    engagementAtDriest: dual(f.engagementAtDriestMm, SHOW),
    engagementMin: dual(f.engagementMinMm, SHOW),
    check: floatCheck(f),
    notes: f.notes,
  };
}

/**
 * {@link panelFloat} without display text, for the piece engine: the same numbers (mm) and the
 * same refusals; the check's texts are written only on asking ({@link panelFloatCheckOf}).
 */
export interface PanelFloatMm {
  material: { kind: 'solid' | 'sheet'; name: string };
  /** Panel width across the grain at build, tongues included, mm (as given). */
  panelWidthMm: number;
  /** Depth of the groove at each side, mm (as given). */
  grooveDepthMm: number;
  /** Seasonal swing of the panel; null for sheet goods (negligible movement). */
  movement: SeasonalSwingMm | null;
  /** Gap at each side at build, tongue in each groove at build and at the driest, and the least allowed, mm. */
  gapEachSideMm: number;
  engagementAtBuildMm: number;
  engagementAtDriestMm: number;
  engagementMinMm: number;
  /** Fit clearance each side, mm. */
  clearanceMm: number;
  /** How much engagement is missing at the driest, mm (0 when the groove holds the panel). */
  shortfallMm: number;
  /** Whether the least engagement was given rather than the default half groove. */
  minGiven: boolean;
  notes: string[];
}

/** The float a captured panel needs, in numbers only (see {@link panelFloat}). */
export function panelFloatMm(input: PanelFloatInput): PanelFloatMm {
  return floatOf(input, seasonalSwingMm);
}

/** The check {@link panelFloat} would carry for these numbers, texts included. */
export function panelFloatCheckOf(float: PanelFloatMm): FloatCheck {
  return floatCheck(float);
}

// Shared by panelFloat and panelFloatMm so both refuse the same inputs in the same order.
function floatOf<M extends SeasonalSwingMm>(input: PanelFloatInput, swing: (i: SeasonalSwingInput) => M): PanelFloatMm & { movement: M | null } {
  checkWidth(input.panelWidthMm, 'panelWidthMm');
  checkWidth(input.grooveDepthMm, 'grooveDepthMm');
  const climate = checkClimate(input.climate);
  const engagementMinMm = input.tongueEngagementMinMm ?? input.grooveDepthMm / 2;
  checkNonNegative(engagementMinMm, 'tongueEngagementMinMm');
  if (engagementMinMm >= input.grooveDepthMm) {
    throw new InputError('tongueEngagementMinMm', 'must be less than the groove depth', `less than ${dual(input.grooveDepthMm).text.in}`);
  }
  const clearanceMm = input.fitClearanceMm ?? PANEL_FIT_CLEARANCE_MM;
  checkNonNegative(clearanceMm, 'fitClearanceMm');

  const material = resolveMaterial(input.material);
  const movement =
    material.kind === 'solid'
      ? swing({ widthMm: input.panelWidthMm, species: material.species, sawn: input.sawn ?? 'unknown', climate })
      : null;
  const swellMm = movement?.swellMm ?? 0;
  const shrinkMm = movement?.shrinkMm ?? 0;

  const gapEachSideMm = swellMm / 2 + clearanceMm;
  const engagementAtBuildMm = input.grooveDepthMm - gapEachSideMm;
  const engagementAtDriestMm = engagementAtBuildMm - shrinkMm / 2;
  const shortfallMm = Math.max(0, engagementMinMm - engagementAtDriestMm);

  const notes: string[] = movement ? [...movement.notes] : [];
  if (material.kind === 'sheet') notes.push('Sheet goods move negligibly: the gap is the fit clearance alone.');
  if (movement?.approximate) notes.push('Approximate: this species has unconfirmed movement values.');

  const name = material.kind === 'solid' ? material.species.name : material.name;
  return {
    material: { kind: material.kind, name },
    panelWidthMm: input.panelWidthMm,
    grooveDepthMm: input.grooveDepthMm,
    movement,
    gapEachSideMm,
    engagementAtBuildMm,
    engagementAtDriestMm,
    engagementMinMm,
    clearanceMm,
    shortfallMm,
    minGiven: input.tongueEngagementMinMm !== undefined,
    notes,
  };
}

function floatCheck(facts: PanelFloatMm): FloatCheck {
  const shortfall = dual(facts.shortfallMm, SHOW);
  const gap = dual(facts.gapEachSideMm, SHOW);
  const kept = dual(facts.engagementAtDriestMm, SHOW);
  if (facts.shortfallMm === 0) {
    return {
      ok: true, shortfallMm: 0, shortfallIn: 0, shortfall, fix: '',
      message: `ok: leave ${gap.text.in} (${gap.text.mm}) each side; at its driest the panel keeps ${kept.text.in} (${kept.text.mm}) in each groove.`,
    };
  }
  const halfShrinkMm = (facts.movement?.shrinkMm ?? 0) / 2;
  // With the default minimum (half the groove), a deeper groove also raises the minimum.
  const depthNeededMm = facts.minGiven
    ? facts.gapEachSideMm + halfShrinkMm + facts.engagementMinMm
    : 2 * (facts.gapEachSideMm + halfShrinkMm);
  const fixes = [`cut the grooves at least ${dual(depthNeededMm, SHOW).text.in} (${dual(depthNeededMm, SHOW).text.mm}) deep`];
  const perMmOfWidth = facts.movement ? facts.movement.totalMm / facts.panelWidthMm : 0;
  const budgetMm = facts.grooveDepthMm - facts.engagementMinMm - facts.clearanceMm;
  if (perMmOfWidth > 0 && budgetMm > 0) {
    const widest = dual((2 * budgetMm) / perMmOfWidth, { inchPrecision: 16, mmPrecision: 1 });
    fixes.unshift(`make the panel no wider than about ${widest.text.in} (${widest.text.mm})`);
  }
  fixes.push('use a plywood panel, which moves negligibly');
  const shortfallIn = facts.shortfallMm / MM_PER_INCH;
  return {
    ok: false,
    shortfallMm: facts.shortfallMm,
    shortfallIn,
    shortfall,
    fix: capitalise(fixes.join(', or ')) + '.',
    message:
      `short by ${shortfall.text.in} (${shortfall.text.mm}): at its driest the panel keeps ${kept.text.in} (${kept.text.mm}) ` +
      `in each groove, less than the ${dual(facts.engagementMinMm, SHOW).text.in} (${dual(facts.engagementMinMm, SHOW).text.mm}) it needs.`,
  };
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

function checkNonNegative(valueMm: number, field: string): void {
  if (typeof valueMm !== 'number' || !Number.isFinite(valueMm) || valueMm < 0) {
    throw new InputError(field, `must be a length of 0 mm or more (got ${String(valueMm)})`, 'at least 0');
  }
}
