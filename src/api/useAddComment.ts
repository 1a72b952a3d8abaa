import { useMutation, useQueryClient } from '@tanstack/react-query';
import { commentSchema } from '../../shared/schemas/comments.ts';
import { fetchParsed, jsonBody } from './fetchJson.ts';

/** Adds a comment to a design, optionally on a revision and a part. */
export function useAddComment(designId: string | undefined) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { body: string; revision?: number; partId?: string }) =>
      fetchParsed(commentSchema, `/api/designs/${designId}/comments`, jsonBody('POST', body)),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['comments', designId] }),
  });
}
