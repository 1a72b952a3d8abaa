import { describe, expect, it } from 'vitest';
import type { ParamDef } from '../../../shared/engine/paramDef.ts';
import { conditionHolds, paramShown } from '../../../shared/engine/paramShown.ts';
import { defaultSpec, paramDefs, PIECE_KINDS } from '../../../shared/engine/params.ts';

const base: ParamDef = { key: 'rowHeight2', label: 'Row 2', group: 'Drawer heights', kind: 'length', default: 150 };

describe('conditionHolds', () => {
  it('holds when the value is one of the listed values', () => {
    expect(conditionHolds({ param: 'drawerGraduation', is: ['listed'] }, { drawerGraduation: 'listed' })).toBe(true);
    expect(conditionHolds({ param: 'drawerGraduation', is: ['listed'] }, { drawerGraduation: 'equal' })).toBe(false);
    expect(conditionHolds({ param: 'fingerNotch', is: [true] }, { fingerNotch: false })).toBe(false);
  });

  it('holds for a number at or above atLeast, and never for a value that is not a number', () => {
    expect(conditionHolds({ param: 'doorCount', atLeast: 1 }, { doorCount: 1 })).toBe(true);
    expect(conditionHolds({ param: 'doorCount', atLeast: 1 }, { doorCount: 0 })).toBe(false);
    expect(conditionHolds({ param: 'doorCount', atLeast: 1 }, { doorCount: '2' })).toBe(false);
  });

  it('does not hold for a parameter that has no value', () => {
    expect(conditionHolds({ param: 'doorCount', atLeast: 0 }, {})).toBe(false);
  });
});

describe('paramShown', () => {
  it('shows a parameter with no conditions whatever the values', () => {
    expect(paramShown(base, {})).toBe(true);
  });

  it('shows a parameter only while every one of its conditions holds', () => {
    const def: ParamDef = { ...base, shownWhen: [{ param: 'drawerGraduation', is: ['listed'] }, { param: 'drawerRows', atLeast: 3 }] };
    expect(paramShown(def, { drawerGraduation: 'listed', drawerRows: 3 })).toBe(true);
    expect(paramShown(def, { drawerGraduation: 'listed', drawerRows: 2 })).toBe(false);
    expect(paramShown(def, { drawerGraduation: 'arithmetic', drawerRows: 6 })).toBe(false);
  });

  it('names only parameters of the same piece, and only choices that parameter offers', () => {
    for (const kind of PIECE_KINDS) {
      const defs = paramDefs(kind);
      for (const def of defs) {
        for (const condition of def.shownWhen ?? []) {
          const target = defs.find((d) => d.key === condition.param);
          expect(target, `${kind}.${def.key} names ${condition.param}`).toBeDefined();
          if ('is' in condition && target?.kind === 'enum') {
            for (const value of condition.is) expect(target.options?.map((o) => o.value), `${kind}.${def.key}`).toContain(value);
          }
          if ('is' in condition && target?.kind === 'boolean') for (const value of condition.is) expect(typeof value).toBe('boolean');
          if ('atLeast' in condition) expect(['number', 'length']).toContain(target?.kind);
        }
      }
    }
  });

  it('shows the dresser\'s listed heights only when the heights are listed, and only the rows above the bottom one', () => {
    const spec = defaultSpec('dresser');
    const rowHeights = paramDefs('dresser').filter((d) => d.key.startsWith('rowHeight'));
    expect(rowHeights.filter((d) => paramShown(d, spec.params))).toHaveLength(0);
    const listed = { ...spec.params, drawerGraduation: 'listed', drawerRows: 4 };
    expect(rowHeights.filter((d) => paramShown(d, listed)).map((d) => d.key)).toEqual(['rowHeight1', 'rowHeight2', 'rowHeight3']);
  });

  it('hides the cabinet\'s door style and door sizes when it has no doors', () => {
    const spec = defaultSpec('cabinet');
    const doorKeys = ['doorStyle', 'doorStileWidth', 'doorRailWidth', 'doorPanel', 'slabMaterial'];
    const shownKeys = (params: typeof spec.params) => paramDefs('cabinet').filter((d) => doorKeys.includes(d.key) && paramShown(d, params)).map((d) => d.key);
    expect(shownKeys(spec.params)).toContain('doorStyle');
    expect(shownKeys(spec.params)).toContain('doorStileWidth');
    expect(shownKeys({ ...spec.params, doorCount: 0 })).toEqual([]);
  });
});
