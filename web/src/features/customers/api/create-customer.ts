import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CreateCustomerRequest, Customer } from '@/types/api';
import { customersQueryKey } from './search-customers';

/** A walk-in customer's account; they get an e-mail to choose their password. */
export function createCustomer(body: CreateCustomerRequest): Promise<Customer> {
  return api.post<Customer>('/api/customers', body);
}

export function useCreateCustomer() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCustomer,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: customersQueryKey }),
  });
}
