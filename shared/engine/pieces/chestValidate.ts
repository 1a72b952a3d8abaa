/**
 * Combinations of chest parameters that cannot be built, rejected before anything is computed.
 * Each error names the parameter to change and the limit it must meet, in mm. Designs that
 * can be built but are weak or wrong (a tongue too long for its groove, a groove too near a
 * face) are not rejected here: they build and carry a check.
 */
import { InputError } from '../../errors.ts';
import { DEFAULT_CLIMATE, type Climate } from '../../wood/climate.ts';
import type { ParamValue } from '../types.ts';
import { chestLayout, type ChestLayout, type ChestParams } from './chestLayout.ts';

/** Narrowest panel opening the engine builds: 1 in. Casewright's limit. */
export const MIN_PANEL_OPENING_MM = 25.4;
/** Least stub tenon left beside a groove or a haunch: 1/4 in. Casewright's limit. */
export const MIN_TONGUE_MM = 6.35;
/** Least width of the cleat the bottom bears on, beyond its clearance: 1/4 in. Casewright's limit. */
export const MIN_BEARING_MM = 6.35;

const r = (n: number): number => Math.round(n * 100) / 100;
const atMost = (n: number): string => `at most ${r(n)} mm`;
const under = (n: number): string => `less than ${r(n)} mm`;
const over = (n: number): string => `more than ${r(n)} mm`;

function fail(field: string, message: string, limit: string): never {
  throw new InputError(field, `${message}; must be ${limit}`, limit);
}

/**
 * Throws an InputError for the first combination of `params` a chest cannot be built with;
 * returns the layout it checked, for the builder to reuse.
 */
export function validateChestCombinations(params: Readonly<Record<string, ParamValue>>, climate: Climate = DEFAULT_CLIMATE): ChestLayout {
  const p = params as unknown as ChestParams;
  const L = p.legSize;
  const T = p.stockThickness;
  const minPanel = MIN_PANEL_OPENING_MM;

  // Plan: legs, stiles and panels across the width and depth.
  for (const [field, size, count] of [['width', p.width, p.frontStileCount], ['depth', p.depth, p.sideStileCount]] as const) {
    if (2 * L + minPanel > size) fail('legSize', `legs of ${r(L)} mm leave no room for a panel in a ${field} of ${r(size)} mm (legs wider than half the ${field})`, atMost((size - minPanel) / 2));
    const span = size - 2 * L;
    if (count > 0 && count * p.stileWidth + (count + 1) * minPanel > span) {
      const stileField = field === 'width' ? 'frontStileCount' : 'sideStileCount';
      const most = Math.floor((span - minPanel) / (p.stileWidth + minPanel));
      fail(stileField, `${count} centre stiles ${r(p.stileWidth)} mm wide do not fit between the legs (${r(span)} mm) with panels at least ${r(minPanel)} mm wide`, `at most ${Math.max(0, most)}`);
    }
  }
  if (T > L) fail('stockThickness', `rails ${r(T)} mm thick are thicker than the legs`, atMost(L));

  // Elevation: foot, rails and a panel between them, under the lid.
  const legLength = p.height - p.lidThickness;
  if (legLength <= p.footHeight + p.bottomRailWidth + p.topRailWidth + minPanel - 1e-9) {
    fail('topRailWidth', `the rails (${r(p.topRailWidth)} + ${r(p.bottomRailWidth)} mm) and foot (${r(p.footHeight)} mm) are wider than the height allows under a ${r(p.lidThickness)} mm lid (${r(legLength)} mm of leg)`, atMost(legLength - p.footHeight - p.bottomRailWidth - minPanel));
  }

  // Grooves and tongues.
  if (p.grooveWidth >= T) fail('grooveWidth', `a ${r(p.grooveWidth)} mm groove is as wide as the ${r(T)} mm stock`, under(T));
  if (p.legGrooveDepth >= L) fail('legGrooveDepth', `a ${r(p.legGrooveDepth)} mm groove is deeper than the ${r(L)} mm leg`, under(L));
  if (p.railTongueLength >= L) fail('railTongueLength', `a ${r(p.railTongueLength)} mm tongue is longer than the ${r(L)} mm leg is thick`, under(L));
  const narrowRail = Math.min(p.topRailWidth, p.bottomRailWidth);
  if (p.frameGrooveDepth + MIN_TONGUE_MM > narrowRail) fail('frameGrooveDepth', `a ${r(p.frameGrooveDepth)} mm groove is deeper than the ${r(narrowRail)} mm rail can take`, atMost(narrowRail - MIN_TONGUE_MM));
  if (p.legGrooveStop + p.frameGrooveDepth + MIN_TONGUE_MM > narrowRail) {
    fail('legGrooveStop', `stopping the leg groove ${r(p.legGrooveStop)} mm short leaves less than ${r(MIN_TONGUE_MM)} mm of tongue on the ${r(narrowRail)} mm rail`, atMost(narrowRail - p.frameGrooveDepth - MIN_TONGUE_MM));
  }
  if (p.tongueClearance >= p.frameGrooveDepth) fail('tongueClearance', `a ${r(p.tongueClearance)} mm clearance leaves no tongue in a ${r(p.frameGrooveDepth)} mm groove`, under(p.frameGrooveDepth));
  if ((p.frontStileCount > 0 || p.sideStileCount > 0) && 2 * p.frameGrooveDepth + MIN_TONGUE_MM > p.stileWidth) {
    fail('stileWidth', `a ${r(p.stileWidth)} mm centre stile with ${r(p.frameGrooveDepth)} mm grooves in both edges breaks through`, `at least ${r(2 * p.frameGrooveDepth + MIN_TONGUE_MM)} mm`);
  }
  const offsetLimit = (L - T) / 2;
  if (Math.abs(p.backGrooveOffset) > offsetLimit + 1e-9) fail('backGrooveOffset', `a ${r(p.backGrooveOffset)} mm offset puts the back rail outside the ${r(L)} mm leg`, `between ${r(-offsetLimit)} mm and ${r(offsetLimit)} mm`);

  // Panels sit with their outer face on the groove's outer wall; they may not stand inside the rails.
  const panelField = p.panelMaterial === 'plywood' ? 'panelSheet' : 'panelThickness';
  const layout = chestLayout(p, climate);
  const maxPanel = (T + p.grooveWidth) / 2;
  if (layout.panelThicknessMm > maxPanel + 1e-9) fail(panelField, `a ${r(layout.panelThicknessMm)} mm panel would stand inside the rails' inner face`, atMost(maxPanel));

  // Float must leave the panel a tongue in every groove at its build size.
  for (const [wall, wf] of [['front and back', layout.floats.frontBack], ['side', layout.floats.side]] as const) {
    const gap = wf.float.gapEachSideMm;
    const need = gap + 0.5;
    if (need > wf.grooveDepthMm) {
      const field = p.panelMaterial === 'solid' && p.panelGrain === 'vertical' && p.legGrooveDepth < p.frameGrooveDepth ? 'legGrooveDepth' : 'frameGrooveDepth';
      fail(field, `the ${wall} panels need ${r(gap)} mm of float each side, which leaves no tongue in a ${r(wf.grooveDepthMm)} mm groove`, `at least ${r(need)} mm`);
    }
  }

  // Bottom and cleats inside the bottom rail.
  if (layout.bottomThicknessMm + p.cleatWidth > p.bottomRailWidth) {
    fail('cleatWidth', `the bottom (${r(layout.bottomThicknessMm)} mm) on a ${r(p.cleatWidth)} mm cleat is deeper than the ${r(p.bottomRailWidth)} mm bottom rail`, atMost(p.bottomRailWidth - layout.bottomThicknessMm));
  }
  if (p.cleatThickness < p.bottomClearance + MIN_BEARING_MM) fail('cleatThickness', `a ${r(p.cleatThickness)} mm cleat leaves the bottom less than ${r(MIN_BEARING_MM)} mm to rest on`, `at least ${r(p.bottomClearance + MIN_BEARING_MM)} mm`);
  const sideCleat = Math.min(p.depth - L, layout.inner.back - p.cleatThickness) - Math.max(L, layout.inner.front + p.cleatThickness);
  if (sideCleat < minPanel) fail('cleatThickness', `cleats ${r(p.cleatThickness)} mm thick leave the side cleats only ${r(sideCleat)} mm long`, atMost(p.cleatThickness - (minPanel - sideCleat)));

  // Lid, battens, hinges, finger notch.
  const interiorHeight = layout.legLengthMm - layout.panelZ[0];
  if (p.battenCount > 0) {
    if (p.battenCount * p.battenWidth + (p.battenCount + 1) * MIN_TONGUE_MM > layout.spanXMm) {
      fail('battenCount', `${p.battenCount} battens ${r(p.battenWidth)} mm wide do not fit between the legs (${r(layout.spanXMm)} mm)`, `at most ${Math.max(0, Math.floor((layout.spanXMm - MIN_TONGUE_MM) / (p.battenWidth + MIN_TONGUE_MM)))}`);
    }
    if (p.battenThickness >= interiorHeight - layout.bottomThicknessMm) fail('battenThickness', `${r(p.battenThickness)} mm battens would reach the bottom`, under(interiorHeight - layout.bottomThicknessMm));
    if (layout.battenYRange[1] - layout.battenYRange[0] < minPanel) fail('depth', `the inside depth leaves no room for lid battens`, over(p.depth + minPanel));
  }
  if ((p.hingeCount + 1) * p.hingeLength > layout.spanXMm) {
    fail('hingeCount', `${p.hingeCount} hinges ${r(p.hingeLength)} mm long, each set one leaf-length in from the legs, do not fit along ${r(layout.spanXMm)} mm`, `at most ${Math.max(0, Math.floor(layout.spanXMm / p.hingeLength) - 1)}`);
  }
  if (layout.lidRecessMm * 2 > p.lidThickness) fail('hingeLeafThickness', `a ${r(layout.lidRecessMm)} mm hinge recess takes more than half the ${r(p.lidThickness)} mm lid`, atMost(p.lidThickness / (p.hingeRecess === 'lid' ? 4 : 2)));
  if (layout.railRecessMm > 0) {
    if (p.hingeLeafWidth > T) fail('hingeLeafWidth', `a ${r(p.hingeLeafWidth)} mm leaf is wider than the ${r(T)} mm back rail's edge`, atMost(T));
    if (layout.railRecessMm + p.frameGrooveDepth + MIN_TONGUE_MM > p.topRailWidth) fail('hingeLeafThickness', `a ${r(layout.railRecessMm)} mm recess in the back rail meets its groove`, atMost(p.topRailWidth - p.frameGrooveDepth - MIN_TONGUE_MM));
  }
  if (p.hingeLeafWidth * 2 > p.depth) fail('hingeLeafWidth', `a ${r(p.hingeLeafWidth)} mm leaf is wider than half the chest's depth`, atMost(p.depth / 2));
  if (p.fingerNotch) {
    if (p.fingerNotchWidth + 2 * MIN_TONGUE_MM > layout.spanXMm) fail('fingerNotchWidth', `a ${r(p.fingerNotchWidth)} mm finger notch is wider than the front rail between the legs`, atMost(layout.spanXMm - 2 * MIN_TONGUE_MM));
    if (p.fingerNotchDepth + p.frameGrooveDepth + MIN_TONGUE_MM > p.topRailWidth) fail('fingerNotchDepth', `a ${r(p.fingerNotchDepth)} mm finger notch reaches the panel groove of the ${r(p.topRailWidth)} mm top rail`, atMost(p.topRailWidth - p.frameGrooveDepth - MIN_TONGUE_MM));
  }
  return layout;
}
