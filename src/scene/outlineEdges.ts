/**
 * The creases of a part's solid, for the graphite outline. Every solid here is a box with boxes
 * cut from it, so every real crease runs along x, y or z; a slanted triangle edge is only the
 * boolean operation's triangulation of a flat face. The operation also leaves T-junctions (one
 * side of a crease split where the other is not), so edges are matched as segments on a line,
 * not vertex to vertex: a piece of a line is a crease where faces of two different directions
 * meet along it.
 */
import { BufferGeometry, Float32BufferAttribute } from 'three';

/** Coordinates closer than this (mm) are the same; far below any cut a maker makes. */
const WELD_MM = 1e-3;

/**
 * Each axis's coordinates welded to shared values: sorted, and every run of values closer than
 * WELD_MM to the one before takes the run's first value. Rounding to a grid would split two
 * nearly equal values that straddle a grid line.
 */
function weldAxis(values: Float32Array | number[]): Map<number, number> {
  const sorted = [...new Set(values)].sort((a, b) => a - b);
  const welded = new Map<number, number>();
  let anchor = Number.NEGATIVE_INFINITY;
  let previous = Number.NEGATIVE_INFINITY;
  for (const v of sorted) {
    if (v - previous > WELD_MM) anchor = v;
    welded.set(v, anchor);
    previous = v;
  }
  return welded;
}

interface Span {
  from: number;
  to: number;
  /** Which way the face on this side looks: axis 0–2, times 2, plus 1 when negative. */
  facing: number;
}

function facingOf(nx: number, ny: number, nz: number): number {
  const ax = Math.abs(nx);
  const ay = Math.abs(ny);
  const az = Math.abs(nz);
  if (ax >= ay && ax >= az) return nx < 0 ? 1 : 0;
  if (ay >= az) return ny < 0 ? 3 : 2;
  return nz < 0 ? 5 : 4;
}

/** Line segments (pairs of points, mm) along the creases of `geometry`, a solid of boxes. */
export function outlineEdges(geometry: BufferGeometry): BufferGeometry {
  const position = geometry.getAttribute('position');
  const index = geometry.getIndex();
  const count = index ? index.count : position.count;
  const vertex = (i: number): number => (index ? index.getX(i) : i);
  const lines = new Map<string, { axis: number; fixed: [number, number]; spans: Span[] }>();
  const welds = [0, 1, 2].map((k) => weldAxis(Array.from({ length: position.count }, (_, v) => position.getComponent(v, k))));
  const at = (v: number): number[] => [0, 1, 2].map((k) => welds[k]!.get(position.getComponent(v, k))!);

  for (let t = 0; t < count; t += 3) {
    const p = [at(vertex(t)), at(vertex(t + 1)), at(vertex(t + 2))];
    // The face's own direction from its winding, not the vertex normals: exact for flat faces.
    const [a, b, c] = p as [number[], number[], number[]];
    const u = [b[0]! - a[0]!, b[1]! - a[1]!, b[2]! - a[2]!];
    const v = [c[0]! - a[0]!, c[1]! - a[1]!, c[2]! - a[2]!];
    const n = [u[1]! * v[2]! - u[2]! * v[1]!, u[2]! * v[0]! - u[0]! * v[2]!, u[0]! * v[1]! - u[1]! * v[0]!];
    if (Math.hypot(n[0]!, n[1]!, n[2]!) === 0) continue;
    const facing = facingOf(n[0]!, n[1]!, n[2]!);
    for (let e = 0; e < 3; e++) {
      const from = p[e]!;
      const to = p[(e + 1) % 3]!;
      const same = [0, 1, 2].filter((k) => from[k] === to[k]);
      if (same.length !== 2) continue;
      const axis = [0, 1, 2].find((k) => !same.includes(k))!;
      const fixed: [number, number] = [from[same[0]!]!, from[same[1]!]!];
      const key = `${axis}|${fixed[0]}|${fixed[1]}`;
      let line = lines.get(key);
      if (!line) {
        line = { axis, fixed, spans: [] };
        lines.set(key, line);
      }
      const s0 = from[axis]!;
      const s1 = to[axis]!;
      line.spans.push({ from: Math.min(s0, s1), to: Math.max(s0, s1), facing });
    }
  }

  const out: number[] = [];
  for (const line of lines.values()) {
    const stops = [...new Set(line.spans.flatMap((s) => [s.from, s.to]))].sort((x, y) => x - y);
    let runFrom: number | null = null;
    const emit = (from: number, to: number): void => {
      const point = (s: number): number[] => {
        const q = [0, 0, 0];
        q[line.axis] = s;
        const others = [0, 1, 2].filter((k) => k !== line.axis);
        q[others[0]!] = line.fixed[0];
        q[others[1]!] = line.fixed[1];
        return q;
      };
      out.push(...point(from), ...point(to));
    };
    for (let i = 0; i + 1 < stops.length; i++) {
      const mid = (stops[i]! + stops[i + 1]!) / 2;
      const facings = new Set(line.spans.filter((s) => s.from < mid && s.to > mid).map((s) => s.facing));
      const crease = facings.size >= 2;
      if (crease && runFrom === null) runFrom = stops[i]!;
      if (!crease && runFrom !== null) {
        emit(runFrom, stops[i]!);
        runFrom = null;
      }
    }
    if (runFrom !== null) emit(runFrom, stops[stops.length - 1]!);
  }
  const edges = new BufferGeometry();
  edges.setAttribute('position', new Float32BufferAttribute(out, 3));
  return edges;
}
