/**
 * The cabinet's parameters: a base, wall or tall cabinet with a carcass of sheet goods (face
 * frame or frameless), one door or a pair (frame-and-panel or slab, inset or overlay), fixed
 * and adjustable shelves, and a base. Lengths in mm; defaults are inch sizes × 25.4.
 *
 * Usual sizes (common practice, no published source): a base cabinet box 34-1/2 in tall under a
 * 1-1/2 in countertop for a 36 in work surface, 24 in deep, on a toe kick about 4 in high; a
 * wall cabinet 12 in deep; shelf pins on the 32 mm system, 37 mm in from the front and back
 * edges, 5 mm holes.
 */
import type { ParamDef, ParamShownEntry } from '../paramDef.ts';
import { BASE_PARAMS, CARCASS_PARAMS, FACE_FRAME_PARAMS, FRONT_PARAMS, GROUPS, IN, MILLING_PARAMS, sheetChoice, WOOD_PARAMS, type CaseParams } from './caseParams.ts';

/** The usual box sizes of each type of cabinet (mm). Common practice, no published source. */
export const CABINET_SIZES = {
  base: { heightMm: 34.5 * IN, depthMm: 24 * IN, countertopMm: 1.5 * IN, toeKickHeightMm: 4 * IN },
  wall: { heightMm: 30 * IN, depthMm: 12 * IN, countertopMm: 0, toeKickHeightMm: 0 },
  tall: { heightMm: 84 * IN, depthMm: 24 * IN, countertopMm: 0, toeKickHeightMm: 4 * IN },
} as const;

/** The shelf settings mean something with shelves of either kind, fixed or adjustable. */
const ANY_SHELF: ParamShownEntry = { anyOf: [[{ param: 'fixedShelves', atLeast: 1 }], [{ param: 'adjustableShelves', atLeast: 1 }]] };

/** Every cabinet parameter, in form order. */
export const CABINET_PARAMS: readonly ParamDef[] = [
  { key: 'cabinetType', label: 'Cabinet type', group: GROUPS.size, kind: 'enum', default: 'base', options: [{ value: 'base', label: 'Base (stands on the floor, under a countertop)' }, { value: 'wall', label: 'Wall (hangs; no base)' }, { value: 'tall', label: 'Tall (floor to near the ceiling)' }] },
  { key: 'width', label: 'Width', group: GROUPS.size, kind: 'length', default: 30 * IN, min: 250, max: 1500, help: 'Outside width of the carcass.' },
  { key: 'depth', label: 'Depth', group: GROUPS.size, kind: 'length', default: CABINET_SIZES.base.depthMm, min: 200, max: 900, help: 'Back to the face of the face frame (or the carcass edges); 24 in for a base cabinet, 12 in for a wall cabinet is usual. Overlay doors stand in front of it.' },
  { key: 'height', label: 'Height', group: GROUPS.size, kind: 'length', default: CABINET_SIZES.base.heightMm, min: 250, max: 2700, help: 'Floor (or underside, hung) to the top of the carcass; a base cabinet is usually 34-1/2 in under its countertop.' },
  { key: 'countertopThickness', label: 'Countertop allowance', group: GROUPS.size, kind: 'length', default: CABINET_SIZES.base.countertopMm, min: 0, max: 100, help: 'Base cabinets: the countertop that goes on later; sets the work-surface height shown.', shownWhen: [{ param: 'cabinetType', is: ['base'] }] },

  { key: 'doorCount', label: 'Doors', group: GROUPS.doors, kind: 'number', default: 2, min: 0, max: 2, integer: true, help: '0: open shelves; 2: a pair meeting in the middle.' },
  { key: 'doorStyle', label: 'Door style', group: GROUPS.doors, kind: 'enum', default: 'frame-and-panel', options: [{ value: 'frame-and-panel', label: 'Frame and panel' }, { value: 'slab', label: 'Slab' }], shownWhen: [{ param: 'doorCount', atLeast: 1 }] },
  { key: 'doorStileWidth', label: 'Door stile width', group: GROUPS.doors, kind: 'length', default: 2.25 * IN, min: 25, max: 150, shownWhen: [{ param: 'doorCount', atLeast: 1 }, { param: 'doorStyle', is: ['frame-and-panel'] }] },
  { key: 'doorRailWidth', label: 'Door rail width', group: GROUPS.doors, kind: 'length', default: 2.25 * IN, min: 25, max: 200, shownWhen: [{ param: 'doorCount', atLeast: 1 }, { param: 'doorStyle', is: ['frame-and-panel'] }] },
  { key: 'doorGrooveWidth', label: 'Door groove width', group: GROUPS.doors, kind: 'length', default: (7 / 32) * IN, min: 3, max: 15, help: '7/32 in fits 1/4 in plywood, which measures about 7/32 in; match it to the panel.', shownWhen: [{ param: 'doorCount', atLeast: 1 }, { param: 'doorStyle', is: ['frame-and-panel'] }] },
  { key: 'doorGrooveDepth', label: 'Door groove depth', group: GROUPS.doors, kind: 'length', default: 0.375 * IN, min: 4, max: 20, shownWhen: [{ param: 'doorCount', atLeast: 1 }, { param: 'doorStyle', is: ['frame-and-panel'] }] },
  { key: 'doorTongueClearance', label: 'Door tongue end clearance', group: GROUPS.doors, kind: 'length', default: 0.0625 * IN, min: 0, max: 5, shownWhen: [{ param: 'doorCount', atLeast: 1 }, { param: 'doorStyle', is: ['frame-and-panel'] }] },
  { key: 'doorPanel', label: 'Door panel', group: GROUPS.doors, kind: 'enum', default: 'plywood', options: [{ value: 'plywood', label: 'Sheet (plywood or MDF)' }, { value: 'solid', label: 'Solid wood, floating' }], shownWhen: [{ param: 'doorCount', atLeast: 1 }, { param: 'doorStyle', is: ['frame-and-panel'] }] },
  { key: 'doorPanelSheet', label: 'Door panel sheet', group: GROUPS.doors, kind: 'sheet', default: 'hardwood-plywood-1/4', options: sheetChoice(), shownWhen: [{ param: 'doorCount', atLeast: 1 }, { param: 'doorStyle', is: ['frame-and-panel'] }, { param: 'doorPanel', is: ['plywood'] }] },
  { key: 'doorPanelThickness', label: 'Solid door panel thickness', group: GROUPS.doors, kind: 'length', default: 0.5 * IN, min: 4, max: 20, shownWhen: [{ param: 'doorCount', atLeast: 1 }, { param: 'doorStyle', is: ['frame-and-panel'] }, { param: 'doorPanel', is: ['solid'] }] },
  { key: 'slabMaterial', label: 'Slab door material', group: GROUPS.doors, kind: 'enum', default: 'sheet', options: [{ value: 'sheet', label: 'Sheet (MDF paints well)' }, { value: 'solid', label: 'Solid wood, glued up' }], shownWhen: [{ param: 'doorCount', atLeast: 1 }, { param: 'doorStyle', is: ['slab'] }] },
  { key: 'slabSheet', label: 'Slab door sheet', group: GROUPS.doors, kind: 'sheet', default: 'mdf-3/4', options: sheetChoice(), shownWhen: [{ param: 'doorCount', atLeast: 1 }, { param: 'doorStyle', is: ['slab'] }, { param: 'slabMaterial', is: ['sheet'] }] },

  { key: 'adjustableShelves', label: 'Adjustable shelves', group: GROUPS.shelves, kind: 'number', default: 1, min: 0, max: 8, integer: true },
  { key: 'fixedShelves', label: 'Fixed shelves', group: GROUPS.shelves, kind: 'number', default: 0, min: 0, max: 4, integer: true, help: 'In dadoes; they also stiffen a tall carcass.' },
  { key: 'shelfMaterial', label: 'Shelf material', group: GROUPS.shelves, kind: 'enum', default: 'sheet', options: [{ value: 'sheet', label: 'Sheet' }, { value: 'solid', label: 'Solid wood' }], shownWhen: [ANY_SHELF] },
  { key: 'shelfSheet', label: 'Shelf sheet', group: GROUPS.shelves, kind: 'sheet', default: 'hardwood-plywood-3/4', options: sheetChoice(), shownWhen: [ANY_SHELF, { param: 'shelfMaterial', is: ['sheet'] }] },
  { key: 'shelfThickness', label: 'Solid shelf thickness', group: GROUPS.shelves, kind: 'length', default: 0.75 * IN, min: 10, max: 40, shownWhen: [ANY_SHELF, { param: 'shelfMaterial', is: ['solid'] }] },
  { key: 'shelfEdgeStrip', label: 'Solid edge strip on the shelves', group: GROUPS.shelves, kind: 'boolean', default: false, help: 'Hides the sheet edge and stiffens the shelf.', shownWhen: [ANY_SHELF] },
  { key: 'edgeStripHeight', label: 'Edge strip height', group: GROUPS.shelves, kind: 'length', default: 1.5 * IN, min: 10, max: 100, shownWhen: [ANY_SHELF, { param: 'shelfEdgeStrip', is: [true] }] },
  { key: 'edgeStripThickness', label: 'Edge strip thickness', group: GROUPS.shelves, kind: 'length', default: 0.75 * IN, min: 5, max: 40, shownWhen: [ANY_SHELF, { param: 'shelfEdgeStrip', is: [true] }] },
  { key: 'shelfLoad', label: 'Load on each shelf', group: GROUPS.shelves, kind: 'number', default: 30, min: 1, max: 200, unit: 'kg/m', help: 'Spread along the shelf; a row of books is about 30 kg per metre (about 20 lb per foot, approximate).', shownWhen: [ANY_SHELF] },
  { key: 'shelfFrontSetback', label: 'Shelf set back from the front', group: GROUPS.shelves, kind: 'length', default: 0.25 * IN, min: 0, max: 100, shownWhen: [ANY_SHELF] },
  { key: 'shelfEndClearance', label: 'Adjustable shelf end clearance', group: GROUPS.shelves, kind: 'length', default: 25.4 / 32, min: 0, max: 5, help: 'Gap at each end so the shelf lifts out.', shownWhen: [{ param: 'adjustableShelves', atLeast: 1 }] },
  { key: 'holeSpacing', label: 'Shelf-pin hole spacing', group: GROUPS.shelves, kind: 'length', default: 32, min: 12, max: 200, help: '32 mm is the usual system spacing.', shownWhen: [{ param: 'adjustableShelves', atLeast: 1 }] },
  { key: 'holeSetback', label: 'Hole line set back', group: GROUPS.shelves, kind: 'length', default: 37, min: 10, max: 200, help: 'From the carcass front edge and from the back, to the hole centres.', shownWhen: [{ param: 'adjustableShelves', atLeast: 1 }] },
  { key: 'holeDiameter', label: 'Shelf-pin hole diameter', group: GROUPS.shelves, kind: 'length', default: 5, min: 3, max: 10, shownWhen: [{ param: 'adjustableShelves', atLeast: 1 }] },
  { key: 'holeDepth', label: 'Shelf-pin hole depth', group: GROUPS.shelves, kind: 'length', default: 10, min: 3, max: 15, shownWhen: [{ param: 'adjustableShelves', atLeast: 1 }] },
  { key: 'holeEndMargin', label: 'Holes start above the bottom', group: GROUPS.shelves, kind: 'length', default: 3 * IN, min: 10, max: 400, help: 'And stop this far below the top.', shownWhen: [{ param: 'adjustableShelves', atLeast: 1 }] },

  ...CARCASS_PARAMS,
  ...FACE_FRAME_PARAMS,
  ...FRONT_PARAMS,
  ...BASE_PARAMS('toe-kick', CABINET_SIZES.base.toeKickHeightMm),
  ...WOOD_PARAMS('hard-maple', 'clear'),
  ...MILLING_PARAMS,
];

/** The cabinet's parameters, typed. */
export interface CabinetParams extends CaseParams {
  cabinetType: 'base' | 'wall' | 'tall'; countertopThickness: number;
  doorCount: number; doorStyle: 'frame-and-panel' | 'slab'; doorStileWidth: number; doorRailWidth: number;
  doorGrooveWidth: number; doorGrooveDepth: number; doorTongueClearance: number;
  doorPanel: 'plywood' | 'solid'; doorPanelSheet: CaseParams['backSheet']; doorPanelThickness: number;
  slabMaterial: 'sheet' | 'solid'; slabSheet: CaseParams['backSheet'];
  adjustableShelves: number; fixedShelves: number; shelfMaterial: 'sheet' | 'solid'; shelfSheet: CaseParams['backSheet']; shelfThickness: number;
  shelfEdgeStrip: boolean; edgeStripHeight: number; edgeStripThickness: number; shelfLoad: number; shelfFrontSetback: number; shelfEndClearance: number;
  holeSpacing: number; holeSetback: number; holeDiameter: number; holeDepth: number; holeEndMargin: number;
}
