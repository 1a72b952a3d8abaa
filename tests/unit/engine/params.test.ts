import { describe, expect, it } from 'vitest';
import { defaultSpec, paramDefs, validateSpec } from '../../../shared/engine/index.ts';
import { InputError, isInputError } from '../../../shared/errors.ts';
import { checkSpecForBuild } from '../../../shared/engine/params.ts';
import { chestLayout, type ChestParams } from '../../../shared/engine/pieces/chestLayout.ts';

function errorOf(spec: unknown): InputError {
  try {
    validateSpec(spec);
  } catch (error) {
    if (isInputError(error)) return error;
    throw error;
  }
  throw new Error('expected an InputError');
}

const chestWith = (params: Record<string, unknown>) => ({ schemaVersion: 1, kind: 'chest', params });

describe('paramDefs', () => {
  it('gives every chest parameter a default inside its own range', () => {
    for (const def of paramDefs('chest')) {
      if (typeof def.default === 'number') {
        expect(def.default, def.key).toBeGreaterThanOrEqual(def.min ?? -Infinity);
        expect(def.default, def.key).toBeLessThanOrEqual(def.max ?? Infinity);
      }
    }
  });

  it('uses the trade sizes as defaults (common practice, no published source)', () => {
    const d = Object.fromEntries(paramDefs('chest').map((p) => [p.key, p.default]));
    expect(d.stockThickness).toBeCloseTo(0.75 * 25.4, 9);
    expect(d.grooveWidth).toBeCloseTo(0.25 * 25.4, 9);
    expect(d.legSize).toBeCloseTo(1.75 * 25.4, 9);
    expect(d.panelSheet).toBe('hardwood-plywood-1/2');
  });

  it('refuses an unknown kind, naming the kind field and the kinds it knows', () => {
    const e = errorOf({ schemaVersion: 1, kind: 'wardrobe', params: {} });
    expect(e.field).toBe('kind');
    expect(e.limit).toContain('chest');
    expect(() => paramDefs('wardrobe' as never)).toThrow(InputError);
  });
});

describe('validateSpec', () => {
  it('fills every missing parameter and the climate from the defaults', () => {
    const spec = validateSpec(chestWith({ width: 900 }));
    expect(spec.params.width).toBe(900);
    expect(spec.params.depth).toBe(defaultSpec('chest').params.depth);
    expect(spec.climate?.buildMcPercent).toBe(8);
  });

  it.each([
    [{ width: 100 }, 'width', 'between 300 mm and 2400 mm'],
    [{ width: 'wide' }, 'width', 'between 300 mm and 2400 mm'],
    [{ frontStileCount: 1.5 }, 'frontStileCount', 'a whole number'],
    [{ panelMaterial: 'glass' }, 'panelMaterial', 'plywood, solid'],
    [{ species: 'teak' }, 'species', 'white-oak'],
    [{ battenSlots: 'yes' }, 'battenSlots', 'true or false'],
  ])('refuses %j out of range, naming %s and the limit', (params, field, limit) => {
    const e = errorOf(chestWith(params));
    expect(e.field).toBe(field);
    expect(e.limit).toContain(limit);
  });

  it('refuses legs wider than half the width', () => {
    const e = errorOf(chestWith({ width: 300, legSize: 140 }));
    expect(e.field).toBe('legSize');
    expect(e.limit).toBe(`at most ${Math.round(((300 - 25.4) / 2) * 100) / 100} mm`);
  });

  it('refuses rails wider than the height allows', () => {
    // 300 − 19.05 lid = 280.95 mm of leg; 76.2 foot + 101.6 + 100 rails + 25.4 panel = 303.2 mm.
    const e = errorOf(chestWith({ height: 300, topRailWidth: 100 }));
    expect(e.field).toBe('topRailWidth');
    expect(e.message).toMatch(/wider than the height allows/);
  });

  it('refuses a groove deeper than the leg is thick', () => {
    const e = errorOf(chestWith({ legSize: 30, legGrooveDepth: 35 }));
    expect(e.field).toBe('legGrooveDepth');
    expect(e.limit).toBe('less than 30 mm');
  });

  it('refuses a groove as wide as the stock', () => {
    expect(errorOf(chestWith({ stockThickness: 15, grooveWidth: 15 })).field).toBe('grooveWidth');
  });

  it('refuses a bottom and cleat deeper than the bottom rail', () => {
    expect(errorOf(chestWith({ bottomRailWidth: 30, cleatWidth: 25 })).field).toBe('cleatWidth');
  });

  it('refuses unknown parameters, wrong shapes and bad climates', () => {
    expect(errorOf(chestWith({ colour: 'red' })).field).toBe('colour');
    expect(errorOf({ schemaVersion: 2, kind: 'chest', params: {} }).field).toBe('schemaVersion');
    expect(errorOf({ schemaVersion: 1, kind: 'wardrobe', params: {} }).field).toBe('kind');
    expect(errorOf(null).field).toBe('spec');
    expect(errorOf({ schemaVersion: 1, kind: 'chest', params: {}, climate: { buildMcPercent: 8, lowMcPercent: 12, highMcPercent: 10 } }).field).toBe('climate.lowMcPercent');
  });
});

describe('checkSpecForBuild', () => {
  it('returns the spec validateSpec returns and, for a chest, the layout its checks read', () => {
    const spec = chestWith({ width: 1100, frontStileCount: 2 });
    const checked = checkSpecForBuild(spec);
    expect(checked.spec).toEqual(validateSpec(spec));
    expect(checked.chestLayout).toEqual(chestLayout(checked.spec.params as unknown as ChestParams, checked.spec.climate!));
    expect(checked.chestLayout!.spanXMm).toBe(1100 - 2 * (checked.spec.params.legSize as number));
  });

  it('returns no chest layout for a dresser', () => {
    expect(checkSpecForBuild(defaultSpec('dresser')).chestLayout).toBeUndefined();
  });
});
