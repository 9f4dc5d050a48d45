import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CreateProductRequest, Product } from '@/types/api';
import { productsQueryKey } from './get-products';

export function createProduct(body: CreateProductRequest): Promise<Product> {
  return api.post<Product>('/api/products', body);
}

export function useCreateProduct() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createProduct,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: productsQueryKey }),
  });
}
