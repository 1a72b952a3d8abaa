/** One view of the piece as a standalone SVG sheet, with its border and title block. */
import { singleViewSheet } from '../../shared/drawing/planSet.ts';
import { sheetScaleText } from '../../shared/drawing/planSet.ts';
import { renderSheetSvg } from '../../shared/drawing/svg.ts';
import { sheetFrame } from '../../shared/drawing/titleBlock.ts';
import type { SheetSpec, TitleBlockInfo } from '../../shared/drawing/types.ts';
import type { PieceResult } from '../../shared/engine/types.ts';

/** The views a single SVG can show. */
export type SvgViewId = 'front' | 'side' | 'top' | 'exploded';
/** The view ids, for menus and option checks. */
export const SVG_VIEWS: readonly SvgViewId[] = ['front', 'side', 'top', 'exploded'];

/** `view` of `result` on its own sheet, as SVG text. */
export function viewSvg(result: PieceResult, view: SvgViewId, info: TitleBlockInfo, sheet: SheetSpec): string {
  const draft = singleViewSheet(result, view, sheet, info.units);
  const full = { ...draft, number: 1 };
  return renderSheetSvg(full, sheetFrame(sheet, info, draft.name, sheetScaleText(full), 1, 1));
}
