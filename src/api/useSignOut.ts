import { useMutation, useQueryClient } from '@tanstack/react-query';
import { forgetCsrfToken } from './csrf.ts';
import { fetchJson, jsonBody } from './fetchJson.ts';
import { ME_KEY } from './useMe.ts';

/** Signs out and forgets every cached answer of the old session. */
export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => fetchJson<void>('/api/auth/logout', jsonBody('POST')),
    onSuccess: () => {
      forgetCsrfToken();
      queryClient.clear();
      queryClient.setQueryData(ME_KEY, null);
    },
  });
}
