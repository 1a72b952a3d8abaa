/**
 * The overall views of the assembled piece — front, side and top with the lid removed — with
 * their visible and hidden edges, a centre line and chains of dimensions: the leg, stile and
 * rail sizes nearest the drawing, the overall sizes outside them.
 */
import type { PartRole, PieceResult } from '../engine/types.ts';
import { chainDimensions, dimension } from './chain.ts';
import { projectEdges, type DepthRect } from './hiddenLines.ts';
import { instancesOf, type Instance } from './instances.ts';
import type { DrawingUnits } from './lengthText.ts';
import { projectBox, type OrthoViewId } from './orthographic.ts';
import { rectUnion } from './rects.ts';
import type { DimensionRequest, ModelView, Primitive } from './types.ts';

/** Parts behind the nearest frame by no more than this (mm) count as the frame seen in a view. */
const FRAME_LAYER_MM = 30;
/** How far a centre line runs past the drawing, mm of the piece. */
const CENTRE_OVERRUN_MM = 15;

/** Parts whose sides are stations of the horizontal chain: legs, stiles, case sides (and upright face-frame members). */
const UPRIGHT: readonly PartRole[] = ['leg', 'stile', 'case-side'];
/** Parts whose top and bottom are stations of the vertical chain (and face-frame rails). */
const LEVELS: readonly PartRole[] = ['leg', 'rail', 'lid', 'top', 'base'];
/** The case's own frame, whose nearest members set the layer a view dimensions. */
const CASE: readonly PartRole[] = ['leg', 'rail', 'stile', 'face-frame', 'case-side', 'top', 'base'];

const TITLES: Readonly<Record<OrthoViewId, string>> = {
  front: 'Front',
  side: 'Right side',
  top: 'Top',
};

interface Projected {
  inst: Instance;
  dr: DepthRect;
}

/** Instances of the nearest frame in a view: the case parts within a board's thickness of the nearest. */
function frameLayer(all: readonly Projected[]): Projected[] {
  const caseNear = Math.min(...all.filter((p) => CASE.includes(p.inst.part.role)).map((p) => p.dr.near));
  return all.filter((p) => p.dr.near <= caseNear + FRAME_LAYER_MM);
}

/** A chain of sizes between `stations`, or nothing when it would only repeat the overall size. */
function chainOf(stations: readonly number[], at: number, axis: 'h' | 'v', side: DimensionRequest['side'], units: DrawingUnits): DimensionRequest[] {
  const lo = Math.min(...stations);
  const hi = Math.max(...stations);
  if (!stations.some((s) => s > lo + 0.5 && s < hi - 0.5)) return [];
  return chainDimensions(stations, at, axis, side, 1, units);
}

/** One orthographic view of `result` in model space (mm of the piece, y up). */
export function overallView(result: PieceResult, view: OrthoViewId, units: DrawingUnits): ModelView {
  const instances = instancesOf(result, view === 'top' ? { omitRoles: ['lid', 'batten'] } : {});
  const projected: Projected[] = instances.map((inst) => ({ inst, dr: projectBox(inst.box, view) }));
  const segments = projectEdges(projected.map((p) => p.dr), { hidden: view !== 'top' });
  const bounds = rectUnion(projected.map((p) => p.dr.rect));
  const layer = frameLayer(projected);
  const right = bounds.x + bounds.w;
  const top = bounds.y + bounds.h;

  // A face frame's stiles and mullions stand (taller than wide); its rails lie.
  const upright = (p: Projected) => UPRIGHT.includes(p.inst.part.role) || (p.inst.part.role === 'face-frame' && p.dr.rect.h > p.dr.rect.w);
  const level = (p: Projected) => LEVELS.includes(p.inst.part.role) || (p.inst.part.role === 'face-frame' && p.dr.rect.w >= p.dr.rect.h);
  const uprights = layer.filter(upright).flatMap((p) => [p.dr.rect.x, p.dr.rect.x + p.dr.rect.w]);
  const dims: DimensionRequest[] = [...chainOf([bounds.x, ...uprights, right], bounds.y, 'h', 'below', units)];
  const widthKey = view === 'side' ? 'overall-depth' : view === 'top' ? 'case-width' : 'overall-width';
  dims.push(dimension(bounds.x, right, bounds.y, 'h', 'below', 2, units, { key: widthKey }));

  if (view === 'top') {
    const depthStations = layer.filter((p) => p.inst.part.role === 'leg').flatMap((p) => [p.dr.rect.y, p.dr.rect.y + p.dr.rect.h]);
    dims.push(...chainOf([bounds.y, ...depthStations, top], right, 'v', 'right', units));
    dims.push(dimension(bounds.y, top, bounds.x, 'v', 'left', 2, units, { key: 'case-depth' }));
  } else {
    const levels = layer.filter(level).flatMap((p) => [p.dr.rect.y, p.dr.rect.y + p.dr.rect.h]);
    const lids = projected.filter((p) => p.inst.part.role === 'lid' || p.inst.part.role === 'top').flatMap((p) => [p.dr.rect.y, p.dr.rect.y + p.dr.rect.h]);
    dims.push(...chainOf([bounds.y, ...levels, ...lids, top], right, 'v', 'right', units));
    dims.push(dimension(bounds.y, top, bounds.x, 'v', 'left', 2, units, { key: 'overall-height' }));
  }

  const primitives: Primitive[] = [...segments];
  if (view !== 'side') {
    const cx = bounds.x + bounds.w / 2;
    primitives.push({ type: 'segment', a: [cx, bounds.y - CENTRE_OVERRUN_MM], b: [cx, top + CENTRE_OVERRUN_MM], kind: 'centre' });
  }
  const hasLid = result.parts.some((p) => p.role === 'lid');
  const title = view === 'top' && hasLid ? 'Top, lid removed' : TITLES[view];
  return { id: view, title, primitives, dimensions: dims, callouts: [], bounds };
}
