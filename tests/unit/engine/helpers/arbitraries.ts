/**
 * fast-check generators for chest specs: sensible specs (most pass validation; the rest are
 * filtered) and broken ones (wrong types, out-of-range values, unknown keys, wrong shapes).
 */
import fc from 'fast-check';
import { SHEET_GOOD_IDS } from '../../../../shared/wood/sheetGoods.ts';
import { SPECIES_IDS } from '../../../../shared/wood/species.ts';
import { CHEST_PARAMS } from '../../../../shared/engine/pieces/chestParams.ts';
import type { PieceSpec } from '../../../../shared/engine/types.ts';

const len = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

/** A chest a maker might plausibly ask for; tongues kept short of their grooves. */
export const sensibleChestSpec: fc.Arbitrary<PieceSpec> = fc
  .record({
    width: len(450, 2000), depth: len(300, 900), height: len(380, 1000),
    legSize: len(32, 90), footHeight: len(0, 120),
    stockRatio: fc.double({ min: 0.35, max: 0.7, noNaN: true }),
    topRailWidth: len(50, 110), bottomRailWidth: len(70, 140),
    frontStileCount: fc.integer({ min: 0, max: 3 }), sideStileCount: fc.integer({ min: 0, max: 2 }), stileWidth: len(45, 90),
    grooveWidth: len(4, 8), legGrooveRatio: fc.double({ min: 0.2, max: 0.9, noNaN: true }), frameGrooveDepth: len(6, 13),
    tongueShort: len(0.5, 3), tongueClearance: len(0, 3), legGrooveStop: len(0, 20), backOffsetRatio: fc.double({ min: -1, max: 1, noNaN: true }),
    panelMaterial: fc.constantFrom('plywood', 'solid'), panelSheet: fc.constantFrom(...SHEET_GOOD_IDS), panelThickness: len(4, 14), panelGrain: fc.constantFrom('horizontal', 'vertical'),
    bottomSheet: fc.constantFrom(...SHEET_GOOD_IDS), cleatWidth: len(12, 30), cleatThickness: len(12, 30), bottomClearance: len(0, 4),
    lidThickness: len(15, 30), lidOverhangFront: len(0, 60), lidOverhangSide: len(0, 60), lidOverhangBack: len(0, 30),
    lidBoardWidth: len(80, 250), battenCount: fc.integer({ min: 0, max: 3 }), battenWidth: len(30, 70), battenThickness: len(12, 25), battenSlots: fc.boolean(),
    hingeType: fc.constantFrom('lid-support', 'butt'), hingeCount: fc.integer({ min: 2, max: 3 }), hingeRecess: fc.constantFrom('lid', 'back-rail', 'both', 'none'),
    hingeLeafThickness: len(1, 2.5), hingeLeafWidth: len(8, 15), hingeTorqueRatingNm: len(0, 30),
    fingerNotch: fc.boolean(), species: fc.constantFrom(...SPECIES_IDS), childAccess: fc.boolean(),
    climate: fc.record({ buildMcPercent: len(6, 11), lowMcPercent: len(4, 6), highMcPercent: len(11, 16) }),
  })
  .map((r) => {
    const stockThickness = Math.min(45, Math.max(12, r.legSize * r.stockRatio));
    const grooveWidth = Math.min(r.grooveWidth, stockThickness - 4);
    const legGrooveDepth = Math.max(3, (r.legSize / 2 - grooveWidth / 2) * r.legGrooveRatio);
    const { stockRatio: _s, legGrooveRatio: _l, tongueShort, backOffsetRatio, climate, ...rest } = r;
    return {
      schemaVersion: 1 as const,
      kind: 'chest' as const,
      params: {
        ...rest, stockThickness, grooveWidth, legGrooveDepth,
        railTongueLength: Math.max(3, legGrooveDepth - tongueShort),
        backGrooveOffset: ((r.legSize - stockThickness) / 2) * backOffsetRatio * 0.9,
      },
      climate,
    };
  });

const keys = CHEST_PARAMS.map((d) => d.key);

/** A spec broken in one of the ways a form, a file or an API client can break it. */
export const brokenChestSpec: fc.Arbitrary<unknown> = fc.oneof(
  fc.record({ key: fc.constantFrom(...keys), value: fc.oneof(fc.string(), fc.double(), fc.constant(Number.NaN), fc.constant(Infinity), fc.constant(-1e9), fc.constant(1e9), fc.boolean(), fc.constant(null), fc.array(fc.integer())) })
    .map(({ key, value }) => ({ schemaVersion: 1, kind: 'chest', params: { [key]: value } })),
  fc.record({ key: fc.string({ minLength: 1 }).filter((k) => !keys.includes(k)), value: fc.anything() })
    .map(({ key, value }) => ({ schemaVersion: 1, kind: 'chest', params: { [key]: value } })),
  fc.record({ width: len(300, 700), legSize: len(120, 150) }).map((params) => ({ schemaVersion: 1, kind: 'chest', params })),
  fc.record({ height: len(250, 330), topRailWidth: len(100, 300), bottomRailWidth: len(100, 300) }).map((params) => ({ schemaVersion: 1, kind: 'chest', params })),
  fc.record({ legSize: len(25, 40), legGrooveDepth: len(40, 60) }).map((params) => ({ schemaVersion: 1, kind: 'chest', params })),
  fc.record({ climate: fc.record({ buildMcPercent: fc.oneof(fc.double(), fc.string()), lowMcPercent: fc.double({ min: 20, max: 40 }), highMcPercent: fc.double({ min: 0, max: 10 }) }) })
    .map(({ climate }) => ({ schemaVersion: 1, kind: 'chest', params: {}, climate })),
  fc.anything(),
  fc.record({ schemaVersion: fc.oneof(fc.integer(), fc.string()), kind: fc.oneof(fc.string(), fc.constantFrom('dresser', 'cabinet')), params: fc.anything() }),
);
