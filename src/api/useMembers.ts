import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { memberSchema } from '../../shared/schemas/workshops.ts';
import { fetchParsed } from './fetchJson.ts';

const memberList = z.object({ members: z.array(memberSchema) });

/** The people of a workshop with their roles (for the author filter). */
export function useMembers(workshopId: string | undefined) {
  return useQuery({
    queryKey: ['members', workshopId],
    enabled: Boolean(workshopId),
    queryFn: async () => (await fetchParsed(memberList, `/api/workshops/${workshopId}/members`)).members,
  });
}
