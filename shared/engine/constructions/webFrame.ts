/**
 * A web frame: a flat frame between the sides of a case that carries the drawer above it and
 * keeps the one below from tipping. A front rail and a back rail run side to side; runners run
 * front to back between the rails with stub tenons into grooves in the rails' inner edges — at
 * each side (where the drawer's sides ride) and behind each mullion or divider. In a leg case the
 * rails have stub tenons into mortises in the legs; in a sheet-goods carcass the whole frame is
 * let into a dado across each side. A thin sheet dust panel may float in grooves all round each
 * bay between the runners. All its parts lie flat, one stock thickness deep.
 */
import type { JointDraft, PartDraft } from '../assembly.ts';
import { boxBetween } from '../geometry/box.ts';
import type { FeatureDraft } from '../geometry/featureDescribe.ts';
import type { Box3, Material } from '../types.ts';
import type { PostGroove } from './frameAndPanelFace.ts';
import { fixedName, plainPart } from './plainPart.ts';

/** How the frame's ends are held (mm). */
export type WebFrameEnds =
  /** Rails tenoned into mortises in the legs; the back legs fill `backLegY`. */
  | { kind: 'tenon'; mortiseDepthMm: number; railTongueLengthMm: number; backLegY: readonly [number, number] }
  /** Rails and side runners let into dadoes `depthMm` deep in the case sides. */
  | { kind: 'dado'; depthMm: number };

/** Options for {@link webFrame}; world coordinates, mm. */
export interface WebFrameOptions {
  /** Which frame, counted from the top (0), for names. */
  index: number;
  /** Height band the frame fills. */
  z: readonly [number, number];
  /** Between the legs' or sides' inner faces. */
  x: readonly [number, number];
  /** Front rail from the front (0) back; back rail ending at the back wall's inner face. */
  frontRailY: readonly [number, number];
  backRailY: readonly [number, number];
  ends: WebFrameEnds;
  /** The X ranges of the runners. */
  runnersX: readonly (readonly [number, number])[];
  material: Material;
  grooveWidthMm: number;
  /** Rail groove depth and the runners' tenon end clearance in it. */
  grooveDepthMm: number;
  tongueClearanceMm: number;
  /** Wood left beside each tenon: its shoulders (at least the groove depth where a runner is grooved for a panel). */
  shoulderMm: number;
  /** A sheet dust panel in each bay between the runners, as thick as the grooves are wide. */
  dustPanel?: { material: Material };
  /** Cuts the top needs in the top frame's rails, given each rail's world box. */
  railFeatures?: (which: 'front' | 'back', world: Box3) => FeatureDraft[];
  explodeMm: number;
}

/** The frame's parts, joints, and the mortises it needs in the legs. */
export interface WebFrame {
  drafts: PartDraft[];
  joints: JointDraft[];
  frontRail: PartDraft;
  backRail: PartDraft;
  runners: PartDraft[];
  /** Dust panels, one for each bay between neighbouring runners. */
  panels: PartDraft[];
  /** Mortises to cut into the legs, each with the rail and tongue that go in it. */
  mortises: { groove: PostGroove; rail: PartDraft; tongueId: string }[];
}

/** Builds one web frame. */
export function webFrame(o: WebFrameOptions): WebFrame {
  const [z0, z1] = o.z;
  const zc = (z0 + z1) / 2;
  const tz: [number, number] = [zc - o.grooveWidthMm / 2, zc + o.grooveWidthMm / 2];
  const sh = o.shoulderMm;
  const gd = o.grooveDepthMm;
  const ends = o.ends;
  // The frame's reach side to side: between the legs, or into the sides' dadoes.
  const ext: [number, number] = ends.kind === 'dado' ? [o.x[0] - ends.depthMm, o.x[1] + ends.depthMm] : [o.x[0], o.x[1]];
  const mortises: WebFrame['mortises'] = [];

  const rail = (which: 'front' | 'back'): PartDraft => {
    const y = which === 'front' ? o.frontRailY : o.backRailY;
    const features: FeatureDraft[] = [];
    const mine: PostGroove[] = [];
    let reach: [number, number] = ext;
    if (ends.kind === 'tenon') {
      const tl = ends.railTongueLengthMm;
      const legY = ends.backLegY;
      const tongueY: [number, number] = which === 'front' ? [y[0] + sh, Math.min(y[1], legY[1] - legY[0]) - sh] : [Math.max(y[0], legY[0]) + sh, y[1] - sh];
      for (const [end, xs, dir] of [['left', [o.x[0] - tl, o.x[0]], '-X'], ['right', [o.x[1], o.x[1] + tl], '+X']] as const) {
        const tongue = boxBetween([xs[0], tongueY[0], tz[0]], [xs[1], tongueY[1], tz[1]]);
        features.push({
          id: `tongue-${end}`, idTemplate: 'tongue-{face}', type: 'tongue', label: 'stub tenon into a leg mortise', faceDir: dir, tongue,
          removed: [
            boxBetween([xs[0], y[0], z0], [xs[1], y[1], tz[0]]), boxBetween([xs[0], y[0], tz[1]], [xs[1], y[1], z1]),
            boxBetween([xs[0], y[0], tz[0]], [xs[1], tongueY[0], tz[1]]), boxBetween([xs[0], tongueY[1], tz[0]], [xs[1], y[1], tz[1]]),
          ],
        });
        const mx: [number, number] = end === 'left' ? [o.x[0] - ends.mortiseDepthMm, o.x[0]] : [o.x[1], o.x[1] + ends.mortiseDepthMm];
        mine.push({ end, box: boxBetween([mx[0], tongueY[0], tz[0]], [mx[1], tongueY[1], tz[1]]), faceDir: end === 'left' ? '+X' : '-X', widthMm: o.grooveWidthMm, depthMm: ends.mortiseDepthMm });
      }
      reach = [o.x[0] - tl, o.x[1] + tl];
    }
    const gy: [number, number] = which === 'front' ? [y[1] - gd, y[1]] : [y[0], y[0] + gd];
    features.push({
      id: 'groove-runners', type: 'groove', label: o.dustPanel ? 'groove for the runners\' tenons and the dust panel' : 'groove for the runners\' tenons',
      faceDir: which === 'front' ? '+Y' : '-Y', removed: [boxBetween([ext[0], gy[0], tz[0]], [ext[1], gy[1], tz[1]])],
    });
    const world = boxBetween([reach[0], y[0], z0], [reach[1], y[1], z1]);
    features.push(...(o.railFeatures?.(which, world) ?? []));
    const draft = plainPart({
      group: `web-frame/${which}-rail`, member: which, label: `web frame ${o.index + 1} ${which} rail`, role: 'rail', material: o.material, grain: 'length',
      world, axes: which === 'front' ? { length: '+X', width: '+Y', thickness: '+Z' } : { length: '-X', width: '-Y', thickness: '+Z' },
      explodeMm: [0, which === 'front' ? -o.explodeMm : o.explodeMm, 0], features, name: fixedName(`web-frame-${which}-rail`, `Web-frame ${which} rail`),
    });
    for (const groove of mine) mortises.push({ groove, rail: draft, tongueId: `tongue-${groove.end}` });
    return draft;
  };
  const frontRail = rail('front');
  const backRail = rail('back');

  const c = o.tongueClearanceMm;
  const ry: [number, number] = [o.frontRailY[1] - gd + c, o.backRailY[0] + gd - c];
  const joints: JointDraft[] = [];
  const last = o.runnersX.length - 1;
  // A runner beside a bay with a dust panel is grooved along that edge.
  const grooved = (i: number, side: 'left' | 'right'): boolean => o.dustPanel !== undefined && (side === 'left' ? i > 0 : i < last);
  const runners = o.runnersX.map((xr, i) => {
    const tx: [number, number] = [Math.max(xr[0], ext[0]) + sh, Math.min(xr[1], ext[1]) - sh];
    // A runner grooved on its left only is its left-hand twin turned end for end: list its tenon
    // cheeks in the turned order so the two merge into one part.
    const twin = grooved(i, 'left') && !grooved(i, 'right');
    const features: FeatureDraft[] = (['front', 'back'] as const).map((end) => {
      const ys: [number, number] = end === 'front' ? [ry[0], o.frontRailY[1]] : [o.backRailY[0], ry[1]];
      const cheeks = [boxBetween([xr[0], ys[0], tz[0]], [tx[0], ys[1], tz[1]]), boxBetween([tx[1], ys[0], tz[0]], [xr[1], ys[1], tz[1]])];
      if (twin) cheeks.reverse();
      return {
        id: `tongue-${end}`, idTemplate: 'tongue-{face}', type: 'tongue', label: 'stub tenon into a rail groove', faceDir: end === 'front' ? '-Y' : '+Y',
        tongue: boxBetween([tx[0], ys[0], tz[0]], [tx[1], ys[1], tz[1]]),
        removed: [
          boxBetween([xr[0], ys[0], z0], [xr[1], ys[1], tz[0]]), boxBetween([xr[0], ys[0], tz[1]], [xr[1], ys[1], z1]),
          ...cheeks,
        ].filter((b) => b.max[0] - b.min[0] > 1e-9),
      };
    });
    for (const side of ['left', 'right'] as const) {
      if (!grooved(i, side)) continue;
      const gx: [number, number] = side === 'left' ? [xr[0], xr[0] + gd] : [xr[1] - gd, xr[1]];
      features.push({ id: `groove-${side}`, idTemplate: 'groove-{face}', type: 'groove', label: 'groove for the dust panel', faceDir: side === 'left' ? '-X' : '+X', removed: [boxBetween([gx[0], ry[0], tz[0]], [gx[1], ry[1], tz[1]])] });
    }
    const draft = plainPart({
      group: 'web-frame/runner', member: `runner-${i}`, label: `web frame ${o.index + 1} runner ${i + 1}`, role: 'runner', material: o.material, grain: 'length',
      world: boxBetween([xr[0], ry[0], z0], [xr[1], ry[1], z1]), axes: { length: '+Y', width: '-X', thickness: '+Z' },
      explodeMm: [0, 0, o.explodeMm * 0.3], features, notes: ['Wax the top where a drawer side rides.'],
      name: i === 0 || i === last ? fixedName('web-frame-runner', 'Web-frame runner') : fixedName('web-frame-centre-runner', 'Web-frame centre runner'),
    });
    for (const [end, railDraft] of [['front', frontRail], ['back', backRail]] as const) {
      joints.push({
        type: 'stub-tenon', a: { draft, featureIds: [`tongue-${end}`] }, b: { draft: railDraft, featureIds: ['groove-runners'] }, clearanceMm: c,
        glued: end === 'front', floating: false, note: end === 'front' ? 'Glued at the front only.' : 'Dry at the back, so the frame need not fight the case.',
      });
    }
    return draft;
  });

  // Dust panels: tongues the panel's own thickness into the grooves all round the bay, the fit clearance at each edge.
  const panels = o.dustPanel ? o.runnersX.slice(1).map((right, i) => {
    const left = o.runnersX[i]!;
    const bx: [number, number] = [left[1], right[0]];
    const by: [number, number] = [o.frontRailY[1], o.backRailY[0]];
    const px: [number, number] = [bx[0] - gd + c, bx[1] + gd - c];
    const py: [number, number] = [by[0] - gd + c, by[1] + gd - c];
    const edge = (id: string, faceDir: '-X' | '+X' | '-Y' | '+Y', tongue: Box3): FeatureDraft => ({ id: `tongue-${id}`, idTemplate: 'tongue-{face}', type: 'tongue', label: 'edge in a groove', faceDir, removed: [], tongue });
    const draft = plainPart({
      group: 'web-frame/dust-panel', member: `bay-${i + 1}`, label: `web frame ${o.index + 1} dust panel ${i + 1}`, role: 'panel', material: o.dustPanel!.material, grain: 'none',
      world: boxBetween([px[0], py[0], tz[0]], [px[1], py[1], tz[1]]), axes: { length: '+X', width: '+Y', thickness: '+Z' }, explodeMm: [0, 0, o.explodeMm * 0.6],
      features: [
        edge('front', '-Y', boxBetween([bx[0], py[0], tz[0]], [bx[1], by[0], tz[1]])),
        edge('back', '+Y', boxBetween([bx[0], by[1], tz[0]], [bx[1], py[1], tz[1]])),
        edge('left', '-X', boxBetween([px[0], by[0], tz[0]], [bx[0], by[1], tz[1]])),
        edge('right', '+X', boxBetween([bx[1], by[0], tz[0]], [px[1], by[1], tz[1]])),
      ],
      name: fixedName('dust-panel', 'Dust panel'), notes: ['Slides into its grooves as the frame goes together; no glue.'],
    });
    const fit = (edgeId: string, host: PartDraft, grooveId: string): JointDraft => ({
      type: 'panel-in-groove', a: { draft, featureIds: [`tongue-${edgeId}`] }, b: { draft: host, featureIds: [grooveId] }, clearanceMm: c, glued: false, floating: true,
      note: 'Sheet panel: a fit clearance only, moves negligibly; not glued.',
    });
    joints.push(fit('front', frontRail, 'groove-runners'), fit('back', backRail, 'groove-runners'), fit('left', runners[i]!, 'groove-right'), fit('right', runners[i + 1]!, 'groove-left'));
    return draft;
  }) : [];
  return { drafts: [frontRail, backRail, ...runners, ...panels], joints, frontRail, backRail, runners, panels, mortises };
}
