import { useMutation, useQueryClient } from '@tanstack/react-query';
import { clientRevision, clientStaleSave, type ClientRevision } from './pieceSpec.ts';
import type { PieceSpec } from '../../shared/engine/types.ts';
import { fetchParsed, isApiError, jsonBody } from './fetchJson.ts';
import { designKey } from './useDesign.ts';

/** Someone saved a newer revision since this edit began: the head it must be weighed against. */
export class StaleSaveError extends Error {
  override readonly name = 'StaleSaveError';
  constructor(readonly head: ClientRevision) {
    super(`Someone saved a newer revision (revision ${head.number}) while you were editing.`);
  }
}

/** Saves the edited spec as a new revision on top of `baseRevision`; a moved head is a {@link StaleSaveError}. */
export function useSaveRevision(designId: string | undefined) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: { baseRevision: number; spec: PieceSpec; message: string }) => {
      try {
        return await fetchParsed(clientRevision, `/api/designs/${designId}/revisions`, jsonBody('POST', body));
      } catch (error) {
        if (isApiError(error, 409)) {
          const details = clientStaleSave.safeParse(error.details);
          if (details.success) throw new StaleSaveError(details.data.head);
        }
        throw error;
      }
    },
    onSuccess: async (revision) => {
      queryClient.setQueryData(['revisions', designId, revision.number], revision);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: designKey(designId) }),
        queryClient.invalidateQueries({ queryKey: ['revisions', designId], exact: true }),
        queryClient.invalidateQueries({ queryKey: ['designs', 'list'] }),
      ]);
    },
  });
}
