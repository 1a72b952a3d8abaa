import { useMutation, useQueryClient } from '@tanstack/react-query';
import { clientDesignDetail, clientRevision } from './pieceSpec.ts';
import type { PieceSpec } from '../../shared/engine/types.ts';
import { fetchParsed, jsonBody } from './fetchJson.ts';

/**
 * "Fork mine" after a save conflict: fork the design at the revision the edit started from,
 * then save the edited spec as the fork's next revision, so nothing typed is lost and nobody's
 * revision is overwritten.
 */
export function useForkWithSpec(designId: string | undefined) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: { workshopId: string; title: string; fromRevision: number; spec: PieceSpec; message: string }) => {
      const fork = await fetchParsed(clientDesignDetail, `/api/designs/${designId}/fork`, jsonBody('POST', { workshopId: input.workshopId, title: input.title, revision: input.fromRevision }));
      await fetchParsed(clientRevision, `/api/designs/${fork.id}/revisions`, jsonBody('POST', { baseRevision: fork.head.number, spec: input.spec, message: input.message }));
      return fork;
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['designs'] }),
  });
}
