/**
 * Revisions as the client uses them: the stored spec's top level is checked by the shared zod
 * schema, and its climate (kept loosely by the API) is read as a climate only when it is one,
 * so the editor and the engine get a typed `PieceSpec`. The parameters themselves are the
 * engine's to check (`validateSpec`), which the editor does before every build.
 */
import { designDetailSchema, designListResponse, revisionSchema, staleSaveDetails } from '../../shared/schemas/designs.ts';
import type { PieceSpec } from '../../shared/engine/types.ts';
import type { Climate } from '../../shared/wood/climate.ts';

type StoredSpec = { schemaVersion: 1; kind: PieceSpec['kind']; params: Record<string, unknown>; climate?: unknown; room?: unknown };

function isClimate(value: unknown): value is Climate {
  const c = value as Partial<Climate> | null;
  return typeof c === 'object' && c !== null && [c.buildMcPercent, c.lowMcPercent, c.highMcPercent].every((n) => typeof n === 'number');
}

/** A stored spec as the engine's `PieceSpec`; a climate that is not one is left for the default. */
export function toPieceSpec(stored: StoredSpec): PieceSpec {
  const spec: PieceSpec = { schemaVersion: 1, kind: stored.kind, params: stored.params };
  if (isClimate(stored.climate)) spec.climate = stored.climate;
  if (stored.room !== undefined) spec.room = stored.room;
  return spec;
}

/** A revision with a typed spec. */
export const clientRevision = revisionSchema.transform((r) => ({ ...r, spec: toPieceSpec(r.spec) }));
export type ClientRevision = ReturnType<typeof clientRevision.parse>;

/** A design's detail with its head revision's spec typed. */
export const clientDesignDetail = designDetailSchema.transform((d) => ({ ...d, headRevision: { ...d.headRevision, spec: toPieceSpec(d.headRevision.spec) } }));
export type ClientDesignDetail = ReturnType<typeof clientDesignDetail.parse>;

/** The 409 answer's head revision, typed. */
export const clientStaleSave = staleSaveDetails.transform((d) => ({ head: { ...d.head, spec: toPieceSpec(d.head.spec) } }));

/** A workshop's listing with each card's head spec typed (the grid draws its thumbnails from it). */
export const clientDesignList = designListResponse.transform((list) => ({
  ...list,
  designs: list.designs.map((card) => ({ ...card, headSpec: toPieceSpec(card.headSpec) })),
}));
export type ClientDesignListItem = ReturnType<typeof clientDesignList.parse>['designs'][number];
