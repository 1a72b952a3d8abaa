/**
 * Parameters shared by the carcass pieces (dresser, cabinet): the carcass, face frame, fronts,
 * base, wood and milling. Lengths in mm, defaults written as inch sizes × 25.4 so they stay
 * exact. Trade sizes used as defaults are common practice, no published source: 3/4 in sheet
 * goods for the carcass and 1/4 in for the back, 1/4 in deep dadoes and rabbets, a face frame of
 * 3/4 × 1-1/2 in stock, 1/2 in overlay, 1/16 in inset reveal, 1/8 in between frameless fronts,
 * a toe kick about 4 in high and 3 in deep.
 */
import { SHEET_GOOD_IDS, type SheetGoodId } from '../../wood/sheetGoods.ts';
import type { SpeciesId } from '../../wood/species.ts';
import type { ParamDef } from '../paramDef.ts';

export const IN = 25.4;

export const GROUPS = {
  size: 'Size', carcass: 'Carcass', faceFrame: 'Face frame', fronts: 'Doors and drawer fronts', base: 'Base', top: 'Top',
  drawers: 'Drawers', heights: 'Drawer heights', doors: 'Doors', shelves: 'Shelves', wood: 'Wood and finish', milling: 'Milling and stock',
} as const;

export const sheetChoice = (): { value: string; label: string }[] => SHEET_GOOD_IDS.map((id) => ({ value: id, label: id }));

/** Carcass: sheet, back, joinery. */
export const CARCASS_PARAMS: readonly ParamDef[] = [
  { key: 'carcassSheet', label: 'Carcass sheet', group: GROUPS.carcass, kind: 'sheet', default: 'hardwood-plywood-3/4', options: sheetChoice(), help: 'Sides, bottom, top or stretchers, dividers.' },
  { key: 'backSheet', label: 'Back sheet', group: GROUPS.carcass, kind: 'sheet', default: 'hardwood-plywood-1/4', options: sheetChoice() },
  { key: 'backFit', label: 'Back held in', group: GROUPS.carcass, kind: 'enum', default: 'rabbet', options: [{ value: 'rabbet', label: 'Rabbets in the sides (glued and pinned)' }, { value: 'groove', label: 'Grooves set in from the back (slides in)' }] },
  { key: 'backGrooveSetIn', label: 'Wood behind the back groove', group: GROUPS.carcass, kind: 'length', default: 0.375 * IN, min: 3, max: 40, help: 'Used when the back sits in grooves.', shownWhen: [{ param: 'backFit', is: ['groove'] }] },
  { key: 'carcassJoinery', label: 'Top and bottom joined to the sides with', group: GROUPS.carcass, kind: 'enum', default: 'dado', options: [{ value: 'dado', label: 'Dadoes, set in from the ends' }, { value: 'rabbet', label: 'Rabbets at the ends' }] },
  { key: 'jointDepth', label: 'Dado and rabbet depth', group: GROUPS.carcass, kind: 'length', default: 0.25 * IN, min: 2, max: 15, help: 'About a third of the sheet: 1/4 in in 3/4 in plywood.' },
  { key: 'dadoEndWall', label: 'Dado set in from the ends', group: GROUPS.carcass, kind: 'length', default: 0.5 * IN, min: 3, max: 100, help: 'Wood left beyond the top and bottom dadoes, so the ends do not break out.', shownWhen: [{ param: 'carcassJoinery', is: ['dado'] }] },
];

/** Face frame. */
export const FACE_FRAME_PARAMS: readonly ParamDef[] = [
  { key: 'faceFrame', label: 'Face frame', group: GROUPS.faceFrame, kind: 'boolean', default: true, help: 'Off: frameless, with edge-banded front edges and full-overlay fronts.' },
  { key: 'faceFrameThickness', label: 'Face-frame thickness', group: GROUPS.faceFrame, kind: 'length', default: 0.75 * IN, min: 12, max: 32, shownWhen: [{ param: 'faceFrame', is: [true] }] },
  { key: 'faceFrameStile', label: 'Face-frame stile width', group: GROUPS.faceFrame, kind: 'length', default: 1.5 * IN, min: 19, max: 150, shownWhen: [{ param: 'faceFrame', is: [true] }] },
  { key: 'faceFrameTopRail', label: 'Face-frame top rail width', group: GROUPS.faceFrame, kind: 'length', default: 1.5 * IN, min: 19, max: 150, shownWhen: [{ param: 'faceFrame', is: [true] }] },
  { key: 'faceFrameBottomRail', label: 'Face-frame bottom rail width', group: GROUPS.faceFrame, kind: 'length', default: 1.5 * IN, min: 19, max: 150, shownWhen: [{ param: 'faceFrame', is: [true] }] },
  { key: 'faceFrameMidRail', label: 'Face-frame rail between rows', group: GROUPS.faceFrame, kind: 'length', default: 2 * IN, min: 12, max: 150 },
  { key: 'faceFrameMullion', label: 'Face-frame mullion width', group: GROUPS.faceFrame, kind: 'length', default: 2 * IN, min: 19, max: 150, help: 'Between columns of drawers; wide enough to cover a divider.' },
];

/** How doors and drawer fronts sit. */
export const FRONT_PARAMS: readonly ParamDef[] = [
  { key: 'frontMount', label: 'Fronts', group: GROUPS.fronts, kind: 'enum', default: 'overlay', options: [{ value: 'overlay', label: 'Overlay (lap the frame)' }, { value: 'inset', label: 'Inset (inside the openings, face frame only)' }] },
  { key: 'overlay', label: 'Overlay on the face frame', group: GROUPS.fronts, kind: 'length', default: 0.5 * IN, min: 0, max: 50, help: 'How far an overlay front laps the frame at each edge.', shownWhen: [{ param: 'frontMount', is: ['overlay'] }] },
  { key: 'reveal', label: 'Inset reveal', group: GROUPS.fronts, kind: 'length', default: 0.0625 * IN, min: 0, max: 10, help: 'Gap all round an inset front.', shownWhen: [{ param: 'frontMount', is: ['inset'] }] },
  { key: 'frontGap', label: 'Gap between fronts', group: GROUPS.fronts, kind: 'length', default: 0.125 * IN, min: 0, max: 20, help: 'Between the leaves of a pair, and between frameless fronts.' },
  { key: 'frontThickness', label: 'Front thickness', group: GROUPS.fronts, kind: 'length', default: 0.75 * IN, min: 12, max: 40 },
];

/** Base. */
export const BASE_PARAMS = (defaultType: string, defaultHeight: number): readonly ParamDef[] => [
  { key: 'baseType', label: 'Base', group: GROUPS.base, kind: 'enum', default: defaultType, options: [{ value: 'toe-kick', label: 'Toe kick (set back)' }, { value: 'plinth', label: 'Plinth (flush)' }, { value: 'legs', label: 'Square feet' }, { value: 'none', label: 'None' }] },
  { key: 'baseHeight', label: 'Base height', group: GROUPS.base, kind: 'length', default: defaultHeight, min: 0, max: 300, help: 'A toe kick is commonly about 4 in high.', shownWhen: [{ param: 'baseType', is: ['toe-kick', 'plinth', 'legs'] }] },
  { key: 'toeKickSetback', label: 'Toe kick depth', group: GROUPS.base, kind: 'length', default: 3 * IN, min: 0, max: 200, help: 'How far the kick board stands back from the front.', shownWhen: [{ param: 'baseType', is: ['toe-kick'] }] },
  { key: 'footSize', label: 'Foot size (square)', group: GROUPS.base, kind: 'length', default: 2 * IN, min: 25, max: 150, shownWhen: [{ param: 'baseType', is: ['legs'] }] },
];

/** Wood, finish, milling. */
export const WOOD_PARAMS = (defaultSpecies: string, defaultFinish: string): readonly ParamDef[] => [
  { key: 'species', label: 'Species', group: GROUPS.wood, kind: 'species', default: defaultSpecies, help: 'Face frame, fronts, doors, top and solid parts.' },
  { key: 'finish', label: 'Finish', group: GROUPS.wood, kind: 'enum', default: defaultFinish, options: [{ value: 'clear', label: 'Clear (oil, varnish, lacquer)' }, { value: 'paint', label: 'Paint' }] },
  { key: 'screwDiameter', label: 'Screw shank diameter', group: GROUPS.wood, kind: 'length', default: 4.2, min: 2, max: 10, help: 'Screws through stretchers and runners (a #8 wood screw is about 4.2 mm, from memory, approximate).' },
];

export const MILLING_PARAMS: readonly ParamDef[] = [
  { key: 'lengthAllowance', label: 'Rough length allowance', group: GROUPS.milling, kind: 'length', default: 1 * IN, min: 0, max: 150 },
  { key: 'widthAllowance', label: 'Rough width allowance', group: GROUPS.milling, kind: 'length', default: 0.25 * IN, min: 0, max: 50 },
  { key: 'thicknessAllowance', label: 'Rough thickness allowance', group: GROUPS.milling, kind: 'length', default: 0.125 * IN, min: 0, max: 25, help: 'Added before rounding up to the next quarter (4/4, 5/4, 8/4).' },
  { key: 'maxBoardLength', label: 'Longest board you can get', group: GROUPS.milling, kind: 'length', default: 96 * IN, min: 600, max: 6000 },
  { key: 'maxBoardWidth', label: 'Widest board you can get', group: GROUPS.milling, kind: 'length', default: 8 * IN, min: 75, max: 600 },
];

/** Everything of the case parameters, typed (mm, counts, choices). */
export interface CaseParams {
  width: number; depth: number; height: number;
  carcassSheet: SheetGoodId; backSheet: SheetGoodId;
  backFit: 'rabbet' | 'groove'; backGrooveSetIn: number; carcassJoinery: 'dado' | 'rabbet'; jointDepth: number; dadoEndWall: number;
  faceFrame: boolean; faceFrameThickness: number; faceFrameStile: number; faceFrameTopRail: number; faceFrameBottomRail: number; faceFrameMidRail: number; faceFrameMullion: number;
  frontMount: 'overlay' | 'inset'; overlay: number; reveal: number; frontGap: number; frontThickness: number;
  baseType: 'toe-kick' | 'plinth' | 'legs' | 'none'; baseHeight: number; toeKickSetback: number; footSize: number;
  species: SpeciesId; finish: 'clear' | 'paint'; screwDiameter: number;
  lengthAllowance: number; widthAllowance: number; thicknessAllowance: number; maxBoardLength: number; maxBoardWidth: number;
}
