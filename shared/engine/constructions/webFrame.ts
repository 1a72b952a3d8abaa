/**
 * A web frame: a flat frame between the legs of a frame-and-panel case that carries the drawer
 * above it and keeps the one below from tipping. A front rail and a back rail run between the
 * legs with stub tenons into mortises in the legs; runners run front to back between the rails
 * with stub tenons into grooves in the rails' inner edges — at each side (where the drawer's
 * sides ride) and behind each mullion. All its parts lie flat, one stock thickness deep.
 */
import type { JointDraft, PartDraft } from '../assembly.ts';
import { boxBetween } from '../geometry/box.ts';
import type { FeatureDraft } from '../geometry/featureDescribe.ts';
import type { Box3, Material } from '../types.ts';
import type { PostGroove } from './frameAndPanelFace.ts';
import { fixedName, plainPart } from './plainPart.ts';

/** Options for {@link webFrame}; world coordinates, mm. */
export interface WebFrameOptions {
  /** Which frame, counted from the top (0), for names. */
  index: number;
  /** Height band the frame fills. */
  z: readonly [number, number];
  /** Between the legs' inner faces. */
  x: readonly [number, number];
  /** Front rail from the front (0) back; back rail ending at the back wall's inner face. */
  frontRailY: readonly [number, number];
  backRailY: readonly [number, number];
  /** The Y range the back legs fill, so the back rail's tenons land inside them. */
  backLegY: readonly [number, number];
  /** The X ranges of the runners. */
  runnersX: readonly (readonly [number, number])[];
  material: Material;
  grooveWidthMm: number;
  /** Leg mortise depth and the rails' tenon length. */
  mortiseDepthMm: number;
  railTongueLengthMm: number;
  /** Rail groove depth and the runners' tenon end clearance in it. */
  grooveDepthMm: number;
  tongueClearanceMm: number;
  /** Wood left beside each tenon: its shoulders. */
  shoulderMm: number;
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
  /** Mortises to cut into the legs, each with the rail and tongue that go in it. */
  mortises: { groove: PostGroove; rail: PartDraft; tongueId: string }[];
}

/** Builds one web frame. */
export function webFrame(o: WebFrameOptions): WebFrame {
  const [z0, z1] = o.z;
  const zc = (z0 + z1) / 2;
  const tz: [number, number] = [zc - o.grooveWidthMm / 2, zc + o.grooveWidthMm / 2];
  const tl = o.railTongueLengthMm;
  const sh = o.shoulderMm;
  const mortises: WebFrame['mortises'] = [];

  const rail = (which: 'front' | 'back'): PartDraft => {
    const y = which === 'front' ? o.frontRailY : o.backRailY;
    const tongueY: [number, number] = which === 'front' ? [y[0] + sh, Math.min(y[1], o.backLegY[1] - o.backLegY[0]) - sh] : [Math.max(y[0], o.backLegY[0]) + sh, y[1] - sh];
    const features: FeatureDraft[] = [];
    const mine: PostGroove[] = [];
    for (const [end, xs, dir] of [['left', [o.x[0] - tl, o.x[0]], '-X'], ['right', [o.x[1], o.x[1] + tl], '+X']] as const) {
      const tongue = boxBetween([xs[0], tongueY[0], tz[0]], [xs[1], tongueY[1], tz[1]]);
      features.push({
        id: `tongue-${end}`, idTemplate: 'tongue-{face}', type: 'tongue', label: 'stub tenon into a leg mortise', faceDir: dir, tongue,
        removed: [
          boxBetween([xs[0], y[0], z0], [xs[1], y[1], tz[0]]), boxBetween([xs[0], y[0], tz[1]], [xs[1], y[1], z1]),
          boxBetween([xs[0], y[0], tz[0]], [xs[1], tongueY[0], tz[1]]), boxBetween([xs[0], tongueY[1], tz[0]], [xs[1], y[1], tz[1]]),
        ],
      });
      const mx: [number, number] = end === 'left' ? [o.x[0] - o.mortiseDepthMm, o.x[0]] : [o.x[1], o.x[1] + o.mortiseDepthMm];
      mine.push({ end, box: boxBetween([mx[0], tongueY[0], tz[0]], [mx[1], tongueY[1], tz[1]]), faceDir: end === 'left' ? '+X' : '-X', widthMm: o.grooveWidthMm, depthMm: o.mortiseDepthMm });
    }
    const gy: [number, number] = which === 'front' ? [y[1] - o.grooveDepthMm, y[1]] : [y[0], y[0] + o.grooveDepthMm];
    features.push({ id: 'groove-runners', type: 'groove', label: 'groove for the runners\' tenons', faceDir: which === 'front' ? '+Y' : '-Y', removed: [boxBetween([o.x[0], gy[0], tz[0]], [o.x[1], gy[1], tz[1]])] });
    const world = boxBetween([o.x[0] - tl, y[0], z0], [o.x[1] + tl, y[1], z1]);
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

  const ry: [number, number] = [o.frontRailY[1] - o.grooveDepthMm + o.tongueClearanceMm, o.backRailY[0] + o.grooveDepthMm - o.tongueClearanceMm];
  const joints: JointDraft[] = [];
  const runners = o.runnersX.map((xr, i) => {
    const tx: [number, number] = [Math.max(xr[0], o.x[0]) + sh, Math.min(xr[1], o.x[1]) - sh];
    const features: FeatureDraft[] = (['front', 'back'] as const).map((end) => {
      const ys: [number, number] = end === 'front' ? [ry[0], o.frontRailY[1]] : [o.backRailY[0], ry[1]];
      return {
        id: `tongue-${end}`, idTemplate: 'tongue-{face}', type: 'tongue', label: 'stub tenon into a rail groove', faceDir: end === 'front' ? '-Y' : '+Y',
        tongue: boxBetween([tx[0], ys[0], tz[0]], [tx[1], ys[1], tz[1]]),
        removed: [
          boxBetween([xr[0], ys[0], z0], [xr[1], ys[1], tz[0]]), boxBetween([xr[0], ys[0], tz[1]], [xr[1], ys[1], z1]),
          boxBetween([xr[0], ys[0], tz[0]], [tx[0], ys[1], tz[1]]), boxBetween([tx[1], ys[0], tz[0]], [xr[1], ys[1], tz[1]]),
        ].filter((b) => b.max[0] - b.min[0] > 1e-9),
      };
    });
    const draft = plainPart({
      group: 'web-frame/runner', member: `runner-${i}`, label: `web frame ${o.index + 1} runner ${i + 1}`, role: 'runner', material: o.material, grain: 'length',
      world: boxBetween([xr[0], ry[0], z0], [xr[1], ry[1], z1]), axes: { length: '+Y', width: '-X', thickness: '+Z' },
      explodeMm: [0, 0, o.explodeMm * 0.3], features, name: fixedName('web-frame-runner', 'Web-frame runner'), notes: ['Wax the top where a drawer side rides.'],
    });
    for (const [end, railDraft] of [['front', frontRail], ['back', backRail]] as const) {
      joints.push({
        type: 'stub-tenon', a: { draft, featureIds: [`tongue-${end}`] }, b: { draft: railDraft, featureIds: ['groove-runners'] }, clearanceMm: o.tongueClearanceMm,
        glued: end === 'front', floating: false, note: end === 'front' ? 'Glued at the front only.' : 'Dry at the back, so the frame need not fight the case.',
      });
    }
    return draft;
  });
  return { drafts: [frontRail, backRail, ...runners], joints, frontRail, backRail, runners, mortises };
}
