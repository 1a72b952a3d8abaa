/**
 * What room fit needs to know about a piece, read from the engine's result: the world box of
 * every part instance, what opens and how (the result's `openings`: a lid about its hinge line,
 * doors about their hinge edges, drawers straight out), and which subassemblies come apart for
 * carrying.
 *
 * This is the one adapter between the engine and room fit. The one fact the result gives without
 * a parameter behind it is said so in `assumptions`: the lid's opening angle, the engine's usual
 * stop at {@link LID_OPEN_ANGLE_DEG} (chests have no lid-stay parameter yet).
 */
import { boxAt, boxUnion, boxVolume } from '../engine/geometry/box.ts';
import { worldSize } from '../engine/geometry/placement.ts';
import { LID_OPEN_ANGLE_DEG } from '../engine/pieces/openings.ts';
import type { Box3, PartInstanceRef, PieceKind, PieceResult } from '../engine/types.ts';
import { assert } from '../assert.ts';

/** One placed part instance, its world box in the piece's frame (mm). */
export interface EnvelopePart {
  partId: string;
  /** The placement's instance among the part's. */
  instance: number;
  label: string;
  role: string;
  box: Box3;
}

/** A lid that swings up and back about a hinge line parallel to X. */
export interface LidOpening {
  /** The lid and what is fixed to it (battens), mm in the piece's frame, closed. */
  parts: readonly EnvelopePart[];
  /** Hinge line: Y and Z of the axis, mm. */
  hingeYMm: number;
  hingeZMm: number;
  /** How far it opens to its stop, degrees from closed. */
  openAngleDeg: number;
}

/** A door that swings out about a vertical hinge line at its front face. */
export interface DoorOpening {
  id: string;
  parts: readonly EnvelopePart[];
  /** Hinge side as you face the piece. */
  hinge: 'left' | 'right';
  /** Hinge line: X and Y of the vertical axis, mm. */
  hingeXMm: number;
  hingeYMm: number;
  /** Degrees from closed; room fit checks doors at 90°. */
  openAngleDeg: number;
}

/** A drawer that slides straight out toward −Y. */
export interface DrawerOpening {
  id: string;
  parts: readonly EnvelopePart[];
  /** How far it travels at full extension, mm. */
  travelMm: number;
}

/** A group of parts carried on its own when the piece is taken apart for a doorway. */
export interface Subassembly {
  id: string;
  label: string;
  partIds: readonly string[];
  /** World box of the group, mm. */
  box: Box3;
}

/** A piece as room fit sees it. Lengths in mm, in the engine's piece frame. */
export interface PieceEnvelope {
  kind: PieceKind;
  /** The closed piece's box. */
  box: Box3;
  parts: readonly EnvelopePart[];
  lid: LidOpening | null;
  doors: readonly DoorOpening[];
  drawers: readonly DrawerOpening[];
  /** The pieces it comes apart into for carrying, largest first; one entry when it does not. */
  subassemblies: readonly Subassembly[];
  /** What was assumed because the design does not say it, in words. */
  assumptions: readonly string[];
}

/** Reads the envelope of an engine result. */
export function envelopeFromResult(result: PieceResult): PieceEnvelope {
  const parts = placedParts(result);
  assert(parts.length > 0, 'a piece result has at least one placed part');
  const byInstance = new Map(parts.map((p) => [instanceKey(p.partId, p.instance), p]));
  // In placement order, as the case's own parts are.
  const order = new Map(parts.map((p, i) => [p, i]));
  const partsOf = (refs: readonly PartInstanceRef[]): EnvelopePart[] => refs.map((ref) => {
    const part = byInstance.get(instanceKey(ref.partId, ref.instance));
    assert(part !== undefined, `an opening names a placed part instance (${ref.partId} #${ref.instance})`);
    return part;
  }).sort((a, b) => order.get(a)! - order.get(b)!);
  const opening = new Set(result.openings.flatMap((o) => o.parts.map((ref) => instanceKey(ref.partId, ref.instance))));
  const caseParts = parts.filter((p) => !opening.has(instanceKey(p.partId, p.instance)));
  const box = boxUnion(parts.map((p) => p.box));
  const assumptions: string[] = [];

  let lid: LidOpening | null = null;
  for (const o of result.openings) {
    if (o.kind !== 'lid') continue;
    lid = { parts: partsOf(o.parts), hingeYMm: o.hingeAxis.origin[1], hingeZMm: o.hingeAxis.origin[2], openAngleDeg: o.openAngleDeg };
    if (o.openAngleDeg === LID_OPEN_ANGLE_DEG) {
      assumptions.push(`lid opening angle not given; ${LID_OPEN_ANGLE_DEG}° assumed (common practice, no published source)`);
    }
  }

  const doors: DoorOpening[] = result.openings
    .flatMap((o) => (o.kind === 'door' ? [{ o, leaf: partsOf(o.parts) }] : []))
    .map((d) => ({ ...d, box: boxUnion(d.leaf.map((p) => p.box)) }))
    .sort((a, b) => a.box.min[0] - b.box.min[0] || b.box.max[2] - a.box.max[2])
    .map(({ o, leaf }, i) => ({ id: `door-${i + 1}`, parts: leaf, hinge: o.side, hingeXMm: o.hingeAxis.origin[0], hingeYMm: o.hingeAxis.origin[1], openAngleDeg: o.swingDeg }));
  const drawers: DrawerOpening[] = result.openings
    .flatMap((o) => (o.kind === 'drawer' ? [{ o, drawer: partsOf(o.parts) }] : []))
    .map((d) => ({ ...d, box: boxUnion(d.drawer.map((p) => p.box)) }))
    .sort((a, b) => b.box.max[2] - a.box.max[2] || a.box.min[0] - b.box.min[0])
    .map(({ o, drawer }, i) => ({ id: `drawer-${i + 1}`, parts: drawer, travelMm: o.travelMm }));

  const subassemblies: Subassembly[] = [];
  const removable = result.openings.length > 0 && caseParts.length > 0;
  if (removable) {
    subassemblies.push(group('case', lid ? 'case without the lid' : 'case without its doors and drawers', caseParts));
    if (lid) subassemblies.push(group('lid', 'lid', lid.parts));
    for (const door of doors) subassemblies.push(group(door.id, door.id.replace('-', ' '), door.parts));
    for (const drawer of drawers) subassemblies.push(group(drawer.id, drawer.id.replace('-', ' '), drawer.parts));
    subassemblies.sort((a, b) => boxVolume(b.box) - boxVolume(a.box));
  } else {
    subassemblies.push(group('whole', 'whole piece', parts));
  }

  return { kind: result.kind, box, parts, lid, doors, drawers, subassemblies, assumptions };
}

const instanceKey = (partId: string, instance: number): string => `${partId}#${instance}`;

function placedParts(result: PieceResult): EnvelopePart[] {
  const byId = new Map(result.parts.map((p) => [p.id, p]));
  return result.placements.map((placement) => {
    const part = byId.get(placement.partId);
    assert(part !== undefined, `placement ${placement.label} names a part that exists (${placement.partId})`);
    const size = worldSize(placement.axes, [part.lengthMm, part.widthMm, part.thicknessMm]);
    return { partId: part.id, instance: placement.instance, label: placement.label, role: part.role, box: boxAt(placement.positionMm, size) };
  });
}

function group(id: string, label: string, parts: readonly EnvelopePart[]): Subassembly {
  return { id, label, partIds: [...new Set(parts.map((p) => p.partId))], box: boxUnion(parts.map((p) => p.box)) };
}

