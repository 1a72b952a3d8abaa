import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { StockSettings } from '../../shared/materials/stockSettings.ts';
import { stockResponse } from '../../shared/schemas/stock.ts';
import { fetchParsed, jsonBody } from './fetchJson.ts';
import { stockKey } from './useStock.ts';

/** Replaces a workshop's whole stock (owners and designers). */
export function useSaveStock(workshopId: string | undefined) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (stock: StockSettings) => fetchParsed(stockResponse, `/api/workshops/${workshopId}/stock`, jsonBody('PUT', stock)),
    onSuccess: (saved) => queryClient.setQueryData(stockKey(workshopId), saved),
  });
}
