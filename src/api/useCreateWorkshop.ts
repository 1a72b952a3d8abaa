import { useMutation, useQueryClient } from '@tanstack/react-query';
import { workshopSchema } from '../../shared/schemas/workshops.ts';
import { fetchParsed, jsonBody } from './fetchJson.ts';

/** Starts a workshop owned by the signed-in user. */
export function useCreateWorkshop() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (name: string) => fetchParsed(workshopSchema, '/api/workshops', jsonBody('POST', { name })),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: ['workshops'] });
      await queryClient.invalidateQueries({ queryKey: ['me'] });
    },
  });
}
