import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { StockSettings } from '../../shared/materials/stockSettings.ts';
import { staleStockDetails, stockResponse, type StockResponse } from '../../shared/schemas/stock.ts';
import { fetchParsed, isApiError, jsonBody } from './fetchJson.ts';
import { stockKey } from './useStock.ts';

/** Someone saved the workshop's stock after the version this edit started from: the stock as it now is. */
export class StaleStockError extends Error {
  override readonly name = 'StaleStockError';
  constructor(readonly current: StockResponse) {
    super(`${current.updatedBy ?? 'Someone'} saved the stock while you were editing; nothing was saved.`);
  }
}

/** True when `error` is a {@link StaleStockError}. */
export const isStaleStock = (error: unknown): error is StaleStockError => error instanceof StaleStockError;

/**
 * Replaces a workshop's whole stock (owners and designers), edited from `version` (null when the
 * workshop had none saved). A version that moved is a {@link StaleStockError}, and the page's
 * copy of the stock becomes the current one so its status names who saved it.
 */
export function useSaveStock(workshopId: string | undefined) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: { version: string | null; stock: StockSettings }) => {
      try {
        return await fetchParsed(stockResponse, `/api/workshops/${workshopId}/stock`, jsonBody('PUT', body));
      } catch (error) {
        if (isApiError(error, 409)) {
          const details = staleStockDetails.safeParse(error.details);
          if (details.success) throw new StaleStockError(details.data.current);
        }
        throw error;
      }
    },
    onSuccess: (saved) => queryClient.setQueryData(stockKey(workshopId), saved),
    onError: (error) => {
      if (isStaleStock(error)) queryClient.setQueryData(stockKey(workshopId), error.current);
    },
  });
}
