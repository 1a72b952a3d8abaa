/** Comments on a design, optionally pinned to a revision and a part, and reviewers' decisions. */
import { z } from 'zod';
import { idSchema, personSchema, revisionNumberSchema, textSchema, timestampSchema } from './common.ts';
import { approvalDecisionSchema } from './designs.ts';

/** Part ids are the engine's readable ids, e.g. `front-top-rail`. */
export const partIdSchema = textSchema
  .trim()
  .min(1, { message: 'must not be empty' })
  .max(100, { message: 'must be at most 100 characters' });

export const commentCreateBody = z.strictObject({
  body: textSchema.trim().min(1, { message: 'must not be empty' }).max(5000, { message: 'must be at most 5000 characters' }),
  revision: revisionNumberSchema.optional(),
  partId: partIdSchema.optional(),
});

export const commentSchema = z.object({
  id: idSchema,
  designId: idSchema,
  revision: z.number().int().nullable(),
  partId: z.string().nullable(),
  author: personSchema.nullable(),
  body: z.string(),
  createdAt: timestampSchema,
});
export type Comment = z.infer<typeof commentSchema>;

export const commentListQuery = z.strictObject({
  revision: revisionNumberSchema.optional(),
  partId: partIdSchema.optional(),
});

export const approvalCreateBody = z.strictObject({
  revision: revisionNumberSchema,
  decision: approvalDecisionSchema,
  note: textSchema.trim().max(2000, { message: 'must be at most 2000 characters' }).default(''),
});

export const approvalSchema = z.object({
  id: idSchema,
  designId: idSchema,
  revision: z.number().int(),
  decision: approvalDecisionSchema,
  note: z.string(),
  reviewer: personSchema.nullable(),
  createdAt: timestampSchema,
});
export type Approval = z.infer<typeof approvalSchema>;
