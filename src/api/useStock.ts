import { useQuery } from '@tanstack/react-query';
import { stockResponse } from '../../shared/schemas/stock.ts';
import { fetchParsed } from './fetchJson.ts';

/** The query key of a workshop's stock; saving replaces its data. */
export const stockKey = (workshopId: string | undefined) => ['stock', workshopId] as const;

/** A workshop's stock: sheets and boards for sale, offcuts and boards on hand, kerf and trim (every member may read it). */
export function useStock(workshopId: string | undefined) {
  return useQuery({
    queryKey: stockKey(workshopId),
    enabled: Boolean(workshopId),
    queryFn: () => fetchParsed(stockResponse, `/api/workshops/${workshopId}/stock`),
  });
}
