import { describe, expect, it } from 'vitest';
import { buildPiece, defaultSpec } from '../../../../shared/engine/index.ts';
import type { GlueUpStage, PieceSpec } from '../../../../shared/engine/index.ts';

const FLAT_STAGE = 'Wide parts, face frame, door frames and drawer boxes';

function dresser(params: Record<string, unknown>): PieceSpec {
  const spec = defaultSpec('dresser');
  return { ...spec, params: { ...spec.params, ...params } };
}

/** The titles of the stages that list each part, in stage order. */
function stagesByPart(stages: readonly GlueUpStage[]): Map<string, string[]> {
  const out = new Map<string, string[]>();
  for (const stage of stages) {
    for (const id of new Set(stage.steps.flatMap((s) => s.partIds))) out.set(id, [...(out.get(id) ?? []), stage.title]);
  }
  return out;
}

describe('caseGlueUpStages', () => {
  it('lists each slide spacer of a frame-and-panel dresser once, where the slides are screwed in, not where the case is joined', () => {
    const r = buildPiece(dresser({ caseConstruction: 'frame-and-panel', slideType: 'side-mount' }));
    const spacers = r.parts.filter((p) => p.id.includes('slide-spacer')).map((p) => p.id);
    expect(spacers.length).toBeGreaterThan(0);
    const byPart = stagesByPart(r.derived.glueUp);
    for (const id of spacers) expect(byPart.get(id)).toEqual(['Face frame, base and runners']);
    const screwStep = r.derived.glueUp.flatMap((s) => s.steps).find((s) => s.title === 'Screw in the drawer runners or slides')!;
    expect(screwStep.partIds).toEqual(spacers);
  });

  it('glues a frame-and-panel dresser\'s web-frame runners in as the case is joined and does not screw them in again', () => {
    const r = buildPiece(dresser({ caseConstruction: 'frame-and-panel', slideType: 'wood-runners' }));
    const runners = r.parts.filter((p) => p.role === 'runner').map((p) => p.id);
    expect(runners.length).toBeGreaterThan(0);
    const byPart = stagesByPart(r.derived.glueUp);
    for (const id of runners) expect(byPart.get(id)).toEqual(['Join the sides with the back and the web frames']);
  });

  const defaults: [string, PieceSpec][] = [
    ['carcass dresser', defaultSpec('dresser')],
    ['frame-and-panel dresser on side-mount slides', dresser({ caseConstruction: 'frame-and-panel', slideType: 'side-mount' })],
    ['frame-and-panel dresser on undermount slides', dresser({ caseConstruction: 'frame-and-panel', slideType: 'undermount' })],
    ['frame-and-panel dresser on wooden runners', dresser({ caseConstruction: 'frame-and-panel', slideType: 'wood-runners' })],
    ['cabinet', defaultSpec('cabinet')],
  ];

  it.each(defaults)('lists each part of the default %s in one stage, or made flat first and fitted in one later stage', (_name, spec) => {
    const r = buildPiece(spec);
    const byPart = stagesByPart(r.derived.glueUp);
    const twice = [...byPart].filter(([, titles]) => titles.length > 1);
    for (const [id, titles] of twice) {
      expect({ id, count: titles.length, first: titles[0] }).toEqual({ id, count: 2, first: FLAT_STAGE });
    }
  });
});
