import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { ImportApplyResponse } from '@/types/api';
import { productsQueryKey } from './get-products';
import { priceListForm } from './preview-price-list';

/** Writes every new and updated row of the price list in one transaction (all or nothing). */
export function applyPriceList(file: File): Promise<ImportApplyResponse> {
  return api.postForm<ImportApplyResponse>('/api/catalogue/import/apply', priceListForm(file));
}

export function useApplyPriceList() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: applyPriceList,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: productsQueryKey }),
  });
}
