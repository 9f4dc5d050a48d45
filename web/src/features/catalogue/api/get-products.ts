import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { ProductListResponse, ProductQuery } from '@/types/api';

export const productsQueryKey = ['products'] as const;

export function getProducts(query: ProductQuery = {}): Promise<ProductListResponse> {
  const search = new URLSearchParams();
  if (query.vehicleModelId) search.set('vehicleModelId', query.vehicleModelId);
  if (query.kind) search.set('kind', query.kind);
  if (query.q?.trim()) search.set('q', query.q.trim());
  if (query.includeInactive) search.set('includeInactive', 'true');
  const text = search.toString();
  return api.get<ProductListResponse>(text ? `/api/products?${text}` : '/api/products');
}

export function productsQueryOptions(query: ProductQuery = {}) {
  return queryOptions({
    queryKey: [...productsQueryKey, 'list', query] as const,
    queryFn: () => getProducts(query),
  });
}
