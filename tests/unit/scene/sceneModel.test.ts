import { describe, expect, it } from 'vitest';
import { Matrix4, Vector3 } from 'three';
import { sceneModel } from '../../../src/scene/sceneModel.ts';
import { isInputError } from '../../../shared/errors.ts';
import { SPECIES } from '../../../shared/wood/species.ts';
import { SHEET_GOODS } from '../../../shared/wood/sheetGoods.ts';
import type { Box3 } from '../../../shared/engine/types.ts';
import { BOTTOM_RAIL_Z, GROOVE_Y, HEIGHT, LEG, RAIL_Y, SPAN, TONGUE_L, WIDTH, frameSideResult } from './fixtures/frameSide.ts';

/** Sizes here are sums of a few mm values; anything past a micrometre is a real error. */
const TOLERANCE_MM = 1e-6;

function expectBox(actual: Box3, expected: Box3): void {
  for (let i = 0; i < 3; i++) {
    expect(actual.min[i]).toBeCloseTo(expected.min[i]!, 6);
    expect(actual.max[i]).toBeCloseTo(expected.max[i]!, 6);
  }
}

/** The world box of the 8 corners of a part's local box, carried by the mesh's matrix. */
function boxThroughMatrix(elements: number[], size: readonly number[]): Box3 {
  const m = new Matrix4().fromArray(elements);
  const min = [Infinity, Infinity, Infinity];
  const max = [-Infinity, -Infinity, -Infinity];
  for (const cx of [0, size[0]!]) for (const cy of [0, size[1]!]) for (const cz of [0, size[2]!]) {
    const p = new Vector3(cx, cy, cz).applyMatrix4(m).toArray();
    for (let i = 0; i < 3; i++) {
      min[i] = Math.min(min[i]!, p[i]!);
      max[i] = Math.max(max[i]!, p[i]!);
    }
  }
  return { min: min as [number, number, number], max: max as [number, number, number] };
}

describe('sceneModel', () => {
  const result = frameSideResult();

  it('draws one mesh per placed part instance, with unique keys', () => {
    const { meshes } = sceneModel(result, { explode: 0 });
    expect(meshes).toHaveLength(result.placements.length);
    expect(new Set(meshes.map((m) => m.key)).size).toBe(meshes.length);
    const perPart = result.parts.map((p) => meshes.filter((m) => m.partId === p.id).length);
    expect(perPart).toEqual(result.parts.map((p) => p.quantity));
  });

  it('puts every instance in the world box the piece was drawn in', () => {
    const { meshes } = sceneModel(result, { explode: 0 });
    const byKey = new Map(meshes.map((m) => [m.key, m.worldBox]));
    expectBox(byKey.get('leg#0')!, { min: [0, 0, 0], max: [LEG, LEG, HEIGHT] });
    expectBox(byKey.get('leg#1')!, { min: [LEG + SPAN, 0, 0], max: [WIDTH, LEG, HEIGHT] });
    expectBox(byKey.get('bottom-rail#0')!, {
      min: [LEG - TONGUE_L, RAIL_Y[0], BOTTOM_RAIL_Z[0]],
      max: [LEG + SPAN + TONGUE_L, RAIL_Y[1], BOTTOM_RAIL_Z[1]],
    });
  });

  it('gives each mesh a matrix that carries its local box onto its world box', () => {
    const { meshes } = sceneModel(result, { explode: 0.5 });
    for (const mesh of meshes) {
      const part = result.parts.find((p) => p.id === mesh.partId)!;
      expectBox(boxThroughMatrix(mesh.matrixElements, [part.lengthMm, part.widthMm, part.thicknessMm]), mesh.worldBox);
    }
  });

  it('moves each part by its explode offset times the explode amount', () => {
    const assembled = sceneModel(result, { explode: 0 }).meshes;
    for (const amount of [0.5, 1]) {
      const exploded = sceneModel(result, { explode: amount }).meshes;
      exploded.forEach((mesh, i) => {
        const placement = result.placements[i]!;
        for (let axis = 0; axis < 3; axis++) {
          const moved = mesh.worldBox.min[axis]! - assembled[i]!.worldBox.min[axis]!;
          expect(Math.abs(moved - placement.explodeMm[axis]! * amount)).toBeLessThan(TOLERANCE_MM);
        }
      });
    }
  });

  it('bounds every mesh as drawn', () => {
    const assembled = sceneModel(result, { explode: 0 });
    expectBox(assembled.bounds, { min: [0, 0, 0], max: [WIDTH, LEG, HEIGHT] });
    const exploded = sceneModel(result, { explode: 1 });
    // Legs move 120 mm out to each side; the panel 160 mm to the front.
    expectBox(exploded.bounds, { min: [-120, GROOVE_Y[0] - 160, 0], max: [WIDTH + 120, LEG, HEIGHT] });
  });

  it('colours solid parts in their species tone and sheet parts in their sheet tone', () => {
    const { meshes } = sceneModel(result, { explode: 0 });
    expect(meshes.find((m) => m.partId === 'leg')!.toneHex).toBe(SPECIES['white-oak'].toneHex);
    expect(meshes.find((m) => m.partId === 'panel')!.toneHex).toBe(SHEET_GOODS['hardwood-plywood-1/2'].toneHex);
    expect(meshes.find((m) => m.partId === 'panel')!.materialKind).toBe('sheet');
  });

  it('runs the grain of legs up and of rails across, and gives sheet goods none', () => {
    const { meshes } = sceneModel(result, { explode: 0 });
    const grainOf = (key: string) => meshes.find((m) => m.key === key)!.grain;
    expect(grainOf('leg#0')).toEqual({ kind: 'length', worldAxis: '+Z' });
    expect(grainOf('leg#1')).toEqual({ kind: 'length', worldAxis: '+Z' });
    expect(grainOf('top-rail#0')).toEqual({ kind: 'length', worldAxis: '+X' });
    expect(grainOf('panel#0')).toEqual({ kind: 'none', worldAxis: null });
  });

  it('rejects an explode amount outside 0 to 1, naming the field', () => {
    for (const explode of [-0.1, 1.5, Number.NaN]) {
      let caught: unknown;
      try {
        sceneModel(result, { explode });
      } catch (error) {
        caught = error;
      }
      expect(isInputError(caught)).toBe(true);
      expect((caught as { field: string }).field).toBe('explode');
    }
  });
});
