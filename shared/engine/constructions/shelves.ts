/**
 * Shelves inside a carcass: fixed shelves let into dadoes in the sides, and adjustable shelves on
 * pins in two lines of holes in each side (front and back), the holes at a set spacing and set
 * back from the front and the back. Either kind may carry a solid edge strip on its front edge,
 * flush with the top and hanging below, which hides the sheet's edge and stiffens the shelf.
 * The cuts go into the sides through the carcass's `extraFeatures`; the joints follow once the
 * sides exist.
 */
import type { JointDraft, PartDraft } from '../assembly.ts';
import { boxBetween } from '../geometry/box.ts';
import type { FeatureDraft } from '../geometry/featureDescribe.ts';
import type { Box3, Material } from '../types.ts';
import { fixedName, plainPart } from './plainPart.ts';

/** The shelf-pin hole lines (mm). */
export interface HoleLine {
  spacingMm: number;
  /** From the carcass's front edge to the front line's centres, and from the back's front face to the back line's. */
  setbackMm: number;
  diameterMm: number;
  depthMm: number;
  /** First row's centre above the bottom, and last row's below the top. */
  endMarginMm: number;
}

/** Options for {@link shelves}; world coordinates, mm. */
export interface ShelvesOptions {
  /** The carcass's clear inside (see `CarcassBox.inside`). */
  inside: Box3;
  /** Front of the shelves (their edge strip's face), world Y. */
  frontYMm: number;
  /** Back of the shelves, world Y. */
  backYMm: number;
  material: Material;
  thicknessMm: number;
  edgeStrip: { material: Material; heightMm: number; thicknessMm: number } | null;
  /** Gap at each end of an adjustable shelf. */
  endClearanceMm: number;
  /** Depth of the fixed shelves' dadoes. */
  dadoDepthMm: number;
  /** Underside heights of fixed shelves, world Z. */
  fixedZ: readonly number[];
  /** Wanted underside heights of adjustable shelves; each moves to the nearest hole row. */
  adjustableZ: readonly number[];
  holes: HoleLine | null;
  explodeMm: number;
}

/** A shelf and what its sag depends on. */
export interface ShelfInfo {
  kind: 'fixed' | 'adjustable';
  shelf: PartDraft;
  strip: PartDraft | null;
  /** Distance between its supports (mm). */
  spanMm: number;
}

/** The shelves, the cuts they need in the sides, and a way to join them once the sides exist. */
export interface Shelves {
  drafts: PartDraft[];
  sideFeatures: FeatureDraft[];
  shelves: ShelfInfo[];
  /** Hole row centres, world Z. */
  holeRowsZ: number[];
  jointsWith: (left: PartDraft, right: PartDraft) => JointDraft[];
}

/** Builds the shelves and their cuts. */
export function shelves(o: ShelvesOptions): Shelves {
  const [xl, yIn0, zb] = o.inside.min;
  const [xr, yIn1, zt] = o.inside.max;
  const t = o.thicknessMm;
  const d = o.dadoDepthMm;
  const st = o.edgeStrip?.thicknessMm ?? 0;
  const sideFeatures: FeatureDraft[] = [];
  const out: ShelfInfo[] = [];
  const drafts: PartDraft[] = [];

  const fixedDadoes = o.fixedZ.map((z) => ({ z0: z, z1: z + t }));
  const holeRowsZ: number[] = [];
  if (o.holes && o.adjustableZ.length > 0) {
    const h = o.holes;
    // Centred on the inside height, so both sides drill alike and a side turned end for end is the same part.
    const rows = Math.floor((zt - zb - 2 * h.endMarginMm) / h.spacingMm + 1e-9) + 1;
    const first = (zb + zt) / 2 - ((rows - 1) * h.spacingMm) / 2;
    for (let k = 0; k < rows; k++) {
      const z = first + k * h.spacingMm;
      const clear = fixedDadoes.every((f) => z + h.diameterMm / 2 <= f.z0 - 1e-9 || z - h.diameterMm / 2 >= f.z1 + 1e-9);
      if (clear) holeRowsZ.push(z);
    }
    const r = h.diameterMm / 2;
    const lines = [yIn0 + h.setbackMm, yIn1 - h.setbackMm];
    for (const [inner, dir] of [[xl, 1], [xr, -1]] as const) {
      let n = 0;
      for (const z of holeRowsZ) {
        for (const y of lines) {
          n += 1;
          sideFeatures.push({
            id: `shelf-pin-${dir > 0 ? 'l' : 'r'}${n}`, idTemplate: 'shelf-pin-{n}', type: 'hole', label: 'shelf-pin hole', faceDir: dir > 0 ? '+X' : '-X', diameterMm: h.diameterMm,
            removed: [boxBetween([inner - dir * h.depthMm, y - r, z - r], [inner, y + r, z + r])],
          });
        }
      }
    }
  }

  const shelf = (kind: 'fixed' | 'adjustable', i: number, z: number): void => {
    const x: [number, number] = kind === 'fixed' ? [xl - d, xr + d] : [xl + o.endClearanceMm, xr - o.endClearanceMm];
    const member = `${kind}-${i + 1}`;
    const panel = plainPart({
      group: `shelf/${kind}`, member, label: `${kind} shelf ${i + 1}`, role: 'shelf', material: o.material, grain: o.material.kind === 'solid' ? 'length' : 'none',
      world: boxBetween([x[0], o.frontYMm + st, z], [x[1], o.backYMm, z + t]), axes: { length: '+X', width: '+Y', thickness: '+Z' },
      explodeMm: [0, -o.explodeMm, 0], name: fixedName(`${kind}-shelf`, kind === 'fixed' ? 'Fixed shelf' : 'Adjustable shelf'),
      notes: kind === 'fixed' ? ['Glued into the side dadoes.'] : ['Rests on four shelf pins.'],
    });
    drafts.push(panel);
    let strip: PartDraft | null = null;
    if (o.edgeStrip) {
      const s = o.edgeStrip;
      strip = plainPart({
        group: `shelf/${kind}-strip`, member, label: `${kind} shelf ${i + 1} edge strip`, role: 'edge-strip', material: s.material, grain: 'length',
        world: boxBetween([Math.max(x[0], xl), o.frontYMm, z + t - s.heightMm], [Math.min(x[1], xr), o.frontYMm + s.thicknessMm, z + t]),
        axes: { length: '+X', width: '+Z', thickness: '-Y' }, explodeMm: [0, -1.5 * o.explodeMm, 0],
        name: fixedName(`${kind}-shelf-edge-strip`, `${kind === 'fixed' ? 'Fixed' : 'Adjustable'} shelf edge strip`),
        notes: ['Glued to the shelf\'s front edge, flush with its top.'],
      });
      drafts.push(strip);
    }
    if (kind === 'fixed') {
      for (const [inner, dir] of [[xl, 1], [xr, -1]] as const) {
        sideFeatures.push({
          id: `dado-shelf-${i + 1}`, type: 'dado', label: 'dado for a fixed shelf', faceDir: dir > 0 ? '+X' : '-X',
          removed: [boxBetween([inner - dir * d, o.frontYMm + st, z], [inner, yIn1, z + t])],
        });
      }
    }
    out.push({ kind, shelf: panel, strip, spanMm: kind === 'fixed' ? xr - xl : x[1] - x[0] });
  };
  o.fixedZ.forEach((z, i) => shelf('fixed', i, z));
  const pinR = (o.holes?.diameterMm ?? 0) / 2;
  o.adjustableZ.forEach((want, i) => {
    // Nearest hole row, the shelf resting on the pins' shanks.
    const row = holeRowsZ.reduce((best, z) => (Math.abs(z + pinR - want) < Math.abs(best + pinR - want) ? z : best), holeRowsZ[0] ?? want);
    shelf('adjustable', i, row + pinR);
  });

  return {
    drafts, sideFeatures, shelves: out, holeRowsZ,
    jointsWith: (left, right) => out.flatMap((s) => {
      const joints: JointDraft[] = [left, right].map((side) => ({
        type: s.kind === 'fixed' ? 'dado' as const : 'shelf-pin' as const,
        a: { draft: s.shelf, featureIds: [] },
        b: { draft: side, featureIds: s.kind === 'fixed' ? [`dado-shelf-${s.shelf.member.split('-')[1]}`] : [] },
        clearanceMm: s.kind === 'fixed' ? 0 : o.endClearanceMm, glued: s.kind === 'fixed', floating: false,
        note: s.kind === 'fixed' ? 'Glued into the dado.' : 'Rests on pins: lift it out to move it.',
      }));
      if (s.strip) joints.push({ type: 'edge-glued', a: { draft: s.strip, featureIds: [] }, b: { draft: s.shelf, featureIds: [] }, clearanceMm: 0, glued: true, floating: false, note: 'Edge strip glued to the shelf.' });
      return joints;
    }),
  };
}
