/**
 * How a part drawing looks at a part: three views in third-angle projection of the part's own
 * frame (x along the length, y across the width, z through the thickness). The face view shows
 * the broad face with more cuts on it; the edge view is seen from below the face view and drawn
 * under it; the end view is seen from the right and drawn beside it.
 */
import type { Feature, Part } from '../engine/types.ts';

/** The three views of a part drawing. */
export type PartViewId = 'face' | 'edge' | 'end';

/** One local axis on a view: which axis, and whether it runs reversed (size − value). */
export interface AxisUse {
  axis: 0 | 1 | 2;
  flip: boolean;
}

/** A view's horizontal, vertical and toward-the-viewer axes in the part's frame. */
export interface PartViewAxes {
  u: AxisUse;
  v: AxisUse;
  /** Points toward the viewer: a cut open on this side is seen, others are hidden. */
  toward: AxisUse;
}

/** Which broad face the face view shows. */
export type FaceUp = 'face-b' | 'face-a';

/** The view axes of each view when `up` is shown in the face view. */
export function partViewAxes(up: FaceUp): Readonly<Record<PartViewId, PartViewAxes>> {
  const f = up === 'face-a';
  return {
    face: { u: { axis: 0, flip: false }, v: { axis: 1, flip: f }, toward: { axis: 2, flip: f } },
    edge: { u: { axis: 0, flip: false }, v: { axis: 2, flip: f }, toward: { axis: 1, flip: !f } },
    end: { u: { axis: 2, flip: !f }, v: { axis: 1, flip: f }, toward: { axis: 0, flip: false } },
  };
}

/** Shows face-a when more cuts open onto face-a and edge-b than onto face-b and edge-a. */
export function chooseFaceUp(part: Part): FaceUp {
  let a = 0;
  let b = 0;
  for (const f of part.features) {
    if (f.face === 'face-a' || f.face === 'edge-b') a++;
    if (f.face === 'face-b' || f.face === 'edge-a') b++;
  }
  return a > b ? 'face-a' : 'face-b';
}

/** The part's size along local x, y, z (mm). */
export function partSize(part: Part): readonly [number, number, number] {
  return [part.lengthMm, part.widthMm, part.thicknessMm];
}

/** A local coordinate as seen on a view axis (mm). */
export function onAxis(use: AxisUse, size: readonly number[], value: number): number {
  return use.flip ? size[use.axis]! - value : value;
}

/** The local axis (0 length, 1 width, 2 thickness) a face looks along. */
export const NORMAL: Readonly<Record<Feature['face'], 0 | 1 | 2>> = {
  'end-a': 0, 'end-b': 0, 'edge-a': 1, 'edge-b': 1, 'face-a': 2, 'face-b': 2,
};

/** The view that shows local axes `a` and `b` side by side. */
export function viewShowing(a: number, b: number): PartViewId {
  const s = new Set([a, b]);
  if (s.has(0) && s.has(1)) return 'face';
  if (s.has(0) && s.has(2)) return 'edge';
  return 'end';
}

/** The two local axes in the plane of a face whose normal is axis `n`. */
export function inPlane(n: number): [number, number] {
  const axes = [0, 1, 2].filter((a) => a !== n);
  return [axes[0]!, axes[1]!];
}
