import { useMutation, useQueryClient } from '@tanstack/react-query';
import { clientRevision } from './pieceSpec.ts';
import { fetchParsed, jsonBody } from './fetchJson.ts';
import { designKey } from './useDesign.ts';

/** Makes an older revision the head again, as a new revision that says where it came from. */
export function useRestoreRevision(designId: string | undefined) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { revision: number; baseRevision: number; message?: string }) =>
      fetchParsed(clientRevision, `/api/designs/${designId}/restore`, jsonBody('POST', body)),
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
