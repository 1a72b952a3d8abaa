/** Sheet and board layout: what to cut from which sheet or board, drawn to scale from plain data. */
export * from './rect.ts';
export * from './control.ts';
export * from './sheetTypes.ts';
export { STANDARD_SHEET, DEFAULT_KERF_MM, DEFAULT_TRIM_MM, DEFAULT_SHEET_ATTEMPTS } from './sheetInput.ts';
export { layoutSheets, sheetLayoutSteps } from './sheetOptimiser.ts';
export { areaLowerBound, largeItemBound, oneDimensionalBound, stripBound } from './lowerBound.ts';
export * from './boardTypes.ts';
export { DEFAULT_BOARD_SIZES, DEFAULT_ALLOWANCE } from './boardInput.ts';
export { layoutBoards, boardLayoutSteps } from './boardOptimiser.ts';
export { binPackingInstance, CLASS_NAMES, type BinPackingClass, type BinPackingInstance } from './binPackingClasses.ts';
export { sheetDiagram, boardDiagram, matchRunsOf, fitLabel, MAX_LABEL_MM, MIN_LABEL_OF_LENGTH, type LabelFit, type SheetDiagram, type BoardDiagram, type DiagramPart, type DiagramCut, type DiagramBox, type DiagramMatchRun } from './diagram.ts';
