import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { workshopSchema } from '../../shared/schemas/workshops.ts';
import { fetchParsed } from './fetchJson.ts';

const workshopList = z.object({ workshops: z.array(workshopSchema) });

/** The workshops the signed-in user belongs to, with their role and counts. */
export function useWorkshops() {
  return useQuery({
    queryKey: ['workshops'],
    queryFn: async () => (await fetchParsed(workshopList, '/api/workshops')).workshops,
  });
}
