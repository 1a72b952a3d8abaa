import { useQuery } from '@tanstack/react-query';
import { compareResponse } from '../../shared/schemas/designs.ts';
import { fetchParsed } from './fetchJson.ts';

/** The server's comparison of two revisions: changed parameters and the engine's part changes. */
export function useCompare(designId: string | undefined, from: number | null, to: number | null) {
  return useQuery({
    queryKey: ['compare', designId, from, to],
    enabled: Boolean(designId) && from !== null && to !== null,
    staleTime: Infinity,
    queryFn: () => fetchParsed(compareResponse, `/api/designs/${designId}/compare?from=${from}&to=${to}`),
  });
}
