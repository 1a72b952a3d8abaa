import { describe, expect, it } from 'vitest';
import type { ParamCondition, ParamDef, ParamShownEntry } from '../../../shared/engine/paramDef.ts';
import { conditionHolds, entryHolds, paramShown } from '../../../shared/engine/paramShown.ts';
import { defaultSpec, paramDefs, PIECE_KINDS } from '../../../shared/engine/params.ts';

const base: ParamDef = { key: 'rowHeight2', label: 'Row 2', group: 'Drawer heights', kind: 'length', default: 150 };

/** Every plain condition of `entries`, those inside `anyOf` lists included. */
const conditionsOf = (entries: readonly ParamShownEntry[]): ParamCondition[] => entries.flatMap((entry) => ('anyOf' in entry ? entry.anyOf.flat() : [entry]));

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

describe('entryHolds', () => {
  const eitherShelf: ParamShownEntry = { anyOf: [[{ param: 'fixedShelves', atLeast: 1 }], [{ param: 'adjustableShelves', atLeast: 1 }]] };

  it('holds an either-or entry when any one of its lists holds, and not when none does', () => {
    expect(entryHolds(eitherShelf, { fixedShelves: 1, adjustableShelves: 0 })).toBe(true);
    expect(entryHolds(eitherShelf, { fixedShelves: 0, adjustableShelves: 2 })).toBe(true);
    expect(entryHolds(eitherShelf, { fixedShelves: 0, adjustableShelves: 0 })).toBe(false);
  });

  it('needs every condition of a list inside an either-or entry', () => {
    const entry: ParamShownEntry = { anyOf: [[{ param: 'doorCount', atLeast: 1 }, { param: 'doorStyle', is: ['slab'] }], [{ param: 'shelfMaterial', is: ['solid'] }]] };
    expect(entryHolds(entry, { doorCount: 2, doorStyle: 'frame-and-panel', shelfMaterial: 'sheet' })).toBe(false);
    expect(entryHolds(entry, { doorCount: 2, doorStyle: 'slab', shelfMaterial: 'sheet' })).toBe(true);
    expect(entryHolds(entry, { doorCount: 0, doorStyle: 'slab', shelfMaterial: 'solid' })).toBe(true);
  });

  it('never holds an either-or entry with no lists', () => {
    expect(entryHolds({ anyOf: [] }, { doorCount: 2 })).toBe(false);
  });

  it('holds a plain condition as conditionHolds does', () => {
    expect(entryHolds({ param: 'doorCount', atLeast: 1 }, { doorCount: 1 })).toBe(true);
    expect(entryHolds({ param: 'doorCount', atLeast: 1 }, { doorCount: 0 })).toBe(false);
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

  it('shows a parameter with an either-or entry and a plain condition only while both hold', () => {
    const def: ParamDef = { ...base, shownWhen: [{ anyOf: [[{ param: 'fixedShelves', atLeast: 1 }], [{ param: 'adjustableShelves', atLeast: 1 }]] }, { param: 'shelfMaterial', is: ['sheet'] }] };
    expect(paramShown(def, { fixedShelves: 1, adjustableShelves: 0, shelfMaterial: 'sheet' })).toBe(true);
    expect(paramShown(def, { fixedShelves: 1, adjustableShelves: 0, shelfMaterial: 'solid' })).toBe(false);
    expect(paramShown(def, { fixedShelves: 0, adjustableShelves: 0, shelfMaterial: 'sheet' })).toBe(false);
  });

  it('names only parameters of the same piece, and only choices that parameter offers, inside either-or entries too', () => {
    let eitherOrLists = 0;
    for (const kind of PIECE_KINDS) {
      const defs = paramDefs(kind);
      for (const def of defs) {
        for (const entry of def.shownWhen ?? []) {
          if ('anyOf' in entry) {
            expect(entry.anyOf.length, `${kind}.${def.key} either-or`).toBeGreaterThan(1);
            for (const list of entry.anyOf) expect(list.length, `${kind}.${def.key} either-or list`).toBeGreaterThan(0);
            eitherOrLists += entry.anyOf.length;
          }
        }
        for (const condition of conditionsOf(def.shownWhen ?? [])) {
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
    expect(eitherOrLists, 'the either-or entries were checked').toBeGreaterThan(0);
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

  it('shows the dresser\'s carcass sheet with a carcass or with a sheet top, and its other carcass settings only with a carcass', () => {
    const spec = defaultSpec('dresser');
    const shown = (params: typeof spec.params) => paramDefs('dresser').filter((d) => ['carcassSheet', 'backSheet', 'carcassJoinery'].includes(d.key) && paramShown(d, params)).map((d) => d.key);
    expect(shown(spec.params)).toEqual(['carcassSheet', 'backSheet', 'carcassJoinery']);
    expect(shown({ ...spec.params, caseConstruction: 'frame-and-panel', topMaterial: 'solid' })).toEqual([]);
    expect(shown({ ...spec.params, caseConstruction: 'frame-and-panel', topMaterial: 'sheet' })).toEqual(['carcassSheet']);
  });

  it('shows the cabinet\'s shelf material with fixed shelves or adjustable ones, and hides it with none', () => {
    const spec = defaultSpec('cabinet');
    const material = paramDefs('cabinet').find((d) => d.key === 'shelfMaterial')!;
    expect(paramShown(material, { ...spec.params, adjustableShelves: 1, fixedShelves: 0 })).toBe(true);
    expect(paramShown(material, { ...spec.params, adjustableShelves: 0, fixedShelves: 2 })).toBe(true);
    expect(paramShown(material, { ...spec.params, adjustableShelves: 0, fixedShelves: 0 })).toBe(false);
    const sheet = paramDefs('cabinet').find((d) => d.key === 'shelfSheet')!;
    expect(paramShown(sheet, { ...spec.params, adjustableShelves: 0, fixedShelves: 1, shelfMaterial: 'sheet' })).toBe(true);
    expect(paramShown(sheet, { ...spec.params, adjustableShelves: 0, fixedShelves: 0, shelfMaterial: 'sheet' })).toBe(false);
  });
});
