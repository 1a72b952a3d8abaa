/**
 * fast-check generators for dresser and cabinet specs: sensible ones (most pass validation; the
 * rest are refused with an InputError) and broken ones (wrong types, out-of-range values,
 * unknown keys, impossible combinations).
 */
import fc from 'fast-check';
import { CABINET_PARAMS } from '../../../../shared/engine/pieces/cabinetParams.ts';
import { DRESSER_PARAMS } from '../../../../shared/engine/pieces/dresserParams.ts';
import type { PieceSpec } from '../../../../shared/engine/types.ts';
import { SPECIES_IDS } from '../../../../shared/wood/species.ts';

const len = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const climate = fc.record({ buildMcPercent: len(6, 11), lowMcPercent: len(4, 6), highMcPercent: len(11, 16) });

const caseCommon = {
  carcassSheet: fc.constantFrom('hardwood-plywood-3/4', 'softwood-plywood-3/4', 'mdf-3/4', 'hardwood-plywood-1/2'),
  backSheet: fc.constantFrom('hardwood-plywood-1/4', 'mdf-1/4', 'hardwood-plywood-1/2'),
  backFit: fc.constantFrom('rabbet', 'groove'), backGrooveSetIn: len(5, 15),
  carcassJoinery: fc.constantFrom('dado', 'rabbet'), jointDepth: len(3, 7), dadoEndWall: len(6, 40),
  faceFrame: fc.boolean(), faceFrameThickness: len(16, 25), faceFrameStile: len(25, 70), faceFrameTopRail: len(25, 80),
  faceFrameBottomRail: len(25, 80), faceFrameMidRail: len(25, 70), faceFrameMullion: len(25, 70),
  frontMount: fc.constantFrom('overlay', 'inset'), overlay: len(0, 20), reveal: len(0.5, 4), frontGap: len(1, 5), frontThickness: len(15, 25),
  baseType: fc.constantFrom('toe-kick', 'plinth', 'legs', 'none'), baseHeight: len(20, 150), toeKickSetback: len(0, 100), footSize: len(30, 80),
  species: fc.constantFrom(...SPECIES_IDS), finish: fc.constantFrom('clear', 'paint'),
};

/** A dresser a maker might plausibly ask for. */
export const sensibleDresserSpec: fc.Arbitrary<PieceSpec> = fc.record({
  width: len(600, 2000), depth: len(380, 700), height: len(600, 1600),
  drawerRows: fc.integer({ min: 1, max: 5 }), drawerColumns: fc.integer({ min: 1, max: 3 }),
  slideType: fc.constantFrom('side-mount', 'undermount', 'wood-runners'), drawerJoinery: fc.constantFrom('rabbet-and-dado', 'rabbet'),
  drawerSideThickness: len(10, 16), drawerBottomSheet: fc.constantFrom('hardwood-plywood-1/4', 'mdf-1/4'),
  drawerBottomGroove: len(3, 5), drawerBottomSetUp: len(6, 15), drawerTopClearance: len(5, 20), drawerBottomClearance: len(5, 15),
  drawerGraduation: fc.constantFrom('equal', 'arithmetic', 'geometric'), graduationStep: len(0, 30), graduationRatio: len(1, 1.2),
  topMaterial: fc.constantFrom('solid', 'sheet'), topThickness: len(18, 30), topOverhangFront: len(0, 40), topOverhangSide: len(0, 40), topOverhangBack: len(0, 20),
  stretcherWidth: len(50, 100), ...caseCommon, climate,
  webFrames: fc.constantFrom('dust-panel', 'open', 'none'), dustPanelSheet: fc.constantFrom('hardwood-plywood-1/4', 'mdf-1/4'), webFrameRailDepth: len(50, 100), runnerWidth: len(25, 60),
  caseConstruction: fc.constantFrom('carcass', 'frame-and-panel'), legSize: len(38, 64), footHeight: len(40, 150),
  panelMaterial: fc.constantFrom('plywood', 'solid'), panelGrain: fc.constantFrom('horizontal', 'vertical'), sideStileCount: fc.integer({ min: 0, max: 1 }),
}).map(({ climate: c, ...params }) => ({
  schemaVersion: 1 as const, kind: 'dresser' as const,
  params: {
    ...params,
    faceFrame: params.faceFrame || params.frontMount === 'inset' || params.slideType === 'wood-runners',
  },
  climate: c,
}));

/** A cabinet a maker might plausibly ask for. */
export const sensibleCabinetSpec: fc.Arbitrary<PieceSpec> = fc.record({
  cabinetType: fc.constantFrom('base', 'wall', 'tall'), width: len(300, 1200), depth: len(300, 700), height: len(500, 2200),
  doorCount: fc.integer({ min: 0, max: 2 }), doorStyle: fc.constantFrom('frame-and-panel', 'slab'),
  doorStileWidth: len(40, 70), doorRailWidth: len(40, 70), doorPanel: fc.constantFrom('plywood', 'solid'),
  doorPanelSheet: fc.constantFrom('hardwood-plywood-1/4', 'mdf-1/4'), doorPanelThickness: len(7, 12), slabMaterial: fc.constantFrom('sheet', 'solid'),
  adjustableShelves: fc.integer({ min: 0, max: 3 }), fixedShelves: fc.integer({ min: 0, max: 2 }), shelfMaterial: fc.constantFrom('sheet', 'solid'),
  shelfEdgeStrip: fc.boolean(), shelfLoad: len(5, 80), holeSpacing: fc.constantFrom(32, 25.4), holeSetback: len(37, 60),
  ...caseCommon, climate,
}).map(({ climate: c, ...params }) => ({
  schemaVersion: 1 as const, kind: 'cabinet' as const,
  params: { ...params, faceFrame: params.faceFrame || params.frontMount === 'inset' },
  climate: c,
}));

const broken = (kind: 'dresser' | 'cabinet', keys: string[]): fc.Arbitrary<unknown> => fc.oneof(
  fc.record({ key: fc.constantFrom(...keys), value: fc.oneof(fc.string(), fc.double(), fc.constant(Number.NaN), fc.constant(Infinity), fc.constant(-1e9), fc.constant(1e9), fc.boolean(), fc.constant(null), fc.array(fc.integer())) })
    .map(({ key, value }) => ({ schemaVersion: 1, kind, params: { [key]: value } })),
  fc.record({ key: fc.string({ minLength: 1 }).filter((k) => !keys.includes(k)), value: fc.anything() })
    .map(({ key, value }) => ({ schemaVersion: 1, kind, params: { [key]: value } })),
  fc.record({ width: len(250, 500), height: len(250, 500), depth: len(200, 320), baseHeight: len(100, 300) }).map((params) => ({ schemaVersion: 1, kind, params })),
  fc.record({ faceFrame: fc.constant(false), frontMount: fc.constant('inset') }).map((params) => ({ schemaVersion: 1, kind, params })),
  fc.record({ climate: fc.record({ buildMcPercent: fc.oneof(fc.double(), fc.string()), lowMcPercent: fc.double({ min: 20, max: 40 }), highMcPercent: fc.double({ min: 0, max: 10 }) }) })
    .map((extra) => ({ schemaVersion: 1, kind, params: {}, ...extra })),
  fc.anything(),
);

/** A dresser spec broken in one of the ways a form, a file or an API client can break it. */
export const brokenDresserSpec = broken('dresser', DRESSER_PARAMS.map((d) => d.key));
/** A cabinet spec broken likewise. */
export const brokenCabinetSpec = broken('cabinet', CABINET_PARAMS.map((d) => d.key));
