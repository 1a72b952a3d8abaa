import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { revisionInfoSchema } from '../../shared/schemas/designs.ts';
import { fetchParsed } from './fetchJson.ts';

const revisionList = z.object({ revisions: z.array(revisionInfoSchema) });

/** The history of a design, newest first. */
export function useRevisions(designId: string | undefined) {
  return useQuery({
    queryKey: ['revisions', designId],
    enabled: Boolean(designId),
    queryFn: async () => {
      const { revisions } = await fetchParsed(revisionList, `/api/designs/${designId}/revisions`);
      return [...revisions].sort((a, b) => b.number - a.number);
    },
  });
}
