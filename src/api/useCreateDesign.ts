import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { designCreateBody } from '../../shared/schemas/designs.ts';
import { clientDesignDetail } from './pieceSpec.ts';
import { fetchParsed, jsonBody } from './fetchJson.ts';

/** Creates a design in a workshop with its first revision. */
export function useCreateDesign(workshopId: string | undefined) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof designCreateBody>) =>
      fetchParsed(clientDesignDetail, `/api/workshops/${workshopId}/designs`, jsonBody('POST', body)),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['designs', 'list'] }),
  });
}
