/**
 * Fit to the niche: the largest width, depth and height for the piece that pass every room
 * check where it stands. The free sizes are scaled together (keeping the piece's proportions)
 * to the largest scale that passes, found by halving; pinned sizes stay as they are. Asked not
 * to keep proportions, each free size then grows on its own as far as it can.
 *
 * A check that fails only for want of input (a room with no door entered) does not stop a size.
 *
 * Halving assumes a piece that passes also passes a little smaller, which holds for every room
 * check (a smaller box, a shorter lid, a shorter drawer reach less far). The answer is checked
 * again at whole millimetres before it is returned, so it always passes.
 */
import type { PieceResult, PieceSpec } from '../engine/types.ts';
import { InputError, isInputError } from '../errors.ts';
import { fitRoom, type RoomFit } from './fitRoom.ts';
import { envelopeFromResult } from './pieceEnvelope.ts';
import { roomSpanOffWallMm, wallLengthMm } from './roomFrame.ts';
import type { RoomSection } from './roomSchema.ts';

/** The sizes fit to niche may change: spec parameters, mm. */
export const SIZE_KEYS = ['width', 'depth', 'height'] as const;
export type SizeKey = (typeof SIZE_KEYS)[number];

/** Builds a piece from a spec: the engine, passed in so room fit stays independent of it. */
export type PieceBuilder = (spec: PieceSpec) => PieceResult;

/** Options for {@link fitToNiche}. */
export interface FitToNicheOptions {
  /** Sizes the maker has fixed. Default none. */
  pinned?: readonly SizeKey[];
  /** Scale the free sizes together. Default true; false grows each on its own afterwards. */
  keepProportions?: boolean;
}

/** One size changed, mm. */
export interface SizeChange {
  key: SizeKey;
  fromMm: number;
  toMm: number;
}

/** The answer: new parameters to apply as a revision, or why there are none. */
export interface NicheFit {
  found: boolean;
  /** The spec's parameters with the new sizes (whole mm); the original ones when not found. */
  params: Readonly<Record<string, unknown>>;
  changes: readonly SizeChange[];
  /** The room fit at the new size (or at the original size when not found). */
  fit: RoomFit;
  message: string;
}

/** Smallest scale tried before giving up. */
const MIN_SCALE = 0.05;
/** Scale step down while looking for any size that passes. */
const SHRINK = 0.85;

/** Finds the largest passing size for `spec` in `room`; see the module comment. */
export function fitToNiche(spec: PieceSpec, room: RoomSection, build: PieceBuilder, options: FitToNicheOptions = {}): NicheFit {
  const pinned = new Set(options.pinned ?? []);
  const free = SIZE_KEYS.filter((k) => !pinned.has(k));
  if (free.length === 0) throw new InputError('pinned', 'pins width, depth and height, so there is nothing to fit', 'at most two of width, depth and height');

  const baseResult = build(spec);
  const base = sizesOf(baseResult);
  const tryFit = (sizes: Record<SizeKey, number>): RoomFit | null => {
    try {
      const fit = fitRoom(room, envelopeFromResult(build(withSizes(spec, sizes))));
      return sizePasses(fit) ? fit : null;
    } catch (error) {
      if (isInputError(error)) return null; // outside the engine's limits: not a size it can build
      throw error;
    }
  };
  const scaled = (s: number): Record<SizeKey, number> => ({ ...base, ...Object.fromEntries(free.map((k) => [k, base[k] * s])) });

  const limit = limitsOf(room);
  const maxScale = Math.min(...free.map((k) => limit[k] / base[k]));
  let lo: number | null = null;
  let hi = maxScale;
  if (tryFit(scaled(maxScale))) lo = maxScale;
  else {
    for (let s = Math.min(1, maxScale); s >= MIN_SCALE; s *= SHRINK) {
      if (tryFit(scaled(s))) { lo = s; break; }
      hi = s;
    }
  }
  if (lo === null) {
    return {
      found: false, params: spec.params, changes: [], fit: fitRoom(room, envelopeFromResult(baseResult)),
      message: `No size down to ${MIN_SCALE * 100}% of ${free.join(', ')}${pinned.size ? ` with ${[...pinned].join(', ')} pinned` : ''} passes every check here.`,
    };
  }
  const spread = Math.max(...free.map((k) => base[k]));
  let passing: number = lo;
  while ((hi - passing) * spread > 0.5) {
    const mid = (passing + hi) / 2;
    if (tryFit(scaled(mid))) passing = mid;
    else hi = mid;
  }
  let sizes = scaled(passing);

  if (options.keepProportions === false) {
    for (const key of free) sizes = grow(sizes, key, limit[key], tryFit);
  }
  const whole = wholeMm(sizes, free, tryFit) ?? sizes;
  const fit = tryFit(whole)!;
  const changes = free.map((key) => ({ key, fromMm: base[key], toMm: whole[key] })).filter((c) => c.fromMm !== c.toMm);
  return {
    found: true,
    params: withSizes(spec, whole).params,
    changes,
    fit,
    message: changes.length === 0
      ? 'The piece already passes every check; it cannot grow in its niche.'
      : `Passes every check at ${changes.map((c) => `${c.key} ${c.toMm} mm (was ${round(c.fromMm)} mm)`).join(', ')}.`,
  };
}

/** Every check passed, or failed only for want of input that no size can supply. */
function sizePasses(fit: RoomFit): boolean {
  return fit.checks.every((c) => c.passed || c.needsInput === true);
}

function sizesOf(result: PieceResult): Record<SizeKey, number> {
  const out = {} as Record<SizeKey, number>;
  for (const key of SIZE_KEYS) {
    const value = result.spec.params[key];
    if (typeof value !== 'number' || !(value > 0)) {
      throw new InputError(`params.${key}`, `is needed to fit a ${result.kind} to its niche`, 'a length above 0 mm');
    }
    out[key] = value;
  }
  return out;
}

function withSizes(spec: PieceSpec, sizes: Record<SizeKey, number>): PieceSpec {
  return { ...spec, params: { ...spec.params, ...sizes } };
}

/** The most each size could be in this room: the wall's length, the room's depth off it, the ceiling. */
function limitsOf(room: RoomSection): Record<SizeKey, number> {
  return { width: wallLengthMm(room, room.placement.wall), depth: roomSpanOffWallMm(room, room.placement.wall), height: room.ceiling };
}

function grow(sizes: Record<SizeKey, number>, key: SizeKey, max: number, passes: (s: Record<SizeKey, number>) => RoomFit | null): Record<SizeKey, number> {
  if (passes({ ...sizes, [key]: max })) return { ...sizes, [key]: max };
  let lo = sizes[key];
  let hi = max;
  while (hi - lo > 0.5) {
    const mid = (lo + hi) / 2;
    if (passes({ ...sizes, [key]: mid })) lo = mid;
    else hi = mid;
  }
  return { ...sizes, [key]: lo };
}

/** The sizes at whole mm: the millimetre above first (halving stops short of the edge), then down a millimetre at a time until they pass. */
function wholeMm(sizes: Record<SizeKey, number>, free: readonly SizeKey[], passes: (s: Record<SizeKey, number>) => RoomFit | null): Record<SizeKey, number> | null {
  for (let step = -1; step < 5; step++) {
    const candidate = { ...sizes, ...Object.fromEntries(free.map((k) => [k, Math.floor(sizes[k]) - step])) };
    if (passes(candidate)) return candidate;
  }
  return null;
}

const round = (n: number): number => Math.round(n * 10) / 10;
