/** Drawer boxes against their openings and the slides they run on. */
import type { SlideRule, SlideType } from '../constructions/slides.ts';
import type { Check } from '../types.ts';
import { both, check } from './check.ts';

/** One drawer's box and opening (mm). */
export interface DrawerFitFacts {
  id: string;
  where: string;
  partIds: readonly string[];
  openingHeightMm: number;
  boxHeightMm: number;
  /** Depth from the box's front to the carcass back, less the rear clearance. */
  availableDepthMm: number;
  boxDepthMm: number;
  slide: SlideType;
  rule: SlideRule;
}

/** A box too tall for its opening and slide, or too deep for the case. */
export function drawerFitChecks(f: DrawerFitFacts): Check[] {
  const out: Check[] = [];
  const vertical = f.openingHeightMm - f.boxHeightMm;
  if (vertical < f.rule.minVerticalClearanceMm - 1e-9) {
    out.push(check({
      id: `drawer-too-tall:${f.id}`, severity: 'error', title: `Drawer box too tall (${f.where})`, partIds: f.partIds,
      numbers: { openingHeightMm: f.openingHeightMm, boxHeightMm: f.boxHeightMm, clearanceMm: vertical, neededClearanceMm: f.rule.minVerticalClearanceMm },
      message: `A ${both(f.boxHeightMm)} box in a ${both(f.openingHeightMm)} opening leaves ${both(vertical)}; ${f.slide} slides need at least ${both(f.rule.minVerticalClearanceMm)} to fit and lift out.`,
      fix: `Make the box no taller than ${both(f.openingHeightMm - f.rule.minVerticalClearanceMm)} (more clearance above or below it).`,
    }));
  }
  if (f.boxDepthMm > f.availableDepthMm + 1e-9) {
    out.push(check({
      id: `drawer-too-deep:${f.id}`, severity: 'error', title: `Drawer box too deep (${f.where})`, partIds: f.partIds,
      numbers: { boxDepthMm: f.boxDepthMm, availableDepthMm: f.availableDepthMm, overMm: f.boxDepthMm - f.availableDepthMm },
      message: `A ${both(f.boxDepthMm)} box needs more than the ${both(f.availableDepthMm)} inside the case: it hits the back before the front closes.`,
      fix: f.rule.lengthsMm ? `Use a shorter slide (the longest that fits is chosen when the drawer depth is left at 0).` : `Make the box no deeper than ${both(f.availableDepthMm)}.`,
    }));
  }
  return out;
}

/**
 * How far the drawers come out, for room fit: full-extension slides bring the whole box out
 * (the usual ball-bearing and undermount slides; common practice, check the slide you buy);
 * wooden runners have no stop, so a drawer can come all the way out.
 */
export function drawerTravelCheck(drawers: readonly { partIds: readonly string[]; boxDepthMm: number }[], slide: SlideType): Check[] {
  if (drawers.length === 0) return [];
  const travelMm = Math.max(...drawers.map((d) => d.boxDepthMm));
  return [check({
    id: 'drawer-travel', severity: 'info', title: 'How far the drawers open', partIds: [...new Set(drawers.flatMap((d) => d.partIds))],
    numbers: { travelMm, drawers: drawers.length },
    message: slide === 'wood-runners'
      ? `The drawers run on wooden runners with no stop: each can come all the way out, ${both(travelMm)} at the deepest. Leave that much clear floor in front.`
      : `On full-extension ${slide} slides each drawer opens its whole depth, ${both(travelMm)} at the deepest. Leave that much clear floor in front.`,
  })];
}

/** Undermount slides hide under the box: they want its bottom set up in the sides about 1/2 in (common practice, from memory). */
export const UNDERMOUNT_SET_UP_MM = 12.7;

/** A box on undermount slides whose bottom sits too low for the slide to fit under it. */
export function undermountSetUpCheck(partIds: readonly string[], slide: SlideType, setUpMm: number): Check[] {
  if (slide !== 'undermount' || setUpMm >= UNDERMOUNT_SET_UP_MM - 1e-9) return [];
  return [check({
    id: 'undermount-set-up', severity: 'warning', title: 'Drawer bottoms too low for undermount slides', partIds,
    numbers: { setUpMm, neededMm: UNDERMOUNT_SET_UP_MM },
    message: `The bottoms sit ${both(setUpMm)} up from the sides' lower edges; undermount slides fit under the bottom and usually want about ${both(UNDERMOUNT_SET_UP_MM)}.`,
    fix: `Set the bottom groove ${both(UNDERMOUNT_SET_UP_MM)} up, or as the slide's instructions say.`,
  })];
}
