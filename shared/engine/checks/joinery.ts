/**
 * Joinery checks: tongues against their grooves, grooves against the faces and each other,
 * stopped grooves that would show, panels thinner than their grooves.
 */
import type { Check } from '../types.ts';
import { both, check } from './check.ts';

/**
 * Least wood to leave beside a groove: 1/4 in. Casewright's rule of thumb, common practice, no
 * published source.
 */
export const MIN_GROOVE_WALL_MM = 6.35;
/**
 * A tongue about 1/16 in shorter than its groove is deep leaves room for glue and debris; less
 * than 1/64 in is treated as none. Common practice, no published source.
 */
export const MIN_TONGUE_END_GAP_MM = 25.4 / 64;
/** A stopped groove ending closer than 1/8 in to the rail edge shows. Casewright's rule. */
export const MIN_VISIBLE_STOP_MM = 3.175;

/** A rail tongue against the leg groove it goes in. */
export function railTongueCheck(partIds: readonly string[], tongueMm: number, grooveDepthMm: number): Check[] {
  const numbers = { tongueLengthMm: tongueMm, grooveDepthMm, endGapMm: grooveDepthMm - tongueMm };
  if (tongueMm > grooveDepthMm) {
    return [check({
      id: 'tongue-too-long:rail', severity: 'error', title: 'Rail tongues longer than the leg grooves are deep', partIds, numbers,
      message: `The ${both(tongueMm)} rail tongues bottom out in ${both(grooveDepthMm)} leg grooves: the shoulders would stand ${both(tongueMm - grooveDepthMm)} off the legs and the case would grow by twice that.`,
      fix: `Cut the tongues to ${both(grooveDepthMm - 1.5875)} (about 1/16 in short of the groove) or deepen the leg grooves to ${both(tongueMm + 1.5875)}.`,
    })];
  }
  if (grooveDepthMm - tongueMm < MIN_TONGUE_END_GAP_MM) {
    return [check({
      id: 'tongue-no-end-gap:rail', severity: 'warning', title: 'Rail tongues fill the leg grooves', partIds, numbers,
      message: `The ${both(tongueMm)} rail tongues leave ${both(grooveDepthMm - tongueMm)} at the bottom of ${both(grooveDepthMm)} grooves: glue and chips can stop the shoulders closing.`,
      fix: `Cut the tongues about 1/16 in short: ${both(grooveDepthMm - 1.5875)}.`,
    })];
  }
  return [];
}

/** Inputs for {@link grooveChecks}, mm. */
export interface GrooveFacts {
  legSizeMm: number;
  grooveWidthMm: number;
  legGrooveDepthMm: number;
  /** Distance from each leg's outer face to the near wall of its groove, by wall. */
  legOuterWalls: Readonly<Record<string, number>>;
  /** Wood between each leg groove's far wall and the leg's inner face, keyed front, back, side. */
  legInnerWalls: Readonly<Record<string, number>>;
  stockThicknessMm: number;
  stileWidthMm: number;
  frameGrooveDepthMm: number;
  hasStiles: boolean;
  legIds: readonly string[];
  railIds: readonly string[];
  stileIds: readonly string[];
}

/** Grooves too close to a face, meeting inside a leg, or leaving a thin web. */
export function grooveChecks(f: GrooveFacts): Check[] {
  const out: Check[] = [];
  // Grooves on two adjacent faces of a leg meet when each runs deeper than the wood beyond the
  // other's far wall: front legs carry the front and side grooves, back legs the back and side.
  const iw = f.legInnerWalls;
  const side = iw.side ?? Infinity;
  const front = Math.max(iw.front ?? Infinity, side);
  const back = Math.max(iw.back ?? Infinity, side);
  const limit = Math.min(front, back);
  if (f.legGrooveDepthMm > limit + 1e-9) {
    out.push(check({
      id: 'groove-breakthrough:leg', severity: 'error', title: 'Leg grooves meet inside the legs', partIds: f.legIds,
      numbers: { grooveDepthMm: f.legGrooveDepthMm, deepestWithoutMeetingMm: limit },
      message: `${both(f.legGrooveDepthMm)} grooves on two faces of a ${both(f.legSizeMm)} leg run into each other: the leg's inside corner is cut through and the rail tongues collide.`,
      fix: `Make the leg grooves no deeper than ${both(limit)}, or use thicker legs.`,
    }));
  }
  for (const [wall, wallMm] of Object.entries(f.legOuterWalls)) {
    if (wallMm < MIN_GROOVE_WALL_MM - 0.01) {
      out.push(check({
        id: `groove-near-face:leg-${wall}`, severity: 'warning', title: `Leg groove close to the outer face (${wall})`, partIds: f.legIds,
        numbers: { wallMm, minWallMm: MIN_GROOVE_WALL_MM },
        message: `The groove for the ${wall} frame leaves ${both(wallMm)} of wood to the leg's outer face; under ${both(MIN_GROOVE_WALL_MM)} it can split out when the tongue is driven home.`,
        fix: wall === 'back' ? 'Move the back groove toward the centre of the leg (smaller back groove offset).' : 'Use thicker legs or thinner rail stock.',
      }));
    }
  }
  const railWall = (f.stockThicknessMm - f.grooveWidthMm) / 2;
  if (railWall < MIN_GROOVE_WALL_MM - 0.01) {
    out.push(check({
      id: 'groove-near-face:rail', severity: 'warning', title: 'Thin walls beside the rail grooves', partIds: [...f.railIds, ...f.stileIds],
      numbers: { wallMm: railWall, minWallMm: MIN_GROOVE_WALL_MM },
      message: `A ${both(f.grooveWidthMm)} groove centred in ${both(f.stockThicknessMm)} stock leaves ${both(railWall)} each side.`,
      fix: `Use a narrower groove or stock at least ${both(f.grooveWidthMm + 2 * MIN_GROOVE_WALL_MM)} thick.`,
    }));
  }
  if (f.hasStiles) {
    const web = f.stileWidthMm - 2 * f.frameGrooveDepthMm;
    if (web < MIN_GROOVE_WALL_MM * 2 - 0.01) {
      out.push(check({
        id: 'groove-near-face:stile', severity: 'warning', title: 'Centre stiles nearly cut through', partIds: f.stileIds,
        numbers: { webMm: web, minWebMm: 2 * MIN_GROOVE_WALL_MM },
        message: `Grooves in both edges of a ${both(f.stileWidthMm)} stile leave ${both(web)} between them.`,
        fix: `Widen the stiles to at least ${both(2 * f.frameGrooveDepthMm + 2 * MIN_GROOVE_WALL_MM)}.`,
      }));
    }
  }
  return out;
}

/** A leg groove stopped so close to a rail edge that it shows. */
export function stoppedGrooveCheck(legIds: readonly string[], stopMm: number): Check[] {
  if (stopMm >= MIN_VISIBLE_STOP_MM) return [];
  return [check({
    id: 'stopped-groove-shows:leg', severity: 'warning', title: 'Leg grooves will show', partIds: legIds,
    numbers: { stopMm, minStopMm: MIN_VISIBLE_STOP_MM },
    message: stopMm <= 0
      ? 'The leg grooves run out at the top of the legs and below the bottom rails: they show when the lid is open and under the case.'
      : `The leg grooves stop only ${both(stopMm)} inside the rail edges: any tear-out at the stop shows beside the rail.`,
    fix: 'Stop the leg grooves about 1/2 in inside the rail edges (leg groove stop); the rail tongues are haunched to match.',
  })];
}

/** A panel thinner than its groove rattles. */
export function panelThicknessCheck(partIds: readonly string[], panelMm: number, grooveWidthMm: number): Check[] {
  if (panelMm >= grooveWidthMm - 1e-6) return [];
  return [check({
    id: 'panel-thinner-than-groove', severity: 'warning', title: 'Panels thinner than their grooves', partIds,
    numbers: { panelThicknessMm: panelMm, grooveWidthMm },
    message: `${both(panelMm)} panels in ${both(grooveWidthMm)} grooves leave ${both(grooveWidthMm - panelMm)} of play: they will rattle.`,
    fix: `Cut the grooves ${both(panelMm)} wide, or use panels at least ${both(grooveWidthMm)} thick.`,
  })];
}
