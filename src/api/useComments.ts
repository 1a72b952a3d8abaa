import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { commentSchema } from '../../shared/schemas/comments.ts';
import { fetchParsed } from './fetchJson.ts';

const commentList = z.object({ comments: z.array(commentSchema) });

/** Every comment on a design, oldest first; the panel filters by revision and part. */
export function useComments(designId: string | undefined) {
  return useQuery({
    queryKey: ['comments', designId],
    enabled: Boolean(designId),
    queryFn: async () => (await fetchParsed(commentList, `/api/designs/${designId}/comments`)).comments,
  });
}
