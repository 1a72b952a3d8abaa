/**
 * One-time tokens for e-mailed links (password reset, invitations): 32 random bytes in
 * base64url go to the person; only their SHA-256 is stored, so a leaked table opens nothing.
 */
import { createHash, randomBytes } from 'node:crypto';

export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
