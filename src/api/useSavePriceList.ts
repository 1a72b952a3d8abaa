import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PriceList } from '../../shared/materials/priceList.ts';
import { priceListResponse } from '../../shared/schemas/priceLists.ts';
import { fetchParsed, jsonBody } from './fetchJson.ts';
import { priceListKey } from './usePriceList.ts';

/** Replaces a workshop's whole price list (owners only). */
export function useSavePriceList(workshopId: string | undefined) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (priceList: PriceList) => fetchParsed(priceListResponse, `/api/workshops/${workshopId}/price-list`, jsonBody('PUT', priceList)),
    onSuccess: (saved) => queryClient.setQueryData(priceListKey(workshopId), saved),
  });
}
