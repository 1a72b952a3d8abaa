import { useMutation } from '@tanstack/react-query';
import { fetchJson, jsonBody } from './fetchJson.ts';

/** Sets a new password with the token from the reset e-mail. */
export function usePasswordResetConfirm() {
  return useMutation({
    mutationFn: (body: { token: string; password: string }) => fetchJson<void>('/api/auth/password-reset/confirm', jsonBody('POST', body)),
  });
}
