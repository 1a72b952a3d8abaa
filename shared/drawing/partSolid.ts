/**
 * The edges of one part with its cuts, seen square-on in one of its views. The part is split
 * into a grid at every cut's boundaries; each cell is wood or air. An edge runs wherever the
 * four cells around a grid line are not one flat surface, and it is hidden when wood lies
 * between it and the viewer. Round holes and slots are drawn separately.
 */
import type { Part } from '../engine/types.ts';
import { mergeRuns, type LineRun } from './hiddenLines.ts';
import { onAxis, partSize, type PartViewAxes } from './partFrame.ts';
import { stations } from './chain.ts';
import type { Segment } from './types.ts';

interface Grid {
  breaks: [number[], number[], number[]];
  solid: (i: number, j: number, k: number) => boolean;
}

/** Wood-or-air grid of `part`: every removed box except holes and slots (mm, local frame). */
export function partGrid(part: Part): Grid {
  const size = partSize(part);
  const boxes = part.features.filter((f) => f.type !== 'hole' && f.type !== 'slot').flatMap((f) => f.removed);
  const breaks = [0, 1, 2].map((a) =>
    stations([0, size[a]!, ...boxes.flatMap((b) => [b.min[a]!, b.max[a]!])].map((v) => Math.min(size[a]!, Math.max(0, v)))),
  ) as [number[], number[], number[]];
  const nx = breaks[0].length - 1;
  const ny = breaks[1].length - 1;
  const nz = breaks[2].length - 1;
  const cells = new Uint8Array(nx * ny * nz);
  for (let i = 0; i < nx; i++) {
    const cx = (breaks[0][i]! + breaks[0][i + 1]!) / 2;
    for (let j = 0; j < ny; j++) {
      const cy = (breaks[1][j]! + breaks[1][j + 1]!) / 2;
      for (let k = 0; k < nz; k++) {
        const cz = (breaks[2][k]! + breaks[2][k + 1]!) / 2;
        const removed = boxes.some((b) => cx > b.min[0] && cx < b.max[0] && cy > b.min[1] && cy < b.max[1] && cz > b.min[2] && cz < b.max[2]);
        cells[(i * ny + j) * nz + k] = removed ? 0 : 1;
      }
    }
  }
  const solid = (i: number, j: number, k: number): boolean =>
    i >= 0 && j >= 0 && k >= 0 && i < nx && j < ny && k < nz && cells[(i * ny + j) * nz + k] === 1;
  return { breaks, solid };
}

/**
 * Visible and hidden edges of `part` in the view `axes` (view mm, y up). Coordinates are the
 * local ones, turned as the view says (a flipped axis reads size − value).
 */
export function partEdges(part: Part, axes: PartViewAxes, grid: Grid = partGrid(part)): Segment[] {
  const size = partSize(part);
  const { breaks } = grid;
  const u = axes.u.axis;
  const v = axes.v.axis;
  const d = axes.toward.axis;
  const cell = (iu: number, iv: number, id: number): boolean => {
    const idx = [0, 0, 0];
    idx[u] = iu;
    idx[v] = iv;
    idx[d] = id;
    return grid.solid(idx[0]!, idx[1]!, idx[2]!);
  };
  const nd = breaks[d].length - 1;
  // Cells nearer the viewer than grid plane `k` along the toward axis.
  const nearer = (k: number): number[] => {
    const out: number[] = [];
    if (axes.toward.flip) for (let c = 0; c < k; c++) out.push(c);
    else for (let c = k; c < nd; c++) out.push(c);
    return out;
  };
  const isEdge = (a: boolean, b: boolean, c: boolean, e: boolean): boolean => {
    // a,b on one side of the line across, c,e on the other; a,c nearer-low, b,e depth-high.
    const n = Number(a) + Number(b) + Number(c) + Number(e);
    if (n === 1 || n === 3) return true;
    if (n === 2) return a === e; // diagonal pair
    return false;
  };

  const runs: LineRun[] = [];
  // Edges along u (horizontal lines on the view) sit on a v grid plane and a depth grid plane.
  const collect = (along: 'u' | 'v'): void => {
    const runAxis = along === 'u' ? u : v;
    const lineAxis = along === 'u' ? v : u;
    const nRun = breaks[runAxis].length - 1;
    for (let li = 0; li < breaks[lineAxis].length; li++) {
      for (let k = 0; k < breaks[d].length; k++) {
        for (let r = 0; r < nRun; r++) {
          const at = (lineIdx: number, depthIdx: number): boolean =>
            along === 'u' ? cell(r, lineIdx, depthIdx) : cell(lineIdx, r, depthIdx);
          if (!isEdge(at(li - 1, k - 1), at(li - 1, k), at(li, k - 1), at(li, k))) continue;
          const hidden = nearer(k).some((c) => at(li - 1, c) || at(li, c));
          const lineUse = along === 'u' ? axes.v : axes.u;
          const runUse = along === 'u' ? axes.u : axes.v;
          const a0 = onAxis(runUse, size, breaks[runAxis][r]!);
          const a1 = onAxis(runUse, size, breaks[runAxis][r + 1]!);
          runs.push({
            horizontal: along === 'u',
            at: onAxis(lineUse, size, breaks[lineAxis][li]!),
            span: [Math.min(a0, a1), Math.max(a0, a1)],
            kind: hidden ? 'hidden' : 'visible',
          });
        }
      }
    }
  };
  collect('u');
  collect('v');
  return mergeRuns(runs, { hidden: true });
}
