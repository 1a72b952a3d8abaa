import { useMutation, useQueryClient } from '@tanstack/react-query';
import { approvalSchema } from '../../shared/schemas/comments.ts';
import { fetchParsed, jsonBody } from './fetchJson.ts';
import { designKey } from './useDesign.ts';

/** A reviewer approves a revision or asks for changes. */
export function useDecideApproval(designId: string | undefined) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { revision: number; decision: 'approved' | 'changes_requested'; note?: string }) =>
      fetchParsed(approvalSchema, `/api/designs/${designId}/approvals`, jsonBody('POST', body)),
    onSuccess: async () => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: ['approvals', designId] }),
        queryClient.invalidateQueries({ queryKey: designKey(designId) }),
        queryClient.invalidateQueries({ queryKey: ['designs', 'list'] }),
      ]);
    },
  });
}
