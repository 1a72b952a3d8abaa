/**
 * Doors and drawer fronts against each other and the frame: reveals that should read the same
 * all round, fronts that overlap or rub, and a door's free edge that sweeps into its neighbour
 * as it opens. A door of width w and thickness t turning about the hinge edge of its front face
 * carries its back free corner round a circle of radius √(w² + t²), so that corner reaches
 * √(w² + t²) − w past where it sat closed (Pythagoras; the usual hinge knuckle sits near that
 * front edge, so this is the figure to leave between a door and its neighbour).
 */
import type { FrameWidths, FrontMount } from '../constructions/frontGrid.ts';
import type { Check } from '../types.ts';
import { both, check } from './check.ts';

/** Less than 1/32 in between fronts, or between a front and its frame, and they rub. Common practice, no published source. */
export const MIN_FRONT_GAP_MM = 25.4 / 32;
/** Reveals that differ by more than 1/32 in read as uneven. Casewright's rule. */
export const REVEAL_TOLERANCE_MM = 25.4 / 32;

/** How far a door's back free corner sweeps past its closed place as it opens (mm). */
export function doorSweepMm(widthMm: number, thicknessMm: number): number {
  return Math.hypot(widthMm, thicknessMm) - widthMm;
}

/** One front as the checks see it (world mm). */
export interface FrontFacts {
  id: string;
  label: string;
  partIds: readonly string[];
  kind: 'door' | 'drawer';
  hinge: 'left' | 'right';
  x: readonly [number, number];
  z: readonly [number, number];
  thicknessMm: number;
}

const overlaps = (a: readonly [number, number], b: readonly [number, number]): boolean => Math.min(a[1], b[1]) - Math.max(a[0], b[0]) > 1e-6;

/** Fronts that overlap, rub, or that a door hits as it opens. */
export function frontClearanceChecks(fronts: readonly FrontFacts[]): Check[] {
  const out: Check[] = [];
  for (let i = 0; i < fronts.length; i++) {
    for (let j = 0; j < fronts.length; j++) {
      if (i === j) continue;
      const a = fronts[i]!;
      const b = fronts[j]!;
      // b to the right of a in the same row, or b below a in the same column.
      const side = overlaps(a.z, b.z) && b.x[0] >= (a.x[0] + a.x[1]) / 2;
      const below = overlaps(a.x, b.x) && b.z[1] <= (a.z[0] + a.z[1]) / 2;
      if (!side && !below) continue;
      const gap = side ? b.x[0] - a.x[1] : a.z[0] - b.z[1];
      if (side && gap > 1e-6 && fronts.some((c) => c !== a && c !== b && overlaps(c.z, a.z) && c.x[0] >= a.x[1] - 1e-6 && c.x[1] <= b.x[0] + 1e-6)) continue;
      // Most pairs pass: their ids and names are written only for a check that fires.
      const partIds = (): string[] => [...new Set([...a.partIds, ...b.partIds])];
      const where = (): string => `${a.label} and ${b.label}`;
      if (gap < -1e-6) {
        out.push(check({
          id: `fronts-collide:${a.id}:${b.id}`, severity: 'error', title: `Fronts overlap: ${where()}`, partIds: partIds(), numbers: { gapMm: gap },
          message: `The ${a.label} and the ${b.label} overlap by ${both(-gap)}: neither can open.`,
          fix: 'Reduce the overlay, or widen the rail or mullion between them.',
        }));
        continue;
      }
      if (side) {
        const sweeps = [a.kind === 'door' && a.hinge === 'left' ? a : null, b.kind === 'door' && b.hinge === 'right' ? b : null].filter((d): d is FrontFacts => d !== null);
        const need = Math.max(0, ...sweeps.map((d) => doorSweepMm(d.x[1] - d.x[0], d.thicknessMm)));
        if (sweeps.length > 0 && gap < need - 1e-9) {
          out.push(check({
            id: `door-hits-neighbour:${a.id}:${b.id}`, severity: 'warning', title: `A door hits its neighbour as it opens: ${where()}`, partIds: partIds(),
            numbers: { gapMm: gap, sweepMm: need },
            message: `Opening, the door's back free corner swings ${both(need)} past its closed place (√(w² + t²) − w), but the gap is only ${both(gap)}: it binds on the ${sweeps[0] === a ? b.label : a.label}.`,
            fix: `Leave at least ${both(need)} between them, or bevel the meeting edges a few degrees toward the back.`,
          }));
          continue;
        }
      }
      if (gap < MIN_FRONT_GAP_MM - 1e-9) {
        out.push(check({
          id: `fronts-rub:${a.id}:${b.id}`, severity: 'warning', title: `Fronts rub: ${where()}`, partIds: partIds(), numbers: { gapMm: gap, minGapMm: MIN_FRONT_GAP_MM },
          message: `Only ${both(gap)} between the ${a.label} and the ${b.label}: they rub as they open, and seasonal swelling closes the gap.`,
          fix: `Leave at least ${both(MIN_FRONT_GAP_MM)} between fronts.`,
        }));
      }
    }
  }
  return out;
}

/** Reveals: inset fronts too tight in their openings; overlay fronts leaving uneven frame showing. */
export function revealChecks(partIds: readonly string[], frame: FrameWidths | null, mount: FrontMount, revealMm: number, overlayMm: number, rows: number, columns: number): Check[] {
  if (!frame) return [];
  if (mount === 'inset') {
    if (revealMm >= MIN_FRONT_GAP_MM - 1e-9) return [];
    return [check({
      id: 'reveal-too-tight', severity: 'warning', title: 'Inset fronts too tight', partIds, numbers: { revealMm, minRevealMm: MIN_FRONT_GAP_MM },
      message: `A ${both(revealMm)} reveal leaves inset fronts no room: they bind in their openings, worse when the frame swells.`,
      fix: `Leave a reveal of at least ${both(MIN_FRONT_GAP_MM)}; 1/16 in is usual.`,
    })];
  }
  const shown: Record<string, number> = {
    stileShowsMm: frame.stileMm - overlayMm,
    topRailShowsMm: frame.topRailMm - overlayMm,
    bottomRailShowsMm: frame.bottomRailMm - overlayMm,
  };
  if (rows > 1) shown.midRailShowsMm = frame.midRailMm - 2 * overlayMm;
  if (columns > 1) shown.mullionShowsMm = frame.mullionMm - 2 * overlayMm;
  const values = Object.values(shown);
  const spread = Math.max(...values) - Math.min(...values);
  if (spread <= REVEAL_TOLERANCE_MM) return [];
  const even = shown.stileShowsMm!;
  return [check({
    id: 'reveals-uneven', severity: 'warning', title: 'Uneven reveals around the fronts', partIds, numbers: { ...shown, spreadMm: spread, overlayMm },
    message: `With a ${both(overlayMm)} overlay the frame shows ${both(shown.stileShowsMm!)} at the stiles, ${both(shown.topRailShowsMm!)} at the top rail, ${both(shown.bottomRailShowsMm!)} at the bottom rail${shown.midRailShowsMm !== undefined ? `, ${both(shown.midRailShowsMm)} between rows` : ''}${shown.mullionShowsMm !== undefined ? `, ${both(shown.mullionShowsMm)} between columns` : ''}: a spread of ${both(spread)}.`,
    fix: `For an even ${both(even)} all round make the top and bottom rails ${both(even + overlayMm)} wide and the rails between rows and the mullions ${both(even + 2 * overlayMm)} wide.`,
  })];
}

/**
 * Reveals round overlay fronts on a leg-and-rail case, whose legs are wider than its rails by
 * design: the rails (top, bottom, between rows) should show alike, and the legs and mullions
 * alike. `laps` is how far the fronts lap a rail between rows and a mullion, `gapMm` the gap
 * between fronts (mm).
 */
export function legAndRailRevealChecks(partIds: readonly string[], frame: FrameWidths, overlayMm: number, gapMm: number, laps: { railMm: number; mullionMm: number }, rows: number, columns: number): Check[] {
  const rails: Record<string, number> = { topRailShowsMm: frame.topRailMm - overlayMm, bottomRailShowsMm: frame.bottomRailMm - overlayMm };
  if (rows > 1) rails.midRailShowsMm = frame.midRailMm - 2 * laps.railMm;
  const uprights: Record<string, number> = { legShowsMm: frame.stileMm - overlayMm };
  if (columns > 1) uprights.mullionShowsMm = frame.mullionMm - 2 * laps.mullionMm;
  const spreadOf = (group: Record<string, number>) => Math.max(...Object.values(group)) - Math.min(...Object.values(group));
  const railSpread = spreadOf(rails);
  const uprightSpread = spreadOf(uprights);
  if (railSpread <= REVEAL_TOLERANCE_MM && uprightSpread <= REVEAL_TOLERANCE_MM) return [];
  const list = (group: Record<string, number>, names: Record<string, string>) => Object.entries(group).map(([k, v]) => `${both(v)} ${names[k]}`).join(', ');
  return [check({
    id: 'reveals-uneven', severity: 'warning', title: 'Uneven reveals around the fronts', partIds,
    numbers: { ...rails, ...uprights, railSpreadMm: railSpread, uprightSpreadMm: uprightSpread, overlayMm },
    message: `With a ${both(overlayMm)} overlay the rails show ${list(rails, { topRailShowsMm: 'at the top', bottomRailShowsMm: 'at the bottom', midRailShowsMm: 'between rows' })}, and the uprights ${list(uprights, { legShowsMm: 'at the legs', mullionShowsMm: 'at the mullions' })}: a spread of ${both(Math.max(railSpread, uprightSpread))}.`,
    fix: `Keep the overlay at most ${both(Math.min(frame.topRailMm, frame.bottomRailMm, frame.stileMm) - gapMm)} and the mullions at most ${both(frame.stileMm + overlayMm)} wide, so the fronts can lap the rails and mullions to match.`,
  })];
}
