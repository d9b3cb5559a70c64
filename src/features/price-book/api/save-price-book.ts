import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PriceBook } from '../../../../shared/api/pricing';
import { api } from '../../../lib/api-client';
import { storedPriceBookSchema, type StoredPriceBook } from './get-price-book';
import { priceBookKeys } from './keys';

/** `PUT /api/price-book` (admin) → the stored book. */
export function savePriceBook(book: PriceBook): Promise<StoredPriceBook> {
  return api.request('/api/price-book', {
    method: 'PUT',
    body: book,
    schema: storedPriceBookSchema,
  });
}

/** Saves the book; the answer replaces the cached one, so the page shows what was stored. */
export function useSavePriceBook() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: savePriceBook,
    onSuccess: (stored) => {
      queryClient.setQueryData(priceBookKeys.current(), stored);
      return queryClient.invalidateQueries({ queryKey: priceBookKeys.all });
    },
  });
}
