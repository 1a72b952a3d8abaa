/** Panel float against seasonal movement, from the wood library's `panelFloatMm`. */
import { panelFloatCheckOf, type PanelFloatMm } from '../../wood/float.ts';
import type { Check } from '../types.ts';
import { both, check } from './check.ts';

/** Whether the panels of one wall keep a tongue in their grooves through the seasons. */
export function panelFloatCheck(partIds: readonly string[], wall: string, acrossGrainWidthMm: number, grooveDepthMm: number, float: PanelFloatMm): Check {
  const numbers = {
    acrossGrainWidthMm,
    grooveDepthMm,
    gapEachSideMm: float.gapEachSideMm,
    swellMm: float.movement?.swellMm ?? 0,
    shrinkMm: float.movement?.shrinkMm ?? 0,
    engagementAtDriestMm: float.engagementAtDriestMm,
    engagementMinMm: float.engagementMinMm,
    shortfallMm: float.shortfallMm,
  };
  const floatCheck = panelFloatCheckOf(float);
  const title = `Panel float, ${wall} panels`;
  if (floatCheck.ok) {
    return check({
      id: `panel-float:${wall}`, severity: 'info', title, partIds, numbers,
      message: `${float.material.name}, ${both(acrossGrainWidthMm)} across the grain: leave ${both(float.gapEachSideMm)} at each moving edge; ${floatCheck.message}`,
    });
  }
  return check({
    id: `panel-float:${wall}`, severity: 'warning', title, partIds, numbers,
    message: `${float.material.name}, ${both(acrossGrainWidthMm)} across the grain in ${both(grooveDepthMm)} grooves: ${floatCheck.message}`,
    fix: floatCheck.fix,
  });
}
