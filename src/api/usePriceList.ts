import { useQuery } from '@tanstack/react-query';
import { priceListResponse } from '../../shared/schemas/priceLists.ts';
import { fetchParsed } from './fetchJson.ts';

/** The query key of a workshop's price list; saving or uploading replaces its data. */
export const priceListKey = (workshopId: string | undefined) => ['priceList', workshopId] as const;

/** A workshop's price list (every member may read it). */
export function usePriceList(workshopId: string | undefined) {
  return useQuery({
    queryKey: priceListKey(workshopId),
    enabled: Boolean(workshopId),
    queryFn: () => fetchParsed(priceListResponse, `/api/workshops/${workshopId}/price-list`),
  });
}
