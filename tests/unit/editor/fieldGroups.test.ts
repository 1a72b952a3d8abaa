import { describe, expect, it } from 'vitest';
import { CHEST_PARAMS } from '../../../shared/engine/pieces/chestParams.ts';
import { groupParams } from '../../../src/editor/fieldGroups.ts';
import { choicesFor } from '../../../src/editor/fieldChoices.ts';

describe('groupParams', () => {
  it('keeps every parameter exactly once, in groups ordered as the engine lists them', () => {
    const groups = groupParams(CHEST_PARAMS);
    expect(groups.flatMap((g) => g.defs.map((d) => d.key))).toHaveLength(CHEST_PARAMS.length);
    expect(groups[0]?.title).toBe(CHEST_PARAMS[0]?.group);
    expect(new Set(groups.map((g) => g.title)).size).toBe(groups.length);
  });

  it('gathers a group whose fields are not listed together', () => {
    // The finger notch fields belong to the lid group but come after the hardware group.
    const lid = groupParams(CHEST_PARAMS).find((g) => g.title === 'Lid');
    expect(lid?.defs.map((d) => d.key)).toContain('fingerNotch');
    expect(lid?.defs.map((d) => d.key)).toContain('lidThickness');
  });

  it('gives each group an id safe for an anchor', () => {
    for (const group of groupParams(CHEST_PARAMS)) expect(group.id).toMatch(/^group-[a-z0-9-]+$/);
  });
});

describe('choicesFor', () => {
  it('names sheet goods by the library name rather than the id', () => {
    const panelSheet = CHEST_PARAMS.find((d) => d.key === 'panelSheet');
    if (!panelSheet) throw new Error('no panelSheet');
    const choices = choicesFor(panelSheet);
    expect(choices.length).toBeGreaterThan(0);
    for (const choice of choices) expect(choice.label).not.toBe(choice.value);
  });

  it('lists the species library for a species parameter', () => {
    const species = CHEST_PARAMS.find((d) => d.key === 'species');
    if (!species) throw new Error('no species');
    expect(choicesFor(species).map((c) => c.value)).toContain('white-oak');
  });
});
