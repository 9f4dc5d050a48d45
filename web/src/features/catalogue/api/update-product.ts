import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Product, UpdateProductRequest } from '@/types/api';
import { productsQueryKey } from './get-products';

export interface UpdateProductInput {
  id: string;
  changes: UpdateProductRequest;
}

export function updateProduct({ id, changes }: UpdateProductInput): Promise<Product> {
  return api.patch<Product>(`/api/products/${encodeURIComponent(id)}`, changes);
}

export function useUpdateProduct() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateProduct,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: productsQueryKey }),
  });
}
