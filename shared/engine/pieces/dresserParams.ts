/**
 * The dresser's parameters: a carcass of sheet goods (with or without a face frame) holding a
 * bank of drawers in rows and columns, graduated in height, under a solid top with overhangs.
 * Lengths in mm; defaults are inch sizes × 25.4. The default is a six-drawer dresser (three rows
 * of two) 56 × 20 × 34 in; trade sizes are common practice, no published source: 1/2 in drawer
 * stock, a 1/4 in plywood bottom in a 1/4 in deep groove 1/2 in up, drawer rows growing 1 in each
 * row down.
 */
import type { ParamDef, ParamShownEntry } from '../paramDef.ts';
import { CHEST_PARAMS } from './chestParams.ts';
import { BASE_PARAMS, CARCASS_PARAMS, FACE_FRAME_PARAMS, FRONT_PARAMS, GROUPS, IN, MILLING_PARAMS, sheetChoice, WOOD_PARAMS, type CaseParams } from './caseParams.ts';

/** Most rows of drawers a dresser takes. */
export const MAX_DRAWER_ROWS = 8;

const rowHeights: ParamDef[] = Array.from({ length: MAX_DRAWER_ROWS }, (_, i) => ({
  key: `rowHeight${i + 1}`, label: `Listed height, row ${i + 1}${i === 0 ? ' (top)' : ''}`, group: GROUPS.heights, kind: 'length' as const,
  default: (5 + i) * IN, min: 25, max: 1000, help: 'Used when the heights are listed: each row\'s opening, top first; the bottom row takes what is left.',
  shownWhen: [{ param: 'drawerGraduation', is: ['listed'] }, { param: 'drawerRows', atLeast: i + 2 }],
}));

const FRAMED = 'Frame-and-panel case';
const WEB_FRAMES = 'Web frames';
/** Shown only for a dresser built like the chest; the carcass-only settings only for a carcass. */
const FRAMED_CASE = { param: 'caseConstruction', is: ['frame-and-panel'] } as const;
const CARCASS_CASE = { param: 'caseConstruction', is: ['carcass'] } as const;
const onlyFor = (condition: ParamShownEntry) => (def: ParamDef): ParamDef => ({ ...def, shownWhen: [...(def.shownWhen ?? []), condition] });
/** A sheet top is cut from the carcass sheet, so that one field stays with a frame-and-panel case too. */
const CARCASS_OR_SHEET_TOP: ParamShownEntry = { anyOf: [[CARCASS_CASE], [{ param: 'topMaterial', is: ['sheet'] }]] };
/** The chest's own frame-and-panel parameters, for a dresser built like the chest. */
const FRAMED_KEYS = ['legSize', 'footHeight', 'stockThickness', 'topRailWidth', 'bottomRailWidth', 'sideStileCount', 'stileWidth', 'grooveWidth', 'legGrooveDepth', 'frameGrooveDepth', 'railTongueLength', 'tongueClearance', 'legGrooveStop', 'panelMaterial', 'panelSheet', 'panelThickness', 'panelGrain'];
const framedParams: ParamDef[] = FRAMED_KEYS.map((key) => ({ ...onlyFor(FRAMED_CASE)(CHEST_PARAMS.find((d) => d.key === key)!), group: FRAMED }));

/** Every dresser parameter, in form order. */
export const DRESSER_PARAMS: readonly ParamDef[] = [
  { key: 'width', label: 'Width', group: GROUPS.size, kind: 'length', default: 56 * IN, min: 400, max: 2400, help: 'Outside width of the carcass; the top\'s overhangs add to it.' },
  { key: 'depth', label: 'Depth', group: GROUPS.size, kind: 'length', default: 20 * IN, min: 250, max: 900, help: 'From the back to the face of the face frame (or the carcass edges); overlay fronts and the top\'s overhang stand in front of it.' },
  { key: 'height', label: 'Height to the top', group: GROUPS.size, kind: 'length', default: 34 * IN, min: 400, max: 2200, help: 'From the floor to the top surface.' },

  { key: 'caseConstruction', label: 'Case', group: GROUPS.size, kind: 'enum', default: 'carcass', options: [{ value: 'carcass', label: 'Plywood carcass (face frame or frameless)' }, { value: 'frame-and-panel', label: 'Frame-and-panel sides on corner legs, web frames (like the chest)' }], help: 'A frame-and-panel case stands on its legs and carries its drawers on its web frames: on wooden runners, or on slides screwed to spacers flush with the legs; the base, face-frame and carcass settings are then not used (a sheet top still uses the carcass sheet).' },

  { key: 'drawerRows', label: 'Rows of drawers', group: GROUPS.drawers, kind: 'number', default: 3, min: 1, max: MAX_DRAWER_ROWS, integer: true },
  { key: 'drawerColumns', label: 'Drawers in each row', group: GROUPS.drawers, kind: 'number', default: 2, min: 1, max: 4, integer: true, help: 'More than one: dividers separate the columns.' },
  { key: 'slideType', label: 'Drawers run on', group: GROUPS.drawers, kind: 'enum', default: 'side-mount', options: [{ value: 'side-mount', label: 'Side-mount slides' }, { value: 'undermount', label: 'Undermount slides' }, { value: 'wood-runners', label: 'Wooden runners (face frame or frame-and-panel case)' }] },
  { key: 'drawerJoinery', label: 'Drawer box corners', group: GROUPS.drawers, kind: 'enum', default: 'rabbet-and-dado', options: [{ value: 'rabbet-and-dado', label: 'Rabbet-and-dado (tongue in a dado)' }, { value: 'rabbet', label: 'Rabbet, glued and pinned' }] },
  { key: 'drawerSideThickness', label: 'Drawer box stock thickness', group: GROUPS.drawers, kind: 'length', default: 0.5 * IN, min: 8, max: 25 },
  { key: 'drawerSpecies', label: 'Drawer box species', group: GROUPS.drawers, kind: 'species', default: 'hard-maple' },
  { key: 'drawerBottomSheet', label: 'Drawer bottom sheet', group: GROUPS.drawers, kind: 'sheet', default: 'hardwood-plywood-1/4', options: sheetChoice() },
  { key: 'drawerBottomGroove', label: 'Bottom groove depth', group: GROUPS.drawers, kind: 'length', default: 0.25 * IN, min: 2, max: 12 },
  { key: 'drawerBottomSetUp', label: 'Bottom set up from the lower edge', group: GROUPS.drawers, kind: 'length', default: 0.5 * IN, min: 3, max: 40, help: 'Undermount slides want about 1/2 in.' },
  { key: 'drawerTopClearance', label: 'Clearance above the box', group: GROUPS.drawers, kind: 'length', default: 0.5 * IN, min: 0, max: 50 },
  { key: 'drawerBottomClearance', label: 'Clearance below the box', group: GROUPS.drawers, kind: 'length', default: 0.25 * IN, min: 0, max: 50, help: 'Not used on wooden runners: the box rides on them.', shownWhen: [{ param: 'slideType', is: ['side-mount', 'undermount'] }] },
  { key: 'drawerDepth', label: 'Drawer box depth', group: GROUPS.drawers, kind: 'length', default: 0, min: 0, max: 900, help: '0: the longest slide that fits.' },
  { key: 'drawerRearClearance', label: 'Clearance behind the box', group: GROUPS.drawers, kind: 'length', default: 1 * IN, min: 0, max: 200 },

  { key: 'drawerGraduation', label: 'Drawer heights', group: GROUPS.heights, kind: 'enum', default: 'arithmetic', options: [{ value: 'equal', label: 'Equal' }, { value: 'arithmetic', label: 'Growing by a step' }, { value: 'geometric', label: 'Growing by a ratio' }, { value: 'listed', label: 'Listed' }] },
  { key: 'graduationStep', label: 'Step between rows', group: GROUPS.heights, kind: 'length', default: 1 * IN, min: 0, max: 200, help: 'Each row this much taller than the one above.', shownWhen: [{ param: 'drawerGraduation', is: ['arithmetic'] }] },
  { key: 'graduationRatio', label: 'Ratio between rows', group: GROUPS.heights, kind: 'number', default: 1.15, min: 1, max: 2, help: 'Each row this many times the one above.', shownWhen: [{ param: 'drawerGraduation', is: ['geometric'] }] },
  ...rowHeights,

  { key: 'topMaterial', label: 'Top', group: GROUPS.top, kind: 'enum', default: 'solid', options: [{ value: 'solid', label: 'Solid wood, glued up' }, { value: 'sheet', label: 'Carcass sheet, edge-banded' }] },
  { key: 'topThickness', label: 'Top thickness', group: GROUPS.top, kind: 'length', default: 0.875 * IN, min: 12, max: 50 },
  { key: 'topOverhangFront', label: 'Top overhang, front', group: GROUPS.top, kind: 'length', default: 1 * IN, min: 0, max: 100, help: 'Measured from the face frame (or carcass edge).' },
  { key: 'topOverhangSide', label: 'Top overhang, each side', group: GROUPS.top, kind: 'length', default: 0.75 * IN, min: 0, max: 100 },
  { key: 'topOverhangBack', label: 'Top overhang, back', group: GROUPS.top, kind: 'length', default: 0, min: 0, max: 50 },
  { key: 'topBoardWidth', label: 'Top board width', group: GROUPS.top, kind: 'length', default: 6 * IN, min: 50, max: 300, shownWhen: [{ param: 'topMaterial', is: ['solid'] }] },
  { key: 'stretcherWidth', label: 'Stretcher width', group: GROUPS.top, kind: 'length', default: 3 * IN, min: 40, max: 200, help: 'Front and back stretchers the top is screwed to.' },

  ...framedParams,
  { key: 'webFrames', label: 'Web frames between rows', group: WEB_FRAMES, kind: 'enum', default: 'dust-panel', options: [{ value: 'dust-panel', label: 'Web frames with dust panels' }, { value: 'open', label: 'Open web frames' }, { value: 'none', label: 'None (drawers hang on their slides)' }], help: 'Behind each face-frame rail between rows, let into dadoes in the sides; a frameless carcass has none. A frame-and-panel case always has them, without dust panels.', shownWhen: [CARCASS_CASE, { param: 'faceFrame', is: [true] }] },
  { key: 'dustPanelSheet', label: 'Dust panel sheet', group: WEB_FRAMES, kind: 'sheet', default: 'hardwood-plywood-1/4', options: sheetChoice(), help: 'Floats in grooves cut to its thickness.', shownWhen: [CARCASS_CASE, { param: 'faceFrame', is: [true] }, { param: 'webFrames', is: ['dust-panel'] }] },
  { key: 'webFrameRailDepth', label: 'Web-frame rail depth', group: WEB_FRAMES, kind: 'length', default: 3 * IN, min: 25, max: 200, help: 'Front to back size of the web frames\' front and back rails; in a frame-and-panel case, deeper than the legs.' },
  { key: 'runnerWidth', label: 'Side runner width', group: WEB_FRAMES, kind: 'length', default: 1.5 * IN, min: 15, max: 100, help: 'Widened where needed to reach under the drawer sides; the runners under the dividers are wider still.' },

  ...CARCASS_PARAMS.map((def) => onlyFor(def.key === 'carcassSheet' ? CARCASS_OR_SHEET_TOP : CARCASS_CASE)(def)),
  ...FACE_FRAME_PARAMS,
  ...FRONT_PARAMS,
  ...BASE_PARAMS('plinth', 4 * IN).map(onlyFor(CARCASS_CASE)),
  ...WOOD_PARAMS('black-cherry', 'clear'),
  ...MILLING_PARAMS,
];

/** The dresser's parameters, typed. */
export interface DresserParams extends CaseParams {
  caseConstruction: 'carcass' | 'frame-and-panel';
  drawerRows: number; drawerColumns: number;
  slideType: 'side-mount' | 'undermount' | 'wood-runners'; drawerJoinery: 'rabbet-and-dado' | 'rabbet';
  drawerSideThickness: number; drawerSpecies: CaseParams['species']; drawerBottomSheet: CaseParams['backSheet'];
  drawerBottomGroove: number; drawerBottomSetUp: number; drawerTopClearance: number; drawerBottomClearance: number; drawerDepth: number; drawerRearClearance: number;
  drawerGraduation: 'equal' | 'arithmetic' | 'geometric' | 'listed'; graduationStep: number; graduationRatio: number;
  webFrames: 'dust-panel' | 'open' | 'none'; dustPanelSheet: CaseParams['backSheet']; webFrameRailDepth: number; runnerWidth: number;
  topMaterial: 'solid' | 'sheet'; topThickness: number; topOverhangFront: number; topOverhangSide: number; topOverhangBack: number; topBoardWidth: number; stretcherWidth: number;
  [rowHeight: `rowHeight${number}`]: number;
}
