import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { approvalSchema } from '../../shared/schemas/comments.ts';
import { fetchParsed } from './fetchJson.ts';

const approvalList = z.object({ approvals: z.array(approvalSchema) });

/** Reviewers' decisions on a design's revisions, newest first. */
export function useApprovals(designId: string | undefined) {
  return useQuery({
    queryKey: ['approvals', designId],
    enabled: Boolean(designId),
    queryFn: async () => {
      const { approvals } = await fetchParsed(approvalList, `/api/designs/${designId}/approvals`);
      return [...approvals].sort((a, b) => b.createdAt.localeCompare(a.createdAt));
    },
  });
}
