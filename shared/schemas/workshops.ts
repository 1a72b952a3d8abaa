/** Workshops, their members and invitations. */
import { z } from 'zod';
import { emailSchema, idSchema, nameSchema, personSchema, roleSchema, timestampSchema } from './common.ts';

export const workshopCreateBody = z.strictObject({ name: nameSchema });
export const workshopUpdateBody = z.strictObject({ name: nameSchema });

export const workshopSchema = z.object({
  id: idSchema,
  name: z.string(),
  role: roleSchema,
  memberCount: z.number().int(),
  designCount: z.number().int(),
  createdAt: timestampSchema,
});
export type Workshop = z.infer<typeof workshopSchema>;

export const memberSchema = personSchema.extend({ role: roleSchema, joinedAt: timestampSchema });
export type Member = z.infer<typeof memberSchema>;

export const memberUpdateBody = z.strictObject({ role: roleSchema });

export const invitationCreateBody = z.strictObject({ email: emailSchema, role: roleSchema });

export const invitationSchema = z.object({
  id: idSchema,
  email: z.string(),
  role: roleSchema,
  invitedBy: personSchema.nullable(),
  expiresAt: timestampSchema,
  acceptedAt: timestampSchema.nullable(),
  createdAt: timestampSchema,
});
export type Invitation = z.infer<typeof invitationSchema>;

/** What the person holding an invitation link sees before accepting it. */
export const invitationPreviewSchema = z.object({
  workshopName: z.string(),
  email: z.string(),
  role: roleSchema,
  invitedBy: z.string().nullable(),
  expiresAt: timestampSchema,
  state: z.enum(['open', 'accepted', 'expired']),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

export const workshopIdParams = z.object({ workshopId: idSchema });
export const memberParams = z.object({ workshopId: idSchema, userId: idSchema });
export const invitationParams = z.object({ workshopId: idSchema, invitationId: idSchema });
