import { useQuery } from '@tanstack/react-query';
import { clientDesignDetail } from './pieceSpec.ts';
import { fetchParsed } from './fetchJson.ts';

/** The query key of one design; saving, restoring and approving refresh it. */
export const designKey = (designId: string | undefined) => ['designs', 'detail', designId] as const;

/** One design with its head revision's spec and its forks. */
export function useDesign(designId: string | undefined) {
  return useQuery({
    queryKey: designKey(designId),
    enabled: Boolean(designId),
    queryFn: () => fetchParsed(clientDesignDetail, `/api/designs/${designId}`),
  });
}
