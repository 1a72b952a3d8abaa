import { useQuery } from '@tanstack/react-query';
import { meResponse, type MeResponse } from '../../shared/schemas/auth.ts';
import { fetchParsed, isApiError } from './fetchJson.ts';

/** The `me` query's key; sign-in and sign-out replace its data. */
export const ME_KEY = ['me'] as const;

/** The signed-in user and their workshops, or null when nobody is signed in. */
export function useMe() {
  return useQuery<MeResponse | null>({
    queryKey: ME_KEY,
    queryFn: async () => {
      try {
        return await fetchParsed(meResponse, '/api/auth/me');
      } catch (error) {
        if (isApiError(error, 401)) return null;
        throw error;
      }
    },
    retry: (count, error) => !isApiError(error) && count < 2,
  });
}
