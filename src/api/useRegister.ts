import { useMutation, useQueryClient } from '@tanstack/react-query';
import { meResponse, type RegisterBody } from '../../shared/schemas/auth.ts';
import { rememberCsrfToken } from './csrf.ts';
import { fetchParsed, jsonBody } from './fetchJson.ts';
import { ME_KEY } from './useMe.ts';

/** Creates an account and signs it in. */
export function useRegister() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: RegisterBody) => fetchParsed(meResponse, '/api/auth/register', jsonBody('POST', body)),
    onSuccess: (me) => {
      if (me.csrfToken) rememberCsrfToken(me.csrfToken);
      queryClient.clear();
      queryClient.setQueryData(ME_KEY, me);
    },
  });
}
