/** Sign-in, registration and password reset: request bodies and the `me` answer. */
import { z } from 'zod';
import { emailSchema, idSchema, nameSchema, passwordSchema, roleSchema } from './common.ts';

export const registerBody = z.strictObject({ email: emailSchema, name: nameSchema, password: passwordSchema });
export type RegisterBody = z.infer<typeof registerBody>;

// Sign-in checks the password against the hash, never its shape, so only a length cap here.
export const loginBody = z.strictObject({
  email: emailSchema,
  password: z.string().min(1, { message: 'must not be empty' }).max(200, { message: 'must be at most 200 characters' }),
});
export type LoginBody = z.infer<typeof loginBody>;

export const passwordResetRequestBody = z.strictObject({ email: emailSchema });

/** Reset tokens are 32 random bytes in base64url: 43 characters. */
export const tokenSchema = z.string().regex(/^[A-Za-z0-9_-]{43}$/, { message: 'must be the token from the e-mail' });

export const passwordResetConfirmBody = z.strictObject({ token: tokenSchema, password: passwordSchema });

export const userSchema = z.object({ id: idSchema, email: z.string(), name: z.string() });
export type User = z.infer<typeof userSchema>;

/** The signed-in user and the workshops they belong to, with their role in each. */
export const meResponse = z.object({
  user: userSchema,
  workshops: z.array(z.object({ id: idSchema, name: z.string(), role: roleSchema })),
  csrfToken: z.string().optional(),
});
export type MeResponse = z.infer<typeof meResponse>;

/** `GET /api/auth/csrf`: the token to send back in the `x-csrf-token` header. */
export const csrfResponse = z.object({ csrfToken: z.string() });
