/**
 * The chest's parameters with defaults and limits. Lengths in mm; the defaults are the inch
 * sizes a maker would choose, written as inches × 25.4 so they stay exact.
 *
 * Trade sizes used as defaults (common practice, no published source): 3/4 in stock for rails
 * and stiles, square legs of 1-3/4 in, a 1/4 in groove, panel grooves about as deep as wide or a
 * little deeper, a tongue about 1/16 in shorter than its groove is deep.
 */
import { SHEET_GOOD_IDS } from '../../wood/sheetGoods.ts';
import type { ParamDef } from '../paramDef.ts';

const IN = 25.4;

const SIZE = 'Size';
const LEGS = 'Legs';
const FRAME = 'Frame';
const JOINERY = 'Joinery';
const PANELS = 'Panels';
const BOTTOM = 'Bottom';
const LID = 'Lid';
const HARDWARE = 'Hinges and lid support';
const WOOD = 'Wood and use';
const MILLING = 'Milling and stock';

const sheetChoice = (): { value: string; label: string }[] => SHEET_GOOD_IDS.map((id) => ({ value: id, label: id }));

/** Every chest parameter, in form order. */
export const CHEST_PARAMS: readonly ParamDef[] = [
  { key: 'width', label: 'Width over the legs', group: SIZE, kind: 'length', default: 40 * IN, min: 300, max: 2400, help: 'Outside width of the case, leg face to leg face; the lid overhang adds to it.' },
  { key: 'depth', label: 'Depth over the legs', group: SIZE, kind: 'length', default: 19 * IN, min: 250, max: 1200, help: 'Outside depth of the case, leg face to leg face; the lid overhangs add to it.' },
  { key: 'height', label: 'Height to the top of the lid', group: SIZE, kind: 'length', default: 23 * IN, min: 250, max: 1200, help: 'From the floor to the top of the closed lid.' },

  { key: 'legSize', label: 'Leg size (square)', group: LEGS, kind: 'length', default: 1.75 * IN, min: 25, max: 150, help: 'Square section of the four corner legs; 1-3/4 in is common.' },
  { key: 'footHeight', label: 'Foot height', group: LEGS, kind: 'length', default: 3 * IN, min: 0, max: 400, help: 'Leg below the bottom rail.' },

  { key: 'stockThickness', label: 'Rail and stile thickness', group: FRAME, kind: 'length', default: 0.75 * IN, min: 12, max: 45, help: '3/4 in, milled from 4/4 stock, is common.' },
  { key: 'topRailWidth', label: 'Top rail width', group: FRAME, kind: 'length', default: 3 * IN, min: 25, max: 300 },
  { key: 'bottomRailWidth', label: 'Bottom rail width', group: FRAME, kind: 'length', default: 4 * IN, min: 25, max: 300, help: 'Must hold the bottom panel and its cleats below the panel groove.' },
  { key: 'frontStileCount', label: 'Centre stiles, front and back', group: FRAME, kind: 'number', default: 1, min: 0, max: 6, integer: true },
  { key: 'sideStileCount', label: 'Centre stiles, each side', group: FRAME, kind: 'number', default: 0, min: 0, max: 4, integer: true },
  { key: 'stileWidth', label: 'Centre stile width', group: FRAME, kind: 'length', default: 2.5 * IN, min: 25, max: 200 },

  { key: 'grooveWidth', label: 'Groove width', group: JOINERY, kind: 'length', default: 0.25 * IN, min: 3, max: 25, help: 'One width for every groove, so one bit or dado set cuts them all; rail tongues and panel tongues match it.' },
  { key: 'legGrooveDepth', label: 'Groove depth in the legs', group: JOINERY, kind: 'length', default: 0.5 * IN, min: 3, max: 60 },
  { key: 'frameGrooveDepth', label: 'Groove depth in rails and stiles', group: JOINERY, kind: 'length', default: 0.375 * IN, min: 3, max: 40 },
  { key: 'railTongueLength', label: 'Rail tongue length', group: JOINERY, kind: 'length', default: 0.4375 * IN, min: 3, max: 60, help: 'Stub tenon on each rail end; about 1/16 in shorter than the leg groove is deep.' },
  { key: 'tongueClearance', label: 'Tongue end clearance', group: JOINERY, kind: 'length', default: 0.0625 * IN, min: 0, max: 6, help: 'Gap left between a stile or panel tongue and the bottom of its groove.' },
  { key: 'legGrooveStop', label: 'Leg groove stop', group: JOINERY, kind: 'length', default: 0.5 * IN, min: 0, max: 100, help: 'How far inside each rail edge the leg groove stops, so it does not show at the leg ends.' },
  { key: 'backGrooveOffset', label: 'Back groove offset', group: JOINERY, kind: 'length', default: 0, min: -40, max: 40, help: 'Moves the groove that takes the back frame toward the back face (positive), so the back rail lines up with the hinges.' },

  { key: 'panelMaterial', label: 'Panel material', group: PANELS, kind: 'enum', default: 'plywood', options: [{ value: 'plywood', label: 'Plywood or MDF (sheet)' }, { value: 'solid', label: 'Solid wood, floating' }] },
  { key: 'panelSheet', label: 'Panel sheet', group: PANELS, kind: 'sheet', default: 'hardwood-plywood-1/2', options: sheetChoice(), help: 'Used when the panels are sheet goods; a panel thicker than the groove is rabbeted to a tongue.', shownWhen: [{ param: 'panelMaterial', is: ['plywood'] }] },
  { key: 'panelThickness', label: 'Solid panel thickness', group: PANELS, kind: 'length', default: 0.5 * IN, min: 3, max: 30, help: 'Used when the panels are solid wood.', shownWhen: [{ param: 'panelMaterial', is: ['solid'] }] },
  { key: 'panelGrain', label: 'Solid panel grain', group: PANELS, kind: 'enum', default: 'horizontal', options: [{ value: 'horizontal', label: 'Horizontal (moves up and down)' }, { value: 'vertical', label: 'Vertical (moves side to side)' }], shownWhen: [{ param: 'panelMaterial', is: ['solid'] }] },

  { key: 'bottomSheet', label: 'Bottom sheet', group: BOTTOM, kind: 'sheet', default: 'hardwood-plywood-1/2', options: sheetChoice() },
  { key: 'cleatWidth', label: 'Cleat height', group: BOTTOM, kind: 'length', default: 0.75 * IN, min: 10, max: 80, help: 'Vertical size of the cleats the bottom rests on.' },
  { key: 'cleatThickness', label: 'Cleat thickness', group: BOTTOM, kind: 'length', default: 0.75 * IN, min: 10, max: 60, help: 'How far the cleats stand in from the rails: the bottom bears on this.' },
  { key: 'bottomClearance', label: 'Bottom fit clearance', group: BOTTOM, kind: 'length', default: 0.0625 * IN, min: 0, max: 10, help: 'Gap left around the bottom so it drops in square.' },

  { key: 'lidThickness', label: 'Lid thickness', group: LID, kind: 'length', default: 0.75 * IN, min: 12, max: 50 },
  { key: 'lidOverhangFront', label: 'Lid overhang, front', group: LID, kind: 'length', default: 1 * IN, min: 0, max: 100 },
  { key: 'lidOverhangSide', label: 'Lid overhang, each side', group: LID, kind: 'length', default: 1 * IN, min: 0, max: 100 },
  { key: 'lidOverhangBack', label: 'Lid overhang, back', group: LID, kind: 'length', default: 0.25 * IN, min: 0, max: 50 },
  { key: 'lidBoardWidth', label: 'Lid board width', group: LID, kind: 'length', default: 5 * IN, min: 50, max: 300, help: 'Widest board in the lid glue-up; narrower boards stay flatter.' },
  { key: 'battenCount', label: 'Lid battens', group: LID, kind: 'number', default: 2, min: 0, max: 6, integer: true },
  { key: 'battenWidth', label: 'Batten width', group: LID, kind: 'length', default: 2 * IN, min: 20, max: 150, shownWhen: [{ param: 'battenCount', atLeast: 1 }] },
  { key: 'battenThickness', label: 'Batten thickness', group: LID, kind: 'length', default: 0.75 * IN, min: 10, max: 50, shownWhen: [{ param: 'battenCount', atLeast: 1 }] },
  { key: 'battenSlots', label: 'Battens screwed through slots', group: LID, kind: 'boolean', default: true, help: 'Slots let the lid move across its grain; round holes split it.', shownWhen: [{ param: 'battenCount', atLeast: 1 }] },
  { key: 'screwDiameter', label: 'Screw shank diameter', group: LID, kind: 'length', default: 4.2, min: 2, max: 10, help: 'Screws through the battens and cleats (a #8 wood screw is about 4.2 mm, from memory, approximate).' },

  { key: 'hingeType', label: 'Hinge type', group: HARDWARE, kind: 'enum', default: 'lid-support', options: [{ value: 'lid-support', label: 'Lid-support hinges (hold the lid at any angle)' }, { value: 'butt', label: 'Butt hinges (need a separate lid support)' }] },
  { key: 'hingeCount', label: 'Hinges', group: HARDWARE, kind: 'number', default: 2, min: 2, max: 6, integer: true },
  { key: 'hingeLength', label: 'Hinge leaf length', group: HARDWARE, kind: 'length', default: 2.5 * IN, min: 20, max: 200 },
  { key: 'hingeLeafWidth', label: 'Hinge leaf width', group: HARDWARE, kind: 'length', default: 0.625 * IN, min: 5, max: 60 },
  { key: 'hingeLeafThickness', label: 'Hinge leaf thickness', group: HARDWARE, kind: 'length', default: 2, min: 0.5, max: 6 },
  { key: 'hingeRecess', label: 'Hinge leaves let into', group: HARDWARE, kind: 'enum', default: 'lid', options: [{ value: 'lid', label: 'The lid (both leaves)' }, { value: 'back-rail', label: 'The back rail (both leaves)' }, { value: 'both', label: 'One leaf each' }, { value: 'none', label: 'Not recessed' }] },
  { key: 'hingeTorqueRatingNm', label: 'Lid-support rating per hinge', group: HARDWARE, kind: 'number', default: 0, min: 0, max: 200, unit: 'N·m', help: 'From the hinge maker; 0 if not known yet — the engine then says what each hinge must hold.', shownWhen: [{ param: 'hingeType', is: ['lid-support'] }] },

  { key: 'fingerNotch', label: 'Finger notch in the front rail', group: LID, kind: 'boolean', default: true },
  { key: 'fingerNotchWidth', label: 'Finger notch width', group: LID, kind: 'length', default: 3 * IN, min: 20, max: 300, shownWhen: [{ param: 'fingerNotch', is: [true] }] },
  { key: 'fingerNotchDepth', label: 'Finger notch depth', group: LID, kind: 'length', default: 0.375 * IN, min: 3, max: 40, shownWhen: [{ param: 'fingerNotch', is: [true] }] },

  { key: 'species', label: 'Species', group: WOOD, kind: 'species', default: 'white-oak' },
  { key: 'childAccess', label: 'A child could reach it', group: WOOD, kind: 'boolean', default: true, help: 'Shows the lid-support, ventilation and no-latch cautions.' },

  { key: 'lengthAllowance', label: 'Rough length allowance', group: MILLING, kind: 'length', default: 1 * IN, min: 0, max: 150 },
  { key: 'widthAllowance', label: 'Rough width allowance', group: MILLING, kind: 'length', default: 0.25 * IN, min: 0, max: 50 },
  { key: 'thicknessAllowance', label: 'Rough thickness allowance', group: MILLING, kind: 'length', default: 0.125 * IN, min: 0, max: 25, help: 'Added before rounding up to the next quarter (4/4, 5/4, 8/4).' },
  { key: 'maxBoardLength', label: 'Longest board you can get', group: MILLING, kind: 'length', default: 96 * IN, min: 600, max: 6000 },
  { key: 'maxBoardWidth', label: 'Widest board you can get', group: MILLING, kind: 'length', default: 8 * IN, min: 75, max: 600 },
];
