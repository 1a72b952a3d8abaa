/**
 * Designs and their revisions. A spec's top level is checked here; its parameters are the
 * engine's business (`validateSpec` names the parameter and its limit).
 */
import { z } from 'zod';
import { idSchema, personSchema, revisionNumberSchema, textSchema, timestampSchema } from './common.ts';

export const PIECE_KINDS = ['chest', 'dresser', 'cabinet'] as const;
export const pieceKindSchema = z.enum(PIECE_KINDS);

/** True when a NUL character appears in any string or key inside `value`. */
function hasNul(value: unknown): boolean {
  if (typeof value === 'string') return value.includes('\u0000');
  if (Array.isArray(value)) return value.some(hasNul);
  if (value && typeof value === 'object') return Object.entries(value).some(([k, v]) => k.includes('\u0000') || hasNul(v));
  return false;
}

export const pieceSpecSchema = z
  .strictObject({
    schemaVersion: z.literal(1, { message: 'must be 1' }),
    kind: pieceKindSchema,
    params: z.record(z.string().max(100), z.unknown()),
    climate: z.unknown().optional(),
    room: z.unknown().optional(),
  })
  // Stored as JSONB, which cannot hold a NUL character anywhere.
  .refine((spec) => !hasNul(spec), { message: 'must not contain NUL characters' });

export const titleSchema = textSchema
  .trim()
  .min(1, { message: 'must not be empty' })
  .max(200, { message: 'must be at most 200 characters' });

/** What a revision says about itself, like a commit message. */
export const messageSchema = textSchema.trim().max(1000, { message: 'must be at most 1000 characters' });

export const designCreateBody = z.strictObject({
  title: titleSchema,
  spec: pieceSpecSchema,
  message: messageSchema.default('First revision'),
});

export const designUpdateBody = z.strictObject({ title: titleSchema });

/** Saving: the spec and the head it was edited from; a moved head is a 409. */
export const revisionCreateBody = z.strictObject({
  baseRevision: revisionNumberSchema,
  spec: pieceSpecSchema,
  message: messageSchema.default(''),
});

export const restoreBody = z.strictObject({
  revision: revisionNumberSchema,
  baseRevision: revisionNumberSchema,
  message: messageSchema.optional(),
});

export const forkBody = z.strictObject({
  workshopId: idSchema,
  title: titleSchema.optional(),
  /** The revision to fork from; the head when absent. */
  revision: revisionNumberSchema.optional(),
});

const booleanText = z.enum(['true', 'false', 'all'], { message: 'must be true, false or all' });

export const designListQuery = z.strictObject({
  kind: pieceKindSchema.optional(),
  /** Words to find in the title. */
  q: textSchema.trim().max(200, { message: 'must be at most 200 characters' }).optional(),
  /** Designs whose head revision this user saved. */
  authorId: idSchema.optional(),
  updatedAfter: z.coerce.date({ message: 'must be a date' }).optional(),
  updatedBefore: z.coerce.date({ message: 'must be a date' }).optional(),
  archived: booleanText.default('false'),
  limit: z.coerce.number().int().min(1, { message: 'must be at least 1' }).max(200, { message: 'must be at most 200' }).default(50),
  offset: z.coerce.number().int().min(0, { message: 'must be at least 0' }).max(100_000).default(0),
});
export type DesignListQuery = z.infer<typeof designListQuery>;

export const compareQuery = z.strictObject({ from: revisionNumberSchema, to: revisionNumberSchema });

export const designParams = z.object({ designId: idSchema });
export const revisionParams = z.object({ designId: idSchema, number: revisionNumberSchema });

/** The engine's short summary of a revision (size, part count, board feet, check counts). */
export const revisionSummarySchema = z.record(z.string(), z.unknown());

export const revisionInfoSchema = z.object({
  number: z.number().int(),
  author: personSchema.nullable(),
  message: z.string(),
  engineVersion: z.string(),
  summary: revisionSummarySchema,
  /** Set when this revision restored an older one. */
  restoredFrom: z.number().int().nullable(),
  createdAt: timestampSchema,
});
export type RevisionInfo = z.infer<typeof revisionInfoSchema>;

export const revisionSchema = revisionInfoSchema.extend({ designId: idSchema, spec: pieceSpecSchema });
export type Revision = z.infer<typeof revisionSchema>;

export const APPROVAL_DECISIONS = ['approved', 'changes_requested'] as const;
export const approvalDecisionSchema = z.enum(APPROVAL_DECISIONS);

/**
 * Where a design stands with its reviewers: `approved` (the head is approved),
 * `approved-earlier` (an older revision is), `changes-requested` (the latest word on the head
 * asks for changes) or `pending`.
 */
export const approvalStateSchema = z.object({
  state: z.enum(['approved', 'approved-earlier', 'changes-requested', 'pending']),
  approvedRevision: z.number().int().nullable(),
  latest: z
    .object({ revision: z.number().int(), decision: approvalDecisionSchema, reviewer: personSchema.nullable(), at: timestampSchema })
    .nullable(),
});
export type ApprovalState = z.infer<typeof approvalStateSchema>;

/** The revision a fork started from; the title is null when the viewer cannot see that workshop. */
export const forkOriginSchema = z.object({
  designId: idSchema,
  revisionNumber: z.number().int(),
  title: z.string().nullable(),
  workshopId: idSchema.nullable(),
});

/** One design in a listing: what a card shows. */
export const designCardSchema = z.object({
  id: idSchema,
  workshopId: idSchema,
  title: z.string(),
  kind: pieceKindSchema,
  archived: z.boolean(),
  createdAt: timestampSchema,
  updatedAt: timestampSchema,
  head: revisionInfoSchema,
  approval: approvalStateSchema,
  origin: forkOriginSchema.nullable(),
  forkCount: z.number().int(),
});
export type DesignCard = z.infer<typeof designCardSchema>;

/**
 * A card in a workshop's listing: the card with its head revision's spec, so the grid can draw
 * each piece's thumbnail from the listing alone instead of fetching every design's detail.
 */
export const designListItemSchema = designCardSchema.extend({ headSpec: pieceSpecSchema });
export type DesignListItem = z.infer<typeof designListItemSchema>;

export const designListResponse = z.object({ designs: z.array(designListItemSchema), total: z.number().int() });

/** A design with its head revision's spec and the forks made from it. */
export const designDetailSchema = designCardSchema.extend({
  headRevision: revisionSchema,
  forks: z.array(z.object({ id: idSchema, title: z.string(), workshopId: idSchema, workshopName: z.string(), fromRevision: z.number().int() })),
  /** Forks in workshops the viewer does not belong to, counted but not shown. */
  hiddenForkCount: z.number().int(),
});
export type DesignDetail = z.infer<typeof designDetailSchema>;

/** One parameter that differs between two revisions (absent on one side → `undefined`). */
export const paramChangeSchema = z.object({ key: z.string(), from: z.unknown(), to: z.unknown() });

export const compareResponse = z.object({
  from: revisionInfoSchema,
  to: revisionInfoSchema,
  params: z.array(paramChangeSchema),
  /** The engine's own comparison of the two built pieces (parts added, removed, resized). */
  parts: z.unknown(),
});
export type CompareResponse = z.infer<typeof compareResponse>;

/** 409 details when the head moved: the revision the save must be rebased on. */
export const staleSaveDetails = z.object({ head: revisionSchema });
