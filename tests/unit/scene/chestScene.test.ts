import { describe, expect, it } from 'vitest';
import { buildPiece, defaultSpec } from '../../../shared/engine/index.ts';
import { sceneModel } from '../../../src/scene/sceneModel.ts';
import { createPartSolidCache } from '../../../src/scene/partGeometry.ts';
import { sectionHatches } from '../../../src/scene/sectionHatch.ts';

/** The engine's boxes are sums of inch sizes in mm; a micrometre is far past rounding. */
const TOLERANCE_MM = 1e-6;

describe('the 3D view of the default chest', () => {
  const result = buildPiece(defaultSpec('chest'));

  it('draws every instance of every part the engine places, and nothing else', () => {
    const { meshes } = sceneModel(result, { explode: 0 });
    const instances = result.parts.reduce((n, p) => n + p.quantity, 0);
    expect(meshes).toHaveLength(instances);
    expect(meshes).toHaveLength(result.placements.length);
    for (const part of result.parts) expect(meshes.filter((m) => m.partId === part.id)).toHaveLength(part.quantity);
  });

  it('keeps every assembled part inside the piece\'s overall box', () => {
    const { meshes, bounds } = sceneModel(result, { explode: 0 });
    const max = result.bboxMinMm.map((m, i) => m + result.bboxMm[i]!);
    for (const mesh of meshes) {
      for (let i = 0; i < 3; i++) {
        expect(mesh.worldBox.min[i]!).toBeGreaterThanOrEqual(result.bboxMinMm[i]! - TOLERANCE_MM);
        expect(mesh.worldBox.max[i]!).toBeLessThanOrEqual(max[i]! + TOLERANCE_MM);
      }
    }
    // The parts fill the overall box: its faces are the faces of some parts.
    for (let i = 0; i < 3; i++) {
      expect(Math.abs(bounds.min[i]! - result.bboxMinMm[i]!)).toBeLessThan(TOLERANCE_MM);
      expect(Math.abs(bounds.max[i]! - max[i]!)).toBeLessThan(TOLERANCE_MM);
    }
  });

  it('builds one solid per distinct part, shared by its instances', () => {
    const cache = createPartSolidCache();
    for (const placement of result.placements) cache.get(result.parts.find((p) => p.id === placement.partId)!);
    expect(cache.size).toBeLessThanOrEqual(result.parts.length);
    expect(cache.size).toBeLessThan(result.placements.length);
    cache.dispose();
  });

  it('hatches parts that meet in a joint differently', () => {
    const hatch = sectionHatches(result);
    for (const joint of result.joints) {
      const [a, b] = joint.members.map((m) => m.partId);
      if (a !== b) expect(hatch.get(a!)).not.toBe(hatch.get(b!));
    }
  });
});
