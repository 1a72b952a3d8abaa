import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { fetchParsed, jsonBody } from './fetchJson.ts';

const accepted = z.object({ message: z.string() });

/** Asks for a reset link by e-mail; the answer is the same whether or not the account exists. */
export function usePasswordResetRequest() {
  return useMutation({
    mutationFn: (email: string) => fetchParsed(accepted, '/api/auth/password-reset', jsonBody('POST', { email })),
  });
}
