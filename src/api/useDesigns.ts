import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { PIECE_KINDS } from '../../shared/schemas/designs.ts';
import { clientDesignList } from './pieceSpec.ts';
import { fetchParsed } from './fetchJson.ts';

/** The filters a workshop's design grid offers. */
export interface DesignFilters {
  q?: string;
  kind?: (typeof PIECE_KINDS)[number];
  authorId?: string;
  archived?: 'true' | 'false' | 'all';
}

/** A workshop's designs as cards, filtered on the server; each card carries its head spec for the drawing. */
export function useDesigns(workshopId: string | undefined, filters: DesignFilters) {
  return useQuery({
    queryKey: ['designs', 'list', workshopId, filters],
    enabled: Boolean(workshopId),
    placeholderData: keepPreviousData,
    queryFn: () => {
      const query = new URLSearchParams();
      for (const [key, value] of Object.entries(filters)) if (value) query.set(key, value);
      return fetchParsed(clientDesignList, `/api/workshops/${workshopId}/designs?${query}`);
    },
  });
}
