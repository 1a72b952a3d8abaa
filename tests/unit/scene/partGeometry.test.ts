import { describe, expect, it } from 'vitest';
import { Vector3, type BufferGeometry } from 'three';
import { createPartSolidCache, placementMatrix } from '../../../src/scene/partGeometry.ts';
import { buildPartGeometry, GRAIN_TILE_ALONG_MM, partSolidKey, plainPartSolid } from '../../../src/scene/partSolid.ts';
import type { Box3, Part } from '../../../shared/engine/types.ts';
import { GROOVE_Y, LEG, SPAN, frameSideResult } from './fixtures/frameSide.ts';

/**
 * Vertices are float32: about 7 significant digits, so 6e-5 mm on a part 600 mm long. Volumes
 * summed over the triangles carry the same relative error.
 */
const FLOAT32_MM = 1e-4;
const VOLUME_RELATIVE_TOLERANCE = 1e-6;

const result = frameSideResult();
const partById = (id: string): Part => result.parts.find((p) => p.id === id)!;
const placementOf = (key: string) => result.placements.find((p) => `${p.partId}#${p.instance}` === key)!;

/** Volume enclosed by a closed triangle mesh (divergence theorem), mm³. */
function meshVolume(geometry: BufferGeometry): number {
  const pos = geometry.getAttribute('position');
  const index = geometry.getIndex();
  const count = index ? index.count : pos.count;
  const at = (i: number): Vector3 => new Vector3().fromBufferAttribute(pos, index ? index.getX(i) : i);
  let volume = 0;
  for (let i = 0; i < count; i += 3) volume += at(i).dot(at(i + 1).cross(at(i + 2))) / 6;
  return volume;
}

/**
 * Exact volume left of a part's box after its features' removed boxes, worked out independently
 * of the mesh: cut the box into cells on every box face coordinate and count the cells no
 * removed box covers.
 */
function expectedVolume(part: Part): number {
  const size = [part.lengthMm, part.widthMm, part.thicknessMm];
  const removed: Box3[] = part.features.flatMap((f) => f.removed);
  const cuts = [0, 1, 2].map((a) => [...new Set([0, size[a]!, ...removed.flatMap((b) => [b.min[a]!, b.max[a]!])])].filter((c) => c >= 0 && c <= size[a]!).sort((p, q) => p - q));
  let volume = 0;
  for (let i = 0; i + 1 < cuts[0]!.length; i++) for (let j = 0; j + 1 < cuts[1]!.length; j++) for (let k = 0; k + 1 < cuts[2]!.length; k++) {
    const lo = [cuts[0]![i]!, cuts[1]![j]!, cuts[2]![k]!];
    const hi = [cuts[0]![i + 1]!, cuts[1]![j + 1]!, cuts[2]![k + 1]!];
    const centre = lo.map((l, a) => (l + hi[a]!) / 2);
    const gone = removed.some((b) => centre.every((c, a) => c > b.min[a]! && c < b.max[a]!));
    if (!gone) volume += (hi[0]! - lo[0]!) * (hi[1]! - lo[1]!) * (hi[2]! - lo[2]!);
  }
  return volume;
}

describe('placementMatrix', () => {
  it('carries the left leg\'s groove to the leg\'s inner face where it was drawn', () => {
    const leg = partById('leg');
    const groove = leg.features[0]!.removed[0]!;
    const m = placementMatrix(leg, placementOf('leg#0'));
    const a = new Vector3(...groove.min).applyMatrix4(m);
    const b = new Vector3(...groove.max).applyMatrix4(m);
    expect(Math.max(a.x, b.x)).toBeCloseTo(LEG, 6);
    expect(Math.min(a.y, b.y)).toBeCloseTo(GROOVE_Y[0], 6);
  });

  it('turns the right leg so the same groove faces the left, into the span', () => {
    const leg = partById('leg');
    const groove = leg.features[0]!.removed[0]!;
    const m = placementMatrix(leg, placementOf('leg#1'));
    const a = new Vector3(...groove.min).applyMatrix4(m);
    const b = new Vector3(...groove.max).applyMatrix4(m);
    // The groove opens on the right leg's inner face at x = LEG + SPAN and runs 1/2 in into it.
    expect(Math.min(a.x, b.x)).toBeCloseTo(LEG + SPAN, 6);
    expect(Math.max(a.x, b.x)).toBeCloseTo(LEG + SPAN + 12.7, 6);
    expect(Math.min(a.y, b.y)).toBeCloseTo(GROOVE_Y[0], 6);
  });

  it('is a rotation, never a mirror', () => {
    for (const placement of result.placements) {
      expect(placementMatrix(partById(placement.partId), placement).determinant()).toBeCloseTo(1, 12);
    }
  });
});

describe('buildPartGeometry', () => {
  it('removes exactly the grooves, cheeks, shoulders and rabbets from each part', () => {
    for (const part of result.parts) {
      const full = part.lengthMm * part.widthMm * part.thicknessMm;
      const expected = expectedVolume(part);
      expect(expected).toBeLessThan(full);
      expect(Math.abs(meshVolume(buildPartGeometry(part)) - expected)).toBeLessThan(full * VOLUME_RELATIVE_TOLERANCE);
    }
  });

  it('keeps the rail\'s tongues: the solid still reaches both ends of its finished length', () => {
    const rail = partById('bottom-rail');
    const geometry = buildPartGeometry(rail);
    geometry.computeBoundingBox();
    expect(Math.abs(geometry.boundingBox!.min.x)).toBeLessThan(FLOAT32_MM);
    expect(Math.abs(geometry.boundingBox!.max.x - rail.lengthMm)).toBeLessThan(FLOAT32_MM);
  });

  it('adds back a tongue that a cut was drawn over', () => {
    const plain: Part = { ...partById('bottom-rail'), features: [] };
    const end = { min: [0, 0, 0], max: [11, plain.widthMm, plain.thicknessMm] } as const;
    const tongue = { min: [0, 20, 6], max: [11, 60, 12] } as const;
    const drawnOver: Part = {
      ...plain,
      features: [{ id: 't', type: 'tongue', face: 'end-a', label: 't', removed: [end], tongue, thicknessMm: 6, lengthMm: 11, widthMm: 40 }],
    };
    const expected = plain.lengthMm * plain.widthMm * plain.thicknessMm - 11 * plain.widthMm * plain.thicknessMm + 11 * 40 * 6;
    expect(Math.abs(meshVolume(buildPartGeometry(drawnOver)) - expected)).toBeLessThan(expected * VOLUME_RELATIVE_TOLERANCE);
  });

  it('lays the grain texture along the length on the broad faces of a leg', () => {
    const geometry = buildPartGeometry(partById('leg'));
    const pos = geometry.getAttribute('position');
    const normal = geometry.getAttribute('normal');
    const uv = geometry.getAttribute('uv');
    let checked = 0;
    for (let v = 0; v < pos.count; v++) {
      if (Math.abs(normal.getZ(v)) < 0.99) continue;
      expect(Math.abs(uv.getX(v) - pos.getX(v) / GRAIN_TILE_ALONG_MM)).toBeLessThan(FLOAT32_MM / GRAIN_TILE_ALONG_MM);
      checked++;
    }
    expect(checked).toBeGreaterThan(0);
  });
});

describe('createPartSolidCache', () => {
  it('builds one solid per part and gives it to every instance', () => {
    const cache = createPartSolidCache();
    const leg = partById('leg');
    expect(cache.get(leg)).toBe(cache.get(leg));
    expect(cache.size).toBe(1);
    cache.dispose();
  });

  it('reuses a solid for an equal part from a newer result, and frees solids no part uses', () => {
    const cache = createPartSolidCache();
    for (const part of result.parts) cache.get(part);
    const newer = frameSideResult();
    expect(cache.get(newer.parts[0]!)).toBe(cache.get(result.parts[0]!));
    expect(cache.size).toBe(result.parts.length);

    const longerRail: Part = { ...partById('top-rail'), lengthMm: partById('top-rail').lengthMm + 10 };
    expect(partSolidKey(longerRail)).not.toBe(partSolidKey(partById('top-rail')));
    const kept = [...newer.parts.filter((p) => p.id !== 'top-rail'), longerRail];
    kept.forEach((p) => cache.get(p));
    expect(cache.retainOnly(kept)).toBe(1);
    expect(cache.size).toBe(result.parts.length);
    cache.dispose();
    expect(cache.size).toBe(0);
  });

  it('draws a plain box at once and builds the cut solid in steps, each call giving up when time runs out', () => {
    const cache = createPartSolidCache();
    const leg = partById('leg');
    expect(cache.peek(leg)).toBeNull();
    const box = cache.box(leg);
    box.geometry.computeBoundingBox();
    const size = box.geometry.boundingBox!.getSize(new Vector3());
    expect(Math.abs(size.x - leg.lengthMm)).toBeLessThan(FLOAT32_MM);
    expect(Math.abs(size.y - leg.widthMm)).toBeLessThan(FLOAT32_MM);
    expect(Math.abs(meshVolume(box.geometry) - leg.lengthMm * leg.widthMm * leg.thicknessMm)).toBeLessThan(leg.lengthMm * leg.widthMm * leg.thicknessMm * VOLUME_RELATIVE_TOLERANCE);

    // With no time at all, each call still takes one step: a part with cuts needs several calls.
    let calls = 0;
    while (cache.buildPending([leg], () => false) > 0) calls++;
    expect(calls).toBeGreaterThan(0);
    const solid = cache.peek(leg);
    expect(solid).not.toBeNull();
    expect(Math.abs(meshVolume(solid!.geometry) - expectedVolume(leg))).toBeLessThan(leg.lengthMm * leg.widthMm * leg.thicknessMm * VOLUME_RELATIVE_TOLERANCE);
    expect(cache.get(leg)).toBe(solid);
    cache.dispose();
  });

  it('builds every waiting part in one call when time allows, and counts none waiting after', () => {
    const cache = createPartSolidCache();
    expect(cache.pendingCount(result.parts)).toBe(result.parts.length);
    expect(cache.buildPending(result.parts, () => true)).toBe(0);
    expect(cache.pendingCount(result.parts)).toBe(0);
    expect(cache.size).toBe(result.parts.length);
    cache.dispose();
  });

  it('gives the plain box the grain coordinates the cut solid has', () => {
    const rail = partById('top-rail');
    const plain = plainPartSolid(rail);
    expect(plain.geometry.getAttribute('uv')).toBeDefined();
    plain.geometry.dispose();
    plain.edges.dispose();
  });
});
