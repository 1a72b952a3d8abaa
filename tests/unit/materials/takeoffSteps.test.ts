import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildPiece, type PieceSpec } from '../../../shared/engine/index.ts';
import { materialsTakeoff, materialsTakeoffSteps, type TakeoffProgress } from '../../../shared/materials/takeoff.ts';

const spec = JSON.parse(readFileSync(new URL('../../fixtures/specs/chest-blanket-coastal.json', import.meta.url), 'utf8')) as PieceSpec;
const result = buildPiece(spec);

const instances = (t: ReturnType<typeof materialsTakeoff>) =>
  t.boards.reduce((n, b) => n + b.layout.boards.flatMap((x) => x.parts).length + b.layout.unplaced.length, 0) +
  t.sheets.reduce((n, s) => n + s.layout.sheets.flatMap((x) => x.parts).length + s.layout.unplaced.length, 0);

describe('materialsTakeoffSteps', () => {
  it('run to the end gives the same takeoff as materialsTakeoff', () => {
    const steps = materialsTakeoffSteps(result, { sheetAttempts: 20, boardAttempts: 8 });
    let next = steps.next();
    while (!next.done) next = steps.next(false);
    expect(next.value).toEqual(materialsTakeoff(result, { sheetAttempts: 20, boardAttempts: 8 }));
    expect(next.value.cancelled).toBe(false);
  });

  it('reports each layout in turn, with its label, index and attempts', () => {
    const seen: TakeoffProgress[] = [];
    const steps = materialsTakeoffSteps(result, { sheetAttempts: 20, boardAttempts: 8 });
    for (let next = steps.next(); !next.done; next = steps.next(false)) seen.push(next.value);
    const layouts = seen[0]!.layouts;
    // The chest has white oak at two thicknesses (boards) and one sheet good.
    expect(layouts).toBe(3);
    // Layouts run one after another: the index never goes back, and starts at the first.
    expect(seen[0]!.layout).toBe(0);
    expect(seen.every((p, i) => i === 0 || p.layout >= seen[i - 1]!.layout)).toBe(true);
    expect(seen.every((p) => p.done >= 1 && p.done <= p.total)).toBe(true);
    expect(seen.some((p) => /White oak 4\/4/i.test(p.label))).toBe(true);
  });

  it('stopped at the first step still places or reports every part, and says it was cancelled', () => {
    const whole = materialsTakeoff(result, { sheetAttempts: 20, boardAttempts: 8 });
    const steps = materialsTakeoffSteps(result, { sheetAttempts: 20, boardAttempts: 8 });
    let next = steps.next();
    let yields = 0;
    while (!next.done) {
      yields++;
      next = steps.next(true);
    }
    expect(yields).toBe(1);
    expect(next.value.cancelled).toBe(true);
    expect(instances(next.value)).toBe(instances(whole));
  });
});
