import { describe, expect, it } from 'vitest';
import { isInputError } from '../../../shared/errors.ts';
import { MM_PER_INCH } from '../../../shared/units/length.ts';
import { PANEL_FIT_CLEARANCE_MM, panelFloat, type PanelFloatInput } from '../../../shared/wood/float.ts';

const GAP_TOLERANCE_MM = 1e-6;
const SHOP_TO_HOME = { buildMcPercent: 8, lowMcPercent: 6, highMcPercent: 11 };
const GROOVE_3_8 = (3 / 8) * MM_PER_INCH;

describe('panelFloat', () => {
  it('leaves half the seasonal swell plus the fit clearance at each side', () => {
    // WH2010 Table 13-5, black cherry C_T 0.00248: 355.6 mm × 0.00248 × (11 − 8) = 2.645664 mm of swell.
    const float = panelFloat({ panelWidthMm: 355.6, material: 'black-cherry', sawn: 'flat', grooveDepthMm: GROOVE_3_8, climate: SHOP_TO_HOME });
    expect(Math.abs(float.gapEachSideMm - (2.645664 / 2 + PANEL_FIT_CLEARANCE_MM))).toBeLessThan(GAP_TOLERANCE_MM);
    expect(float.gapEachSideIn).toBeCloseTo(float.gapEachSideMm / MM_PER_INCH, 12);
    expect(float.check.ok).toBe(true);
    expect(float.check.message).toMatch(/^ok/);
  });

  it('keeps the tongue in the groove at the driest: groove depth − gap − half the shrinkage', () => {
    const float = panelFloat({ panelWidthMm: 355.6, material: 'black-cherry', sawn: 'flat', grooveDepthMm: GROOVE_3_8, climate: SHOP_TO_HOME });
    // 355.6 × 0.00248 × (8 − 6) = 1.763776 mm of shrinkage
    const expected = GROOVE_3_8 - float.gapEachSideMm - 1.763776 / 2;
    expect(Math.abs(float.engagementAtDriestMm - expected)).toBeLessThan(GAP_TOLERANCE_MM);
    expect(float.engagementMin.text.in).toBe('3/16"');
  });

  it('reports the shortfall in mm and inches with the three fixes when the groove is too shallow', () => {
    const float = panelFloat({ panelWidthMm: 24 * MM_PER_INCH, material: 'white-oak', sawn: 'flat', grooveDepthMm: GROOVE_3_8, climate: SHOP_TO_HOME });
    expect(float.check.ok).toBe(false);
    expect(float.check.shortfallMm).toBeGreaterThan(0);
    expect(float.check.shortfallIn).toBeCloseTo(float.check.shortfallMm / MM_PER_INCH, 12);
    expect(float.check.fix).toMatch(/narrower|no wider/);
    expect(float.check.fix).toMatch(/deep/);
    expect(float.check.fix).toMatch(/plywood/);
    expect(float.check.message).toMatch(/short by/);
  });

  it('proposes a narrower panel that then passes', () => {
    const base: PanelFloatInput = { panelWidthMm: 24 * MM_PER_INCH, material: 'white-oak', sawn: 'flat', grooveDepthMm: GROOVE_3_8, climate: SHOP_TO_HOME };
    const failing = panelFloat(base);
    const widestIn = /no wider than about ([\d ]+\/\d+|\d+)"/.exec(failing.check.fix);
    expect(widestIn).not.toBeNull();
    // Rounded to the nearest 1/16 in; take 1/16 in off so the rounding cannot carry it over.
    const [whole, fraction] = (widestIn?.[1] ?? '0').split(' ');
    const [top, bottom] = (fraction ?? '0/1').split('/').map(Number);
    const widthIn = Number(whole) + (top ?? 0) / (bottom ?? 1) - 1 / 16;
    expect(panelFloat({ ...base, panelWidthMm: widthIn * MM_PER_INCH }).check.ok).toBe(true);
  });

  it('passes once the groove is cut as deep as the fix asks', () => {
    const base: PanelFloatInput = { panelWidthMm: 24 * MM_PER_INCH, material: 'white-oak', sawn: 'flat', grooveDepthMm: GROOVE_3_8, climate: SHOP_TO_HOME };
    const failing = panelFloat(base);
    const halfShrink = (failing.movement?.shrinkMm ?? 0) / 2;
    const deepEnough = 2 * (failing.gapEachSideMm + halfShrink) + 0.01;
    expect(panelFloat({ ...base, grooveDepthMm: deepEnough }).check.ok).toBe(true);
  });

  it('gives plywood only a small fit clearance (common practice, no published source)', () => {
    const float = panelFloat({ panelWidthMm: 24 * MM_PER_INCH, material: 'plywood', grooveDepthMm: (1 / 4) * MM_PER_INCH, climate: SHOP_TO_HOME });
    expect(float.movement).toBeNull();
    expect(float.gapEachSideIn).toBeLessThanOrEqual(1 / 16);
    expect(float.gapEachSide.text.in).toBe('1/32"');
    expect(float.check.ok).toBe(true);
    expect(float.notes.join(' ')).toMatch(/negligibly/);
  });

  it('treats a named sheet good like plywood', () => {
    const float = panelFloat({ panelWidthMm: 500, material: 'hardwood-plywood-1/4', grooveDepthMm: 6, climate: SHOP_TO_HOME });
    expect(float.material.kind).toBe('sheet');
    expect(Math.abs(float.gapEachSideMm - PANEL_FIT_CLEARANCE_MM)).toBeLessThan(GAP_TOLERANCE_MM);
  });

  it('needs a wider gap for a wider solid panel', () => {
    const narrow = panelFloat({ panelWidthMm: 200, material: 'white-oak', grooveDepthMm: 12, climate: SHOP_TO_HOME });
    const wide = panelFloat({ panelWidthMm: 400, material: 'white-oak', grooveDepthMm: 12, climate: SHOP_TO_HOME });
    expect(wide.gapEachSideMm).toBeGreaterThan(narrow.gapEachSideMm);
  });

  it.each([
    [{ panelWidthMm: -1 }, 'panelWidthMm'],
    [{ grooveDepthMm: 0 }, 'grooveDepthMm'],
    [{ tongueEngagementMinMm: 20 }, 'tongueEngagementMinMm'],
    [{ fitClearanceMm: -1 }, 'fitClearanceMm'],
    [{ material: 'cardboard' }, 'material'],
  ])('rejects %o, naming %s', (override, field) => {
    const input = { panelWidthMm: 300, material: 'black-cherry', grooveDepthMm: 10, climate: SHOP_TO_HOME, ...override };
    let caught: unknown;
    try {
      panelFloat(input as PanelFloatInput);
    } catch (error) {
      caught = error;
    }
    expect(isInputError(caught) && caught.field).toBe(field);
  });
});
