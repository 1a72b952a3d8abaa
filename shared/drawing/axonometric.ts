/**
 * Isometric views for the cover and the exploded view: each part is a box seen from the front,
 * the right and above, its three visible faces filled in light, middle and dark tones and
 * painted back to front so nearer parts hide farther ones.
 */
import { localBoxToWorld } from '../engine/geometry/placement.ts';
import type { Box3, Part, PieceResult } from '../engine/types.ts';
import { pointsRect, rectsOverlap } from './rects.ts';
import type { ModelView, Primitive, Pt, Vec3Like } from './types.ts';

const COS30 = Math.cos(Math.PI / 6);
const SIN30 = 0.5;

/** Projects a world point (mm) to the isometric picture plane (mm, y up), seen from front-right-above. */
export function isoPoint([x, y, z]: Vec3Like): Pt {
  return [(x + y) * COS30, z + (y - x) * SIN30];
}

/** The part without its tongues: what shows between shoulders when the piece is assembled. */
export function bodyBoxLocal(part: Part): Box3 {
  const min = [0, 0, 0];
  const max = [part.lengthMm, part.widthMm, part.thicknessMm];
  for (const f of part.features) {
    if (f.type !== 'tongue') continue;
    if (f.face === 'end-a') min[0] = Math.max(min[0]!, f.lengthMm);
    if (f.face === 'end-b') max[0] = Math.min(max[0]!, part.lengthMm - f.lengthMm);
    if (f.face === 'edge-a') min[1] = Math.max(min[1]!, f.lengthMm);
    if (f.face === 'edge-b') max[1] = Math.min(max[1]!, part.widthMm - f.lengthMm);
  }
  return { min: [min[0]!, min[1]!, min[2]!], max: [max[0]!, max[1]!, max[2]!] };
}

interface IsoBox {
  box: Box3;
  partId: string;
  faces: Primitive[];
  screen: ReturnType<typeof pointsRect>;
  depth: number;
}

function corners(b: Box3): Record<string, Vec3Like> {
  const [x0, y0, z0] = b.min;
  const [x1, y1, z1] = b.max;
  return {
    a: [x0, y0, z0], b: [x1, y0, z0], c: [x1, y1, z0], d: [x0, y1, z0],
    e: [x0, y0, z1], f: [x1, y0, z1], g: [x1, y1, z1], h: [x0, y1, z1],
  };
}

function isoFaces(box: Box3): Primitive[] {
  const c = corners(box);
  const poly = (keys: string, fill: 'light' | 'mid' | 'dark'): Primitive => ({
    type: 'polygon', points: [...keys].map((k) => isoPoint(c[k]!)), fill, kind: 'visible',
  });
  // Top (+Z), front (−Y) and right (+X) are the faces a viewer at the front right above sees.
  return [poly('efgh', 'light'), poly('abfe', 'mid'), poly('bcgf', 'dark')];
}

/** −1 when `a` must be painted before `b` (it lies behind), 1 after, 0 when unknown. */
function behind(a: Box3, b: Box3): number {
  const eps = 1e-6;
  if (a.max[0] <= b.min[0] + eps) return -1; // lower X is farther from a viewer on the right
  if (b.max[0] <= a.min[0] + eps) return 1;
  if (a.min[1] >= b.max[1] - eps) return -1; // higher Y is farther back
  if (b.min[1] >= a.max[1] - eps) return 1;
  if (a.max[2] <= b.min[2] + eps) return -1; // lower Z is farther from a viewer above
  if (b.max[2] <= a.min[2] + eps) return 1;
  return 0;
}

/** Paints boxes back to front: a topological order of "behind" among overlapping pictures. */
function paintOrder(boxes: readonly IsoBox[]): IsoBox[] {
  const n = boxes.length;
  const after: number[][] = boxes.map(() => []);
  const indegree = new Array<number>(n).fill(0);
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      if (!rectsOverlap(boxes[i]!.screen, boxes[j]!.screen)) continue;
      let order = behind(boxes[i]!.box, boxes[j]!.box);
      if (order === 0) order = boxes[i]!.depth >= boxes[j]!.depth ? -1 : 1;
      const [first, second] = order < 0 ? [i, j] : [j, i];
      after[first]!.push(second);
      indegree[second]! += 1;
    }
  }
  const out: IsoBox[] = [];
  const done = new Array<boolean>(n).fill(false);
  while (out.length < n) {
    // Among the ready boxes take the farthest; if a cycle leaves none ready, break it the same way.
    let pick = -1;
    for (let i = 0; i < n; i++) {
      if (done[i] || indegree[i]! > 0) continue;
      if (pick < 0 || boxes[i]!.depth > boxes[pick]!.depth) pick = i;
    }
    if (pick < 0) {
      for (let i = 0; i < n; i++) if (!done[i] && (pick < 0 || boxes[i]!.depth > boxes[pick]!.depth)) pick = i;
    }
    done[pick] = true;
    out.push(boxes[pick]!);
    for (const k of after[pick]!) indegree[k]! -= 1;
  }
  return out;
}

/**
 * An isometric picture of `result`, assembled or exploded (each part moved by its explode
 * offset). With `callouts`, one instance of each part gets a leader to its letter.
 */
export function isometricView(
  result: PieceResult,
  opts: { id: string; title: string; exploded: boolean; letters?: ReadonlyMap<string, string> },
): ModelView {
  const parts = new Map(result.parts.map((p) => [p.id, p]));
  const isoBoxes: IsoBox[] = [];
  for (const pl of result.placements) {
    const part = parts.get(pl.partId);
    if (!part) continue;
    const size = [part.lengthMm, part.widthMm, part.thicknessMm] as const;
    const world = localBoxToWorld(bodyBoxLocal(part), size, pl.axes, pl.positionMm);
    const e = opts.exploded ? pl.explodeMm : [0, 0, 0];
    const box: Box3 = {
      min: [world.min[0] + e[0]!, world.min[1] + e[1]!, world.min[2] + e[2]!],
      max: [world.max[0] + e[0]!, world.max[1] + e[1]!, world.max[2] + e[2]!],
    };
    const faces = isoFaces(box);
    const centre: Vec3Like = [(box.min[0] + box.max[0]) / 2, (box.min[1] + box.max[1]) / 2, (box.min[2] + box.max[2]) / 2];
    isoBoxes.push({
      box, partId: part.id, faces,
      screen: pointsRect(faces.flatMap((f) => (f.type === 'polygon' ? f.points : []))),
      depth: -centre[0] + centre[1] - centre[2],
    });
  }
  const ordered = paintOrder(isoBoxes);
  const primitives = ordered.flatMap((b) => b.faces);
  const callouts: { at: Pt; text: string }[] = [];
  if (opts.letters) {
    const labelled = new Set<string>();
    // Label the nearest instance of each part, at the middle of its front face, so the dot lands on it.
    for (const b of [...ordered].reverse()) {
      const letter = opts.letters.get(b.partId);
      if (!letter || labelled.has(b.partId)) continue;
      labelled.add(b.partId);
      const front = b.faces[1]!;
      const pts = front.type === 'polygon' ? front.points : [];
      const cx = pts.reduce((s, p) => s + p[0], 0) / (pts.length || 1);
      const cy = pts.reduce((s, p) => s + p[1], 0) / (pts.length || 1);
      callouts.push({ at: [cx, cy], text: letter });
    }
  }
  const bounds = pointsRect(primitives.flatMap((p) => (p.type === 'polygon' ? p.points : [])));
  return { id: opts.id, title: opts.title, primitives, dimensions: [], callouts, bounds };
}
