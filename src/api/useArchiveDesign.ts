import { useMutation, useQueryClient } from '@tanstack/react-query';
import { fetchJson, jsonBody } from './fetchJson.ts';
import { designKey } from './useDesign.ts';

/** Archives a design (hidden from the grid, kept with its history) or brings it back. */
export function useArchiveDesign(designId: string | undefined) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (archived: boolean) =>
      fetchJson<unknown>(`/api/designs/${designId}/${archived ? 'archive' : 'unarchive'}`, jsonBody('POST')),
    onSuccess: async () => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: designKey(designId) }),
        queryClient.invalidateQueries({ queryKey: ['designs', 'list'] }),
      ]);
    },
  });
}
