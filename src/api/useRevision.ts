import { queryOptions, useQuery } from '@tanstack/react-query';
import { clientRevision } from './pieceSpec.ts';
import { fetchParsed } from './fetchJson.ts';

/** The query for one revision; revisions never change, so it is cached for good. */
export function revisionQuery(designId: string | undefined, revision: number | null | undefined) {
  return queryOptions({
    queryKey: ['revisions', designId, revision],
    enabled: Boolean(designId) && typeof revision === 'number',
    staleTime: Infinity,
    queryFn: () => fetchParsed(clientRevision, `/api/designs/${designId}/revisions/${revision}`),
  });
}

/** One revision of a design with its spec. */
export function useRevision(designId: string | undefined, revision: number | null | undefined) {
  return useQuery(revisionQuery(designId, revision));
}
