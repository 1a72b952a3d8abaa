/** Small zod pieces shared by every request and response schema. */
import { z } from 'zod';
import { ROLES } from '../permissions.ts';

/**
 * Text people type. PostgreSQL cannot store the NUL character, so it is refused here with a
 * 400 instead of failing in the database.
 */
export const textSchema = z.string().refine((text) => !text.includes('\u0000'), { message: 'must not contain NUL characters' });

/** Database ids are UUIDs. */
export const idSchema = z.uuid({ message: 'must be an id (UUID)' });

/** E-mail addresses are compared case-insensitively, so they are stored lower-cased. */
export const emailSchema = z
  .email({ message: 'must be an e-mail address' })
  .max(254, { message: 'must be at most 254 characters' })
  .transform((email) => email.toLowerCase());

/** Long enough to resist guessing; the upper bound keeps the hash's input sane. */
export const passwordSchema = z
  .string()
  .min(10, { message: 'must be at least 10 characters' })
  .max(200, { message: 'must be at most 200 characters' });

/** A person's or a workshop's display name. */
export const nameSchema = textSchema
  .trim()
  .min(1, { message: 'must not be empty' })
  .max(120, { message: 'must be at most 120 characters' });

export const roleSchema = z.enum(ROLES);

/** Revision numbers start at 1 and have no gaps; query strings arrive as text. */
export const revisionNumberSchema = z.coerce
  .number({ message: 'must be a whole number' })
  .int({ message: 'must be a whole number' })
  .min(1, { message: 'must be at least 1' })
  .max(2_147_483_647, { message: 'must be at most 2147483647' });

/** Timestamps travel as ISO 8601 strings. */
export const timestampSchema = z.string();

/** A user as other members see them. */
export const personSchema = z.object({ id: idSchema, name: z.string(), email: z.string() });
export type Person = z.infer<typeof personSchema>;
