import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { ImportPreviewResponse } from '@/types/api';

/** The multipart field the API reads the price list from. */
export const PRICE_LIST_FIELD = 'file';

export function priceListForm(file: File): FormData {
  const form = new FormData();
  form.append(PRICE_LIST_FIELD, file, file.name);
  return form;
}

/** What a CSV price list would change; the API writes nothing. */
export function previewPriceList(file: File): Promise<ImportPreviewResponse> {
  return api.postForm<ImportPreviewResponse>('/api/catalogue/import/preview', priceListForm(file));
}

export function usePreviewPriceList() {
  return useMutation({ mutationFn: previewPriceList });
}
