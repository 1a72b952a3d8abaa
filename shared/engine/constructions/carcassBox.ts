/**
 * A carcass box of sheet goods: two sides; a bottom and a top (or front and back stretchers
 * under a separate top) let into the sides in dadoes or rabbets; a back in a rabbet or a groove;
 * and optional vertical dividers let into the bottom and the top. Other constructions hand it
 * the cuts they need in its parts (shelf dadoes, shelf-pin holes) as world features, and each
 * goes to the part whose box holds it.
 */
import { assert } from '../../assert.ts';
import type { JointDraft, PartDraft } from '../assembly.ts';
import { boxBetween, boxContains } from '../geometry/box.ts';
import type { FeatureDraft } from '../geometry/featureDescribe.ts';
import type { AxisMap } from '../geometry/placement.ts';
import type { Box3, Material } from '../types.ts';
import { drawerNamer } from './drawerBox.ts';
import { wallPartNamer } from './naming.ts';

/** How the top and bottom meet the sides. */
export type CarcassJoinery = 'dado' | 'rabbet';
/** How the back is held. */
export type BackFit = 'rabbet' | 'groove';

/** Options for {@link carcassBox}; world coordinates, mm. */
export interface CarcassBoxOptions {
  /** Outer box: sides' outer faces (X), front edges to the back's back face (Y), floor to top of the sides (Z). */
  box: Box3;
  sheet: Material;
  thicknessMm: number;
  joinery: CarcassJoinery;
  /** Depth of every dado and rabbet cut into the sides, and of the back's groove or rabbet. */
  jointDepthMm: number;
  /** Dado joinery: how far the top and bottom stand in from the ends of the sides. */
  dadoEndWallMm: number;
  /** A panel top, or two stretchers under a separate top. */
  top: 'panel' | 'stretchers';
  stretcherWidthMm: number;
  back: { sheet: Material; thicknessMm: number; fit: BackFit; /** Groove fit: wood left behind the groove. */ grooveSetInMm: number };
  /** Centres (world X) of vertical dividers, bottom to top. */
  dividerXs: readonly number[];
  /**
   * Height bands (world Z) where web frames run through from side to side: each divider stops
   * under a band and starts again on top of it, one piece per row.
   */
  dividerBreaksZ?: readonly (readonly [number, number])[];
  /** Cuts other constructions need in the carcass parts, in world coordinates. */
  extraFeatures: readonly FeatureDraft[];
  /** Cuts in the top panel or a stretcher (screw holes and slots for a top), given its world box. */
  topFeatures?: (which: 'top' | 'front' | 'back', world: Box3) => FeatureDraft[];
  /** Frameless: the front edges are banded; the note goes on the parts. */
  edgeBanded: boolean;
  explodeMm: number;
}

/** The carcass parts and the clear space inside them. */
export interface CarcassBox {
  drafts: PartDraft[];
  joints: JointDraft[];
  left: PartDraft;
  right: PartDraft;
  bottom: PartDraft;
  /** The top panel, or the front and back stretchers. */
  tops: PartDraft[];
  back: PartDraft;
  /** Every divider piece: one per divider, or with breaks one per divider and row. */
  dividers: PartDraft[];
  /** Divider `i`'s piece that spans world height `z`. */
  dividerAt: (i: number, z: number) => PartDraft;
  /** Clear inside: sides' inner faces, front edge to the back's front face, bottom's top to the top's underside (mm). */
  inside: Box3;
  /** The part each extra feature went to. */
  ownerOf: (feature: FeatureDraft) => PartDraft;
}

const FLAT: AxisMap = { length: '+X', width: '+Y', thickness: '+Z' };
const bandNote = (lengthMm: number): string => `Edge-band the front edge (${Math.round(lengthMm)} mm) before assembly.`;

/** Builds the carcass. Asserts that every extra feature lies inside one of its parts. */
export function carcassBox(o: CarcassBoxOptions): CarcassBox {
  const [x0, y0, z0] = o.box.min;
  const [x1, y1, z1] = o.box.max;
  const t = o.thicknessMm;
  const d = o.jointDepthMm;
  const bt = o.back.thicknessMm;
  const groove = o.back.fit === 'groove';
  const e = o.joinery === 'dado' ? o.dadoEndWallMm : 0;
  const bottomZ: [number, number] = [z0 + e, z0 + e + t];
  const topZ: [number, number] = [z1 - e - t, z1 - e];
  const inX: [number, number] = [x0 + t, x1 - t];
  // The back's band in Y, and where the horizontal parts stop short of it.
  const backY: [number, number] = groove ? [y1 - o.back.grooveSetInMm - bt, y1 - o.back.grooveSetInMm] : [y1 - bt, y1];
  const panelBackY = groove ? y1 : y1 - bt;
  const backInset = groove ? Math.min(d, t / 2) : 0;
  const explodeOut = (sx: number, sy: number, sz: number) => [sx * o.explodeMm, sy * o.explodeMm, sz * o.explodeMm] as const;
  const banded = (notes: string[], edgeMm: number) => (o.edgeBanded ? [...notes, bandNote(edgeMm)] : notes);

  // Cuts in the sides for the top and bottom, and the back.
  const sideCuts = (inner: number, outerToInner: 1 | -1): FeatureDraft[] => {
    const xa = inner - outerToInner * d;
    const faceDir = outerToInner > 0 ? '+X' : '-X';
    const type = o.joinery;
    const cuts: FeatureDraft[] = [
      // Named by place along the side, so a left and a right side with the same cuts are one part.
      { id: `${type}-bottom`, idTemplate: `${type}-{n}`, type, label: `${type} for the bottom or the top`, faceDir: type === 'rabbet' ? '-Z' : faceDir, removed: [boxBetween([xa, y0, bottomZ[0]], [inner, y1, bottomZ[1]])] },
      { id: `${type}-top`, idTemplate: `${type}-{n}`, type, label: `${type} for the bottom or the top`, faceDir: type === 'rabbet' ? '+Z' : faceDir, removed: [boxBetween([xa, y0, topZ[0]], [inner, y1, topZ[1]])] },
      groove
        ? { id: 'groove-back', type: 'groove', label: 'groove for the back', faceDir, removed: [boxBetween([xa, backY[0], z0], [inner, backY[1], z1])] }
        : { id: 'rabbet-back', type: 'rabbet', label: 'rabbet for the back', faceDir: '+Y', removed: [boxBetween([xa, backY[0], z0], [inner, backY[1], z1])] },
    ];
    return cuts;
  };
  const sideNamer = wallPartNamer('case', 'Case', 'side', 'side');
  const side = (which: 'left' | 'right'): PartDraft => {
    const left = which === 'left';
    const world = left ? boxBetween([x0, y0, z0], [x0 + t, y1, z1]) : boxBetween([x1 - t, y0, z0], [x1, y1, z1]);
    return {
      group: 'case/side', member: which, label: `${which} side`, role: 'case-side', material: o.sheet, grain: 'none',
      size: [z1 - z0, y1 - y0, t],
      axes: left ? { length: '+Z', width: '+Y', thickness: '-X' } : { length: '+Z', width: '-Y', thickness: '+X' },
      world, explodeMm: explodeOut(left ? -1 : 1, 0, 0),
      features: sideCuts(left ? inX[0] : inX[1], left ? 1 : -1), notes: banded([], z1 - z0), name: sideNamer,
    };
  };
  const left = side('left');
  const right = side('right');

  // Horizontal panels run into the sides' cuts at both ends.
  const horizontalCuts = (which: 'bottom' | 'top', zFace: number, faceDir: '+Z' | '-Z', yRange: [number, number]): FeatureDraft[] => {
    const cuts: FeatureDraft[] = [];
    if (groove) {
      const zs: [number, number] = faceDir === '+Z' ? [zFace - backInset, zFace] : [zFace, zFace + backInset];
      if (backY[0] >= yRange[0] && backY[1] <= yRange[1]) {
        cuts.push({ id: 'groove-back', type: 'groove', label: 'groove for the back', faceDir, removed: [boxBetween([inX[0] - d, backY[0], zs[0]], [inX[1] + d, backY[1], zs[1]])] });
      }
    }
    o.dividerXs.forEach((xc, i) => {
      const zs: [number, number] = faceDir === '+Z' ? [zFace - d, zFace] : [zFace, zFace + d];
      cuts.push({
        id: `dado-divider-${i + 1}`, idTemplate: 'dado-divider-{n}', type: 'dado', label: `dado for a drawer divider (${which})`, faceDir,
        removed: [boxBetween([xc - t / 2, yRange[0], zs[0]], [xc + t / 2, Math.min(yRange[1], backY[0]), zs[1]])],
      });
    });
    return cuts;
  };
  const horizontal = (group: string, member: string, label: string, role: 'case-bottom' | 'case-top' | 'stretcher', z: [number, number], yRange: [number, number], features: FeatureDraft[], name: PartDraft['name'], sz: number): PartDraft => {
    const world = boxBetween([inX[0] - d, yRange[0], z[0]], [inX[1] + d, yRange[1], z[1]]);
    const extra = role === 'case-bottom' ? [] : o.topFeatures?.(member as 'top' | 'front' | 'back', world) ?? [];
    return {
      group, member, label, role, material: o.sheet, grain: 'none',
      size: [inX[1] - inX[0] + 2 * d, yRange[1] - yRange[0], t], axes: FLAT,
      world, explodeMm: explodeOut(0, 0, sz), features: [...features, ...extra], notes: member === 'back' ? [] : banded([], inX[1] - inX[0] + 2 * d), name,
    };
  };
  const bottom = horizontal('case/bottom', 'bottom', 'carcass bottom', 'case-bottom', bottomZ, [y0, panelBackY], horizontalCuts('bottom', bottomZ[1], '+Z', [y0, panelBackY]), () => ({ id: 'case-bottom', name: 'Case bottom' }), -0.5);
  let tops: PartDraft[];
  if (o.top === 'panel') {
    tops = [horizontal('case/top', 'top', 'carcass top', 'case-top', topZ, [y0, panelBackY], horizontalCuts('top', topZ[0], '-Z', [y0, panelBackY]), () => ({ id: 'case-top', name: 'Case top' }), 0.5)];
  } else {
    const sw = o.stretcherWidthMm;
    const backStretcherY: [number, number] = groove ? [y1 - sw, y1] : [y1 - bt - sw, y1 - bt];
    const stretcherNamer = wallPartNamer('top', 'Top', 'stretcher', 'stretcher');
    tops = [
      horizontal('case/stretcher', 'front', 'front stretcher', 'stretcher', topZ, [y0, y0 + sw], horizontalCuts('top', topZ[0], '-Z', [y0, y0 + sw]), stretcherNamer, 0.5),
      horizontal('case/stretcher', 'back', 'back stretcher', 'stretcher', topZ, backStretcherY, horizontalCuts('top', topZ[0], '-Z', backStretcherY), stretcherNamer, 0.5),
    ];
  }
  const topUnderside = topZ[0];

  const backZ: [number, number] = groove ? [bottomZ[1] - backInset, topUnderside + backInset] : [z0, z1];
  const back: PartDraft = {
    group: 'case/back', member: 'back', label: 'back', role: 'back', material: o.back.sheet, grain: 'none',
    size: [inX[1] - inX[0] + 2 * d, backZ[1] - backZ[0], bt], axes: { length: '+X', width: '+Z', thickness: '-Y' },
    world: boxBetween([inX[0] - d, backY[0], backZ[0]], [inX[1] + d, backY[1], backZ[1]]),
    explodeMm: explodeOut(0, 1, 0), features: [],
    notes: [groove ? 'Slides into its grooves before the top goes on; no glue, so the case can be squared.' : 'Square the case, then glue and pin the back into its rabbets and to the top and bottom.'],
    name: () => ({ id: 'back', name: 'Back' }),
  };

  const dividerY: [number, number] = [y0, groove ? backY[0] : y1 - bt];
  // Pieces between the breaks, top first: the top one in the dado above, the bottom one in the bottom's dado.
  const breaks = [...(o.dividerBreaksZ ?? [])].sort((a, b) => b[0] - a[0]);
  const spans: [number, number][] = [];
  let upper = topUnderside + d;
  for (const band of breaks) {
    spans.push([band[1], upper]);
    upper = band[0];
  }
  spans.push([bottomZ[1] - d, upper]);
  const dividerPieces = o.dividerXs.map((xc, i): PartDraft[] => spans.map((zs, row): PartDraft => ({
    group: 'case/divider', member: spans.length === 1 ? `divider-${i + 1}` : `row-${row + 1}`, label: `drawer divider ${i + 1}${spans.length === 1 ? '' : `, row ${row + 1}`}`, role: 'divider', material: o.sheet, grain: 'none',
    size: [zs[1] - zs[0], dividerY[1] - dividerY[0], t], axes: { length: '+Z', width: '+Y', thickness: '-X' },
    world: boxBetween([xc - t / 2, dividerY[0], zs[0]], [xc + t / 2, dividerY[1], zs[1]]),
    explodeMm: explodeOut(0, -0.5, 0), features: [], notes: banded([], zs[1] - zs[0]),
    name: spans.length === 1 ? () => ({ id: 'divider', name: 'Drawer divider' }) : drawerNamer('divider', 'Drawer divider'),
  })));
  const dividers = dividerPieces.flat();

  // Extra cuts go to the part that holds them.
  const hosts = [left, right, bottom, ...tops, back, ...dividers];
  const extras = new Map<PartDraft, FeatureDraft[]>();
  const owners = new Map<FeatureDraft, PartDraft>();
  for (const f of o.extraFeatures) {
    const host = hosts.find((h) => f.removed.every((r) => boxContains(h.world, r, 1e-6)));
    assert(host, `feature ${f.id} lies inside a carcass part`);
    extras.set(host, [...(extras.get(host) ?? []), f]);
    owners.set(f, host);
  }
  const withExtras = (p: PartDraft): PartDraft => (extras.has(p) ? Object.assign(p, { features: [...p.features, ...extras.get(p)!] }) : p);
  hosts.forEach(withExtras);

  const joints: JointDraft[] = [];
  const j = o.joinery;
  for (const s of [left, right]) {
    joints.push({ type: j, a: { draft: bottom, featureIds: [] }, b: { draft: s, featureIds: [`${j}-bottom`] }, clearanceMm: 0, glued: true, floating: false, note: `Bottom glued into the side's ${j}; sheet goods do not move, so glue holds.` });
    for (const top of tops) joints.push({ type: j, a: { draft: top, featureIds: [] }, b: { draft: s, featureIds: [`${j}-top`] }, clearanceMm: 0, glued: true, floating: false, note: `Glued into the side's ${j}.` });
    joints.push({ type: groove ? 'back-in-groove' : 'back-in-rabbet', a: { draft: back, featureIds: [] }, b: { draft: s, featureIds: [groove ? 'groove-back' : 'rabbet-back'] }, clearanceMm: 0, glued: !groove, floating: false, note: back.notes[0]! });
  }
  for (const pieces of dividerPieces) {
    joints.push({ type: 'dado', a: { draft: pieces[pieces.length - 1]!, featureIds: [] }, b: { draft: bottom, featureIds: [] }, clearanceMm: 0, glued: true, floating: false, note: 'Divider glued into the bottom\'s dado.' });
    for (const top of tops) joints.push({ type: 'dado', a: { draft: pieces[0]!, featureIds: [] }, b: { draft: top, featureIds: [] }, clearanceMm: 0, glued: true, floating: false, note: 'Divider glued into the dado above.' });
  }

  return {
    drafts: [left, right, bottom, ...tops, back, ...dividers],
    joints, left, right, bottom, tops, back, dividers,
    dividerAt: (i, z) => {
      const piece = dividerPieces[i]?.find((pc) => z >= pc.world.min[2] - 1e-6 && z <= pc.world.max[2] + 1e-6);
      assert(piece, `divider ${i + 1} stands at height ${z}`);
      return piece;
    },
    inside: boxBetween([inX[0], y0, bottomZ[1]], [inX[1], backY[0], topUnderside]),
    ownerOf: (f) => {
      const owner = owners.get(f);
      assert(owner, `feature ${f.id} was given to the carcass`);
      return owner;
    },
  };
}
