import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CustomerListResponse } from '@/types/api';

export const customersQueryKey = ['customers'] as const;

/** Customers whose name or e-mail contains the words (at most 50). */
export function searchCustomers(q: string): Promise<CustomerListResponse> {
  const text = q.trim() ? `?${new URLSearchParams({ q: q.trim() }).toString()}` : '';
  return api.get<CustomerListResponse>(`/api/customers${text}`);
}

export function customersQueryOptions(q: string) {
  return queryOptions({
    queryKey: [...customersQueryKey, 'search', q.trim()] as const,
    queryFn: () => searchCustomers(q),
    placeholderData: keepPreviousData,
  });
}
