import { useMutation, useQueryClient } from '@tanstack/react-query';
import { clientDesignDetail } from './pieceSpec.ts';
import { fetchParsed, jsonBody } from './fetchJson.ts';
import { designKey } from './useDesign.ts';

/** Starts a variation of a design (at a revision, or its head) in a workshop, leaving the original alone. */
export function useForkDesign(designId: string | undefined) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { workshopId: string; title?: string; revision?: number }) =>
      fetchParsed(clientDesignDetail, `/api/designs/${designId}/fork`, jsonBody('POST', body)),
    onSuccess: async () => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: designKey(designId) }),
        queryClient.invalidateQueries({ queryKey: ['designs', 'list'] }),
      ]);
    },
  });
}
