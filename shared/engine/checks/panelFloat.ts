/** Panel float against seasonal movement, from the wood library's `panelFloat`. */
import type { PanelFloat } from '../../wood/float.ts';
import type { Check } from '../types.ts';
import { both, check } from './check.ts';

/** Whether the panels of one wall keep a tongue in their grooves through the seasons. */
export function panelFloatCheck(partIds: readonly string[], wall: string, acrossGrainWidthMm: number, grooveDepthMm: number, float: PanelFloat): Check {
  const numbers = {
    acrossGrainWidthMm,
    grooveDepthMm,
    gapEachSideMm: float.gapEachSideMm,
    swellMm: float.movement?.swellMm ?? 0,
    shrinkMm: float.movement?.shrinkMm ?? 0,
    engagementAtDriestMm: float.engagementAtDriestMm,
    engagementMinMm: float.engagementMinMm,
    shortfallMm: float.check.shortfallMm,
  };
  const title = `Panel float, ${wall} panels`;
  if (float.check.ok) {
    return check({
      id: `panel-float:${wall}`, severity: 'info', title, partIds, numbers,
      message: `${float.material.name}, ${both(acrossGrainWidthMm)} across the grain: leave ${both(float.gapEachSideMm)} at each moving edge; ${float.check.message}`,
    });
  }
  return check({
    id: `panel-float:${wall}`, severity: 'warning', title, partIds, numbers,
    message: `${float.material.name}, ${both(acrossGrainWidthMm)} across the grain in ${both(grooveDepthMm)} grooves: ${float.check.message}`,
    fix: float.check.fix,
  });
}
