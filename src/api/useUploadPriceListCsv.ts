import { useMutation, useQueryClient } from '@tanstack/react-query';
import { priceListCsvErrors, priceListResponse } from '../../shared/schemas/priceLists.ts';
import type { CsvLineError } from '../../shared/materials/priceListCsv.ts';
import { fetchParsed, isApiError } from './fetchJson.ts';
import { priceListKey } from './usePriceList.ts';

/** A refused upload: every bad line; the server saved nothing. */
export class CsvRejectedError extends Error {
  override readonly name = 'CsvRejectedError';
  constructor(
    message: string,
    readonly errors: CsvLineError[],
  ) {
    super(message);
  }
}

/** Replaces a workshop's price list from CSV text (owners only); a bad line is a {@link CsvRejectedError}. */
export function useUploadPriceListCsv(workshopId: string | undefined) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (csv: string) => {
      try {
        return await fetchParsed(priceListResponse, `/api/workshops/${workshopId}/price-list/csv`, { method: 'POST', body: csv, headers: { 'Content-Type': 'text/csv' } });
      } catch (error) {
        if (isApiError(error, 400) && error.code === 'invalid_csv') {
          const details = priceListCsvErrors.safeParse(error.details);
          if (details.success) throw new CsvRejectedError(error.message, details.data.errors);
        }
        throw error;
      }
    },
    onSuccess: (saved) => queryClient.setQueryData(priceListKey(workshopId), saved),
  });
}
