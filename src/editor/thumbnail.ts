/**
 * A small line drawing of a piece for design cards: every placed part as a box in an oblique
 * projection (width across, height up, depth receding at 30°), far parts first. Plain numbers
 * for an SVG, so a grid of cards needs no 3D canvas.
 */
import { worldSize } from '../../shared/engine/geometry/placement.ts';
import type { PieceResult, Vec3 } from '../../shared/engine/types.ts';

/** One part's three visible faces as SVG polygon point lists, in drawing units. */
export interface ThumbnailShape {
  partId: string;
  role: string;
  front: string;
  top: string;
  side: string;
}

/** The drawing: its shapes and the viewBox that frames them. */
export interface Thumbnail {
  viewBox: string;
  shapes: ThumbnailShape[];
}

// Depth drawn at half scale, receding up and to the right: a cabinet oblique.
const RECEDE = 0.5;
const COS = Math.cos(Math.PI / 6) * RECEDE;
const SIN = Math.sin(Math.PI / 6) * RECEDE;

/** Projects world (x, y, z) mm to drawing (u, v), v growing downward as SVG does. */
function project(x: number, y: number, z: number): [number, number] {
  return [x + y * COS, -(z + y * SIN)];
}

/** Draws `result`'s placed parts, framed with a margin of `marginMm`. */
export function thumbnailOf(result: PieceResult, marginMm = 40): Thumbnail {
  const parts = new Map(result.parts.map((part) => [part.id, part]));
  const boxes = result.placements.flatMap((placement) => {
    const part = parts.get(placement.partId);
    if (!part) return [];
    const size = worldSize(placement.axes, [part.lengthMm, part.widthMm, part.thicknessMm]);
    return [{ partId: part.id, role: part.role, min: placement.positionMm, size }];
  });
  // Painter's order for a view from the front, above and to the right: back faces first, then
  // low before high, left before right; a lid (front face furthest forward, top highest) last.
  boxes.sort((a, b) => b.min[1] - a.min[1] || a.min[2] + a.size[2] - (b.min[2] + b.size[2]) || a.min[0] - b.min[0]);

  let minU = Infinity, minV = Infinity, maxU = -Infinity, maxV = -Infinity;
  const shapes = boxes.map(({ partId, role, min, size }) => {
    const faces = boxFaces(min, size);
    for (const [u, v] of [...faces.front, ...faces.top, ...faces.side]) {
      minU = Math.min(minU, u); maxU = Math.max(maxU, u);
      minV = Math.min(minV, v); maxV = Math.max(maxV, v);
    }
    return { partId, role, front: points(faces.front), top: points(faces.top), side: points(faces.side) };
  });
  if (shapes.length === 0) return { viewBox: '0 0 100 100', shapes };
  const viewBox = [minU - marginMm, minV - marginMm, maxU - minU + 2 * marginMm, maxV - minV + 2 * marginMm].map(round).join(' ');
  return { viewBox, shapes };
}

function boxFaces(min: Vec3, size: Vec3) {
  const [x0, y0, z0] = min;
  const [x1, y1, z1] = [x0 + size[0], y0 + size[1], z0 + size[2]];
  return {
    front: [project(x0, y0, z0), project(x1, y0, z0), project(x1, y0, z1), project(x0, y0, z1)],
    top: [project(x0, y0, z1), project(x1, y0, z1), project(x1, y1, z1), project(x0, y1, z1)],
    side: [project(x1, y0, z0), project(x1, y1, z0), project(x1, y1, z1), project(x1, y0, z1)],
  };
}

function points(corners: [number, number][]): string {
  return corners.map(([u, v]) => `${round(u)},${round(v)}`).join(' ');
}

function round(n: number): number {
  return Math.round(n * 10) / 10;
}
