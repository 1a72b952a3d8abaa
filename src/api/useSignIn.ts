import { useMutation, useQueryClient } from '@tanstack/react-query';
import { meResponse, type LoginBody } from '../../shared/schemas/auth.ts';
import { rememberCsrfToken } from './csrf.ts';
import { fetchParsed, jsonBody } from './fetchJson.ts';
import { ME_KEY } from './useMe.ts';

/** Signs in with e-mail and password; the session (and its CSRF token) are new afterwards. */
export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: LoginBody) => fetchParsed(meResponse, '/api/auth/login', jsonBody('POST', body)),
    onSuccess: (me) => {
      if (me.csrfToken) rememberCsrfToken(me.csrfToken);
      queryClient.clear();
      queryClient.setQueryData(ME_KEY, me);
    },
  });
}
