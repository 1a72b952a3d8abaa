/**
 * Frame-and-panel face between two posts (corner legs, or the stiles of a carcass side): a top
 * and a bottom rail with stub tenons into grooves in the posts, optional centre stiles with stub
 * tenons into the rail grooves, and panels that float in the grooves. Drawn in wall coordinates
 * (see `WallFrame`): u from the left post's inner face, v up from the floor, w outward from the
 * case's outer face (so the face's parts sit at negative w).
 */
import type { JointDraft, PartDraft } from '../assembly.ts';
import type { FeatureDraft } from '../geometry/featureDescribe.ts';
import { axisVector, type AxisMap } from '../geometry/placement.ts';
import { wallBoxBetweenToWorld, wallDirToWorld, type WallFrame } from '../geometry/wallFrame.ts';
import type { Box3, Material, Vec3 } from '../types.ts';
import { wallPartNamer } from './naming.ts';

/** Panel of a frame-and-panel face and the gaps it needs at its edges (mm). */
export interface FacePanelSpec {
  material: Material;
  thicknessMm: number;
  /** Grain of a solid panel as it stands in the face; `none` for sheet goods. */
  grain: 'horizontal' | 'vertical' | 'none';
  /** Gap between a panel edge and its groove bottom where the panel moves (across its grain). */
  gapAcrossGrainMm: number;
  /** Gap where it does not (along the grain, or every edge of a sheet panel). */
  gapAlongGrainMm: number;
}

/** Options for {@link frameAndPanelFace}. All lengths in mm. */
export interface FrameAndPanelFaceOptions {
  /** This wall's member name, e.g. `front`, `left`. */
  wall: string;
  /** Group the wall's parts may merge in, e.g. `front-back` / `Front/back`. */
  groupId: string;
  groupName: string;
  frame: WallFrame;
  /** Distance between the two posts' inner faces. */
  spanMm: number;
  stock: Material;
  stockThicknessMm: number;
  /** How far the rails' outer face sits inside the case's outer face. */
  railInsetMm: number;
  bottomRail: { bottomMm: number; widthMm: number };
  topRail: { topMm: number; widthMm: number };
  stileCount: number;
  stileWidthMm: number;
  grooveWidthMm: number;
  postGrooveDepthMm: number;
  frameGrooveDepthMm: number;
  railTongueLengthMm: number;
  tongueClearanceMm: number;
  /** How far inside each rail's outer edge the post groove stops. */
  postGrooveStopMm: number;
  panel: FacePanelSpec;
  /** Exploded-view distance: rails and stiles move out this far, panels twice as far. */
  explodeMm: number;
  /** Extra cuts in the top rail (finger notch, hinge recesses), given its world box. */
  topRailFeatures?: (worldBox: Box3) => FeatureDraft[];
}

/** The groove a face needs in one of its posts, in world coordinates. */
export interface PostGroove {
  end: 'left' | 'right';
  box: Box3;
  faceDir: ReturnType<typeof wallDirToWorld>;
  widthMm: number;
  depthMm: number;
}

/** A joint between a part of the face and a post, to be completed when the posts exist. */
export interface PostContact {
  end: 'left' | 'right';
  type: 'stub-tenon' | 'panel-in-groove';
  draft: PartDraft;
  featureIds: readonly string[];
  clearanceMm: number;
  glued: boolean;
  floating: boolean;
  note: string;
}

/** Everything one face contributes. */
export interface FrameAndPanelFace {
  drafts: PartDraft[];
  joints: JointDraft[];
  postGrooves: PostGroove[];
  postContacts: PostContact[];
  /** World box of each rail, for the cuts and parts a piece hangs on them. */
  topRail: PartDraft;
  bottomRail: PartDraft;
  panels: PartDraft[];
}

type WallDir = '+u' | '-u' | '+v' | '-v' | '+w' | '-w';

/** A stop shorter than a nanometre is no stop: the groove runs out and the tongue has no haunch. */
const MIN_CUT_MM = 1e-6;

/** Builds the rails, stiles and panels of one frame-and-panel face and the grooves its posts need. */
export function frameAndPanelFace(o: FrameAndPanelFaceOptions): FrameAndPanelFace {
  const f = o.frame;
  // Boxes are drawn in wall coordinates, between two corners in any order, and kept in world ones.
  const worldBox = (u0: number, u1: number, v0: number, v1: number, w0: number, w1: number): Box3 => wallBoxBetweenToWorld(f, u0, u1, v0, v1, w0, w1);
  const dir = (d: WallDir) => wallDirToWorld(f, d);
  // Rails and panels lie along u, up v, out w: a proper rotation with length → u.
  const railAxes: AxisMap = { length: f.u, width: '+Z', thickness: f.w };
  // Stiles stand up: length → v, width → −u keeps the rotation proper.
  const stileAxes: AxisMap = { length: '+Z', width: dir('-u'), thickness: f.w };
  const out = axisVector(f.w);
  const explode = (k: number): Vec3 => [out[0] * o.explodeMm * k, out[1] * o.explodeMm * k, out[2] * o.explodeMm * k];

  const span = o.spanMm;
  const T = o.stockThicknessMm;
  const gw = o.grooveWidthMm;
  const fgd = o.frameGrooveDepthMm;
  const tl = o.railTongueLengthMm;
  const stop = o.postGrooveStopMm < MIN_CUT_MM ? 0 : o.postGrooveStopMm;
  const wOut = -o.railInsetMm;
  const wIn = wOut - T;
  const wc = (wIn + wOut) / 2;
  const bandLo = wc - gw / 2;
  const bandHi = wc + gw / 2;
  const zb0 = o.bottomRail.bottomMm;
  const pz0 = zb0 + o.bottomRail.widthMm;
  const zt1 = o.topRail.topMm;
  const pz1 = zt1 - o.topRail.widthMm;
  const namer = (roleId: string, roleName: string) => wallPartNamer(o.groupId, o.groupName, roleId, roleName);

  const drafts: PartDraft[] = [];
  const joints: JointDraft[] = [];
  const postContacts: PostContact[] = [];

  // Rails: stub tenons at both ends, haunched at the outer edge so the post groove can stop.
  const rail = (which: 'top' | 'bottom'): PartDraft => {
    const v0 = which === 'top' ? pz1 : zb0;
    const v1 = which === 'top' ? zt1 : pz0;
    const grooveV: [number, number] = which === 'top' ? [v0, v0 + fgd] : [v1 - fgd, v1];
    const tongueV: [number, number] = which === 'top' ? [v0 + fgd, v1 - stop] : [v0 + stop, v1 - fgd];
    const haunchV: [number, number] = which === 'top' ? [v1 - stop, v1] : [v0, v0 + stop];
    const tongue = (end: 'a' | 'b'): FeatureDraft => {
      const [u0, u1] = end === 'a' ? [-tl, 0] : [span, span + tl];
      const removed = [worldBox(u0, u1, v0, v1, wIn, bandLo), worldBox(u0, u1, v0, v1, bandHi, wOut)];
      if (stop > 0) removed.push(worldBox(u0, u1, haunchV[0], haunchV[1], bandLo, bandHi));
      return {
        id: `tongue-${end === 'a' ? 'left' : 'right'}`, idTemplate: 'tongue-{face}', type: 'tongue', label: 'stub tenon into the leg groove',
        faceDir: dir(end === 'a' ? '-u' : '+u'), removed,
        tongue: worldBox(u0, u1, tongueV[0], tongueV[1], bandLo, bandHi),
      };
    };
    const groove: FeatureDraft = {
      id: 'groove-panel', type: 'groove', label: 'groove for the panels',
      faceDir: dir(which === 'top' ? '-v' : '+v'), removed: [worldBox(-tl, span + tl, grooveV[0], grooveV[1], bandLo, bandHi)],
    };
    const world = worldBox(-tl, span + tl, v0, v1, wIn, wOut);
    const features = [tongue('a'), tongue('b'), groove, ...(which === 'top' && o.topRailFeatures ? o.topRailFeatures(world) : [])];
    const draft: PartDraft = {
      group: `${o.groupId}/${which}-rail`, member: o.wall, label: `${o.wall} ${which} rail`,
      role: 'rail', material: o.stock, grain: 'length',
      size: [span + 2 * tl, v1 - v0, T], axes: railAxes, world, explodeMm: explode(1),
      features, notes: [], name: namer(`${which}-rail`, `${which} rail`),
    };
    drafts.push(draft);
    for (const end of ['left', 'right'] as const) {
      postContacts.push({
        end, type: 'stub-tenon', draft, featureIds: [`tongue-${end}`], clearanceMm: o.postGrooveDepthMm - tl,
        glued: true, floating: false, note: 'Stub tenon glued into the post groove; grain runs the same way in both, so glue holds.',
      });
    }
    return draft;
  };
  const bottomRail = rail('bottom');
  const topRail = rail('top');

  // Centre stiles, evenly spaced; each leaves equal bays for the panels.
  const n = o.stileCount;
  const bay = (span - n * o.stileWidthMm) / (n + 1);
  const c = o.tongueClearanceMm;
  const stileStarts = Array.from({ length: n }, (_, i) => bay * (i + 1) + o.stileWidthMm * i);
  const stiles = stileStarts.map((us, i) => {
    const ue = us + o.stileWidthMm;
    const s0 = pz0 - fgd + c;
    const s1 = pz1 + fgd - c;
    const tongue = (end: 'bottom' | 'top'): FeatureDraft => {
      const [v0, v1] = end === 'bottom' ? [s0, pz0] : [pz1, s1];
      return {
        id: `tongue-${end}`, idTemplate: 'tongue-{face}', type: 'tongue', label: 'stub tenon into a rail groove',
        faceDir: dir(end === 'bottom' ? '-v' : '+v'),
        removed: [worldBox(us, ue, v0, v1, wIn, bandLo), worldBox(us, ue, v0, v1, bandHi, wOut)],
        tongue: worldBox(us + fgd, ue - fgd, v0, v1, bandLo, bandHi),
      };
    };
    const grooves: FeatureDraft[] = [
      { id: 'groove-left', idTemplate: 'groove-{face}', type: 'groove', label: 'groove for a panel', faceDir: dir('-u'), removed: [worldBox(us, us + fgd, s0, s1, bandLo, bandHi)] },
      { id: 'groove-right', idTemplate: 'groove-{face}', type: 'groove', label: 'groove for a panel', faceDir: dir('+u'), removed: [worldBox(ue - fgd, ue, s0, s1, bandLo, bandHi)] },
    ];
    const draft: PartDraft = {
      group: `${o.groupId}/stile`, member: o.wall, label: `${o.wall} centre stile ${i + 1}`,
      role: 'stile', material: o.stock, grain: 'length',
      size: [s1 - s0, o.stileWidthMm, T], axes: stileAxes, world: worldBox(us, ue, s0, s1, wIn, wOut), explodeMm: explode(1),
      features: [tongue('bottom'), tongue('top'), ...grooves], notes: [], name: namer('stile', 'centre stile'),
    };
    drafts.push(draft);
    for (const [railDraft, end] of [[bottomRail, 'bottom'], [topRail, 'top']] as const) {
      joints.push({
        type: 'stub-tenon', a: { draft, featureIds: [`tongue-${end}`] }, b: { draft: railDraft, featureIds: ['groove-panel'] },
        clearanceMm: c, glued: true, floating: false, note: 'Stub tenon glued into the rail groove.',
      });
    }
    return draft;
  });

  // Panels: tongues into every groove around the bay, gaps where they move, rabbeted from the
  // inside when thicker than the groove so the outer face lines up with the groove's outer wall.
  const p = o.panel;
  const across = p.gapAcrossGrainMm;
  const along = p.gapAlongGrainMm;
  // A panel moves across its grain: up and down when the grain is horizontal, sideways when
  // vertical; a sheet panel gets its fit gap on every edge.
  const gapU = p.grain === 'horizontal' ? along : across;
  const gapV = p.grain === 'vertical' ? along : across;
  const tongueT = Math.min(p.thicknessMm, gw);
  const pwIn = bandHi - p.thicknessMm;
  const panels = Array.from({ length: n + 1 }, (_, j) => {
    const b0 = j === 0 ? 0 : stileStarts[j - 1]! + o.stileWidthMm;
    const b1 = j === n ? span : stileStarts[j]!;
    const dL = j === 0 ? o.postGrooveDepthMm : fgd;
    const dR = j === n ? o.postGrooveDepthMm : fgd;
    const u0 = b0 - dL + gapU;
    const u1 = b1 + dR - gapU;
    const v0 = pz0 - fgd + gapV;
    const v1 = pz1 + fgd - gapV;
    const tongueLo = bandHi - tongueT;
    // Rabbet and tongue of each edge, world boxes (mm).
    const edges: { id: string; side: WallDir; label: string; rabbet: Box3; tongue: Box3 }[] = [
      { id: 'left', side: '-u', label: 'left edge', rabbet: worldBox(u0, u0 + dL, v0, v1, pwIn, tongueLo), tongue: worldBox(u0, b0, pz0, pz1, tongueLo, bandHi) },
      { id: 'right', side: '+u', label: 'right edge', rabbet: worldBox(u1 - dR, u1, v0, v1, pwIn, tongueLo), tongue: worldBox(b1, u1, pz0, pz1, tongueLo, bandHi) },
      { id: 'bottom', side: '-v', label: 'bottom edge', rabbet: worldBox(u0, u1, v0, v0 + fgd, pwIn, tongueLo), tongue: worldBox(b0, b1, v0, pz0, tongueLo, bandHi) },
      { id: 'top', side: '+v', label: 'top edge', rabbet: worldBox(u0, u1, v1 - fgd, v1, pwIn, tongueLo), tongue: worldBox(b0, b1, pz1, v1, tongueLo, bandHi) },
    ];
    const rabbeted = p.thicknessMm > gw + 1e-9;
    const features: FeatureDraft[] = edges.flatMap((e) => {
      const tongue: FeatureDraft = {
        id: `tongue-${e.id}`, idTemplate: 'tongue-{face}', type: 'tongue', label: 'tongue into a groove', faceDir: dir(e.side),
        removed: rabbeted ? [e.rabbet] : [], tongue: e.tongue,
      };
      if (!rabbeted) return [tongue];
      return [{ id: `rabbet-${e.id}`, idTemplate: 'rabbet-{face}', type: 'rabbet', label: 'rabbet from the inside face, leaving the tongue', faceDir: dir(e.side), removed: [e.rabbet] }, { ...tongue, removed: [] }];
    });
    const horizontal = p.grain !== 'vertical';
    const world = worldBox(u0, u1, v0, v1, pwIn, bandHi);
    const draft: PartDraft = {
      group: `${o.groupId}/panel`, member: o.wall, label: `${o.wall} panel ${j + 1}`,
      role: 'panel', material: p.material, grain: p.grain === 'none' ? 'none' : 'length',
      size: horizontal ? [u1 - u0, v1 - v0, p.thicknessMm] : [v1 - v0, u1 - u0, p.thicknessMm],
      axes: horizontal ? railAxes : stileAxes, world, explodeMm: explode(2),
      features, notes: ['Floats in its grooves: no glue.'], name: namer('panel', 'panel'),
    };
    drafts.push(draft);
    const floatNote = p.grain === 'none' ? 'Sheet panel: a fit clearance only, moves negligibly; not glued.' : 'Solid panel floats: room to swell and shrink across its grain; never glued.';
    for (const [side, clearance] of [['bottom', gapV], ['top', gapV]] as const) {
      joints.push({
        type: 'panel-in-groove', a: { draft, featureIds: [`tongue-${side}`] }, b: { draft: side === 'bottom' ? bottomRail : topRail, featureIds: ['groove-panel'] },
        clearanceMm: clearance, glued: false, floating: true, note: floatNote,
      });
    }
    if (j > 0) joints.push({ type: 'panel-in-groove', a: { draft, featureIds: ['tongue-left'] }, b: { draft: stiles[j - 1]!, featureIds: ['groove-right'] }, clearanceMm: gapU, glued: false, floating: true, note: floatNote });
    else postContacts.push({ end: 'left', type: 'panel-in-groove', draft, featureIds: ['tongue-left'], clearanceMm: gapU, glued: false, floating: true, note: floatNote });
    if (j < n) joints.push({ type: 'panel-in-groove', a: { draft, featureIds: ['tongue-right'] }, b: { draft: stiles[j]!, featureIds: ['groove-left'] }, clearanceMm: gapU, glued: false, floating: true, note: floatNote });
    else postContacts.push({ end: 'right', type: 'panel-in-groove', draft, featureIds: ['tongue-right'], clearanceMm: gapU, glued: false, floating: true, note: floatNote });
    return draft;
  });

  const postGrooves: PostGroove[] = (['left', 'right'] as const).map((end) => ({
    end,
    box: end === 'left' ? worldBox(-o.postGrooveDepthMm, 0, zb0 + stop, zt1 - stop, bandLo, bandHi) : worldBox(span, span + o.postGrooveDepthMm, zb0 + stop, zt1 - stop, bandLo, bandHi),
    faceDir: dir(end === 'left' ? '+u' : '-u'),
    widthMm: gw,
    depthMm: o.postGrooveDepthMm,
  }));

  return { drafts, joints, postGrooves, postContacts, topRail, bottomRail, panels };
}
