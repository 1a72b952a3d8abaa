/**
 * A drawer box: two sides, a front and a back joined to the sides, and a sheet bottom in a
 * groove in the sides and the front, slid in under the back and screwed up into it. The box is
 * hidden behind an applied drawer front (see the piece builders).
 *
 * Joinery: `rabbet-and-dado` rabbets the ends of the front and back to leave a tongue half their
 * thickness, which goes into a dado half the side's thickness deep, set in from the side's end by
 * half the front's thickness; `rabbet` sets the front and back into rabbets at the sides' ends,
 * glued and pinned. Proportions are common practice, no published source.
 */
import type { JointDraft, PartDraft, PartNamer } from '../assembly.ts';
import { boxBetween } from '../geometry/box.ts';
import type { FeatureDraft } from '../geometry/featureDescribe.ts';
import type { Box3, GlueUpPlan, Material } from '../types.ts';
import { plainPart } from './plainPart.ts';

/** How the box's corners are joined. */
export type DrawerJoinery = 'rabbet-and-dado' | 'rabbet';

/** Options for {@link drawerBox}; world coordinates, mm. */
export interface DrawerBoxOptions {
  /** The box's outer box: X across, Y from its front face back, Z up. */
  box: Box3;
  /** The row the drawer sits in (1 = top), for names. */
  row: number;
  /** A label for the instance, e.g. `row 2, left`. */
  where: string;
  stock: Material;
  sideThicknessMm: number;
  endThicknessMm: number;
  joinery: DrawerJoinery;
  bottom: { sheet: Material; thicknessMm: number };
  bottomGrooveDepthMm: number;
  /** From the sides' lower edge to the underside of the bottom. */
  bottomSetUpMm: number;
  /** Gap between the bottom's edges and the groove bottoms. */
  bottomClearanceMm: number;
  /** The glue-up a solid part of this finished width (mm) needs, if the boards are narrower. */
  glueUpFor?: (widthMm: number) => GlueUpPlan | undefined;
  explodeMm: number;
}

/** The box's parts and joints. */
export interface DrawerBox {
  drafts: PartDraft[];
  joints: JointDraft[];
  sides: PartDraft[];
  front: PartDraft;
  back: PartDraft;
  bottom: PartDraft;
}

/** Names parts by the rows they serve: one row → `row-2-drawer-side`, several → `drawer-side`. */
export function drawerNamer(roleId: string, roleName: string): PartNamer {
  return (members) => {
    const rows = [...new Set(members)];
    if (rows.length === 1) return { id: `${rows[0]}-${roleId}`, name: `${roleName}, ${rows[0]!.replace('-', ' ')}` };
    return { id: roleId, name: roleName };
  };
}

/** Builds one drawer box. */
export function drawerBox(o: DrawerBoxOptions): DrawerBox {
  const [bx0, by0, bz0] = o.box.min;
  const [bx1, by1, bz1] = o.box.max;
  const st = o.sideThicknessMm;
  const et = o.endThicknessMm;
  const dd = st / 2;
  const rd = o.joinery === 'rabbet-and-dado';
  const tt = rd ? et / 2 : et;
  const e = rd ? et / 2 : 0;
  const gd = o.bottomGrooveDepthMm;
  const bt = o.bottom.thicknessMm;
  const gz: [number, number] = [bz0 + o.bottomSetUpMm, bz0 + o.bottomSetUpMm + bt];
  const member = `row-${o.row}`;
  const front: [number, number] = [by0 + e, by0 + e + et];
  const back: [number, number] = [by1 - e - et, by1 - e];
  const ex = o.explodeMm;

  // Cuts in a side whose inner face is at `inner`; `dir` points into the box.
  const sideCuts = (inner: number, dir: 1 | -1): FeatureDraft[] => {
    const xa = inner - dir * dd;
    const faceDir = dir > 0 ? '+X' : '-X';
    const housing = (end: 'front' | 'back', y: [number, number]): FeatureDraft => ({
      id: `${rd ? 'dado' : 'rabbet'}-${end}`, idTemplate: `${rd ? 'dado' : 'rabbet'}-{n}`, type: rd ? 'dado' : 'rabbet', label: `${rd ? 'dado' : 'rabbet'} for the ${end}`,
      faceDir: rd ? faceDir : end === 'front' ? '-Y' : '+Y', removed: [boxBetween([xa, y[0], bz0], [inner, y[1], bz1])],
    });
    return [
      housing('front', rd ? [front[0], front[0] + tt] : front),
      housing('back', rd ? [back[1] - tt, back[1]] : back),
      { id: 'groove-bottom', type: 'groove', label: 'groove for the bottom', faceDir, removed: [boxBetween([inner - dir * gd, by0, gz[0]], [inner, by1, gz[1]])] },
    ];
  };
  const glued = (widthMm: number) => {
    const plan = o.glueUpFor?.(widthMm);
    return plan ? { glueUp: plan } : {};
  };
  const sideNamer = drawerNamer('drawer-side', 'Drawer side');
  const sides = (['left', 'right'] as const).map((which) => {
    const left = which === 'left';
    return plainPart({
      group: 'drawer/side', member, label: `drawer side, ${o.where}, ${which}`, role: 'drawer-side', material: o.stock, grain: 'length',
      world: left ? boxBetween([bx0, by0, bz0], [bx0 + st, by1, bz1]) : boxBetween([bx1 - st, by0, bz0], [bx1, by1, bz1]),
      axes: left ? { length: '+Y', width: '+Z', thickness: '+X' } : { length: '-Y', width: '+Z', thickness: '-X' },
      explodeMm: [left ? -ex : ex, -ex, 0], features: sideCuts(left ? bx0 + st : bx1 - st, left ? 1 : -1), name: sideNamer, ...glued(bz1 - bz0),
    });
  });

  // Front and back: a tongue (rabbet-and-dado) or plain ends (rabbet) at both ends.
  const endCuts = (y: [number, number], outward: '-Y' | '+Y', withGroove: boolean, z0: number): FeatureDraft[] => {
    const cuts: FeatureDraft[] = [];
    if (rd) {
      const tongueY: [number, number] = outward === '-Y' ? [y[0], y[0] + tt] : [y[1] - tt, y[1]];
      const cheekY: [number, number] = outward === '-Y' ? [y[0] + tt, y[1]] : [y[0], y[1] - tt];
      for (const [end, xs, dir] of [['left', [bx0 + st - dd, bx0 + st], '-X'], ['right', [bx1 - st, bx1 - st + dd], '+X']] as const) {
        cuts.push({
          id: `tongue-${end}`, idTemplate: 'tongue-{face}', type: 'tongue', label: 'tongue into the side\'s dado', faceDir: dir,
          removed: [boxBetween([xs[0], cheekY[0], z0], [xs[1], cheekY[1], bz1])],
          tongue: boxBetween([xs[0], tongueY[0], z0], [xs[1], tongueY[1], bz1]),
        });
      }
    }
    if (withGroove) {
      const inner = outward === '-Y' ? y[1] : y[0];
      const gy: [number, number] = outward === '-Y' ? [inner - gd, inner] : [inner, inner + gd];
      cuts.push({ id: 'groove-bottom', type: 'groove', label: 'groove for the bottom', faceDir: outward === '-Y' ? '+Y' : '-Y', removed: [boxBetween([bx0 + st - dd, gy[0], gz[0]], [bx1 - st + dd, gy[1], gz[1]])] });
    }
    return cuts;
  };
  const frontPart = plainPart({
    group: 'drawer/front', member, label: `drawer box front, ${o.where}`, role: 'drawer-end', material: o.stock, grain: 'length',
    world: boxBetween([bx0 + st - dd, front[0], bz0], [bx1 - st + dd, front[1], bz1]), axes: { length: '+X', width: '+Z', thickness: '-Y' },
    explodeMm: [0, -2 * ex, 0], features: endCuts(front, '-Y', true, bz0), name: drawerNamer('drawer-box-front', 'Drawer box front'), ...glued(bz1 - bz0),
  });
  const backPart = plainPart({
    group: 'drawer/back', member, label: `drawer back, ${o.where}`, role: 'drawer-end', material: o.stock, grain: 'length',
    world: boxBetween([bx0 + st - dd, back[0], gz[1]], [bx1 - st + dd, back[1], bz1]), axes: { length: '-X', width: '+Z', thickness: '+Y' },
    explodeMm: [0, ex, 0], features: endCuts(back, '+Y', false, gz[1]), notes: ['Sits on the bottom; screw the bottom up into it.'], name: drawerNamer('drawer-back', 'Drawer back'), ...glued(bz1 - gz[1]),
  });
  const c = o.bottomClearanceMm;
  const bottomPart = plainPart({
    group: 'drawer/bottom', member, label: `drawer bottom, ${o.where}`, role: 'drawer-bottom', material: o.bottom.sheet, grain: 'none',
    world: boxBetween([bx0 + st - gd + c, front[1] - gd + c, gz[0]], [bx1 - st + gd - c, back[1], gz[1]]), axes: { length: '+X', width: '+Y', thickness: '+Z' },
    explodeMm: [0, 0, -ex], notes: ['Slides in from the back; no glue.'], name: drawerNamer('drawer-bottom', 'Drawer bottom'),
  });

  const joints: JointDraft[] = [];
  for (const side of sides) {
    for (const [part, end] of [[frontPart, 'front'], [backPart, 'back']] as const) {
      joints.push({
        type: rd ? 'tongue-and-dado' : 'rabbet', a: { draft: part, featureIds: rd ? [side === sides[0] ? 'tongue-left' : 'tongue-right'] : [] },
        b: { draft: side, featureIds: [`${rd ? 'dado' : 'rabbet'}-${end}`] }, clearanceMm: 0, glued: true, floating: false,
        note: rd ? 'Tongue glued into the dado; the side\'s end wall covers it.' : 'Glued and pinned into the rabbet.',
      });
    }
    joints.push({ type: 'bottom-in-groove', a: { draft: bottomPart, featureIds: [] }, b: { draft: side, featureIds: ['groove-bottom'] }, clearanceMm: c, glued: false, floating: false, note: 'Bottom slides in the groove; not glued.' });
  }
  joints.push({ type: 'bottom-in-groove', a: { draft: bottomPart, featureIds: [] }, b: { draft: frontPart, featureIds: ['groove-bottom'] }, clearanceMm: c, glued: false, floating: false, note: 'Bottom slides into the front\'s groove; not glued.' });
  joints.push({ type: 'butt-screwed', a: { draft: bottomPart, featureIds: [] }, b: { draft: backPart, featureIds: [] }, clearanceMm: 0, glued: false, floating: false, note: 'Screwed up into the back\'s lower edge.' });
  return { drafts: [...sides, frontPart, backPart, bottomPart], joints, sides, front: frontPart, back: backPart, bottom: bottomPart };
}
