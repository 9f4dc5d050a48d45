import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Policy } from '@/types/api';

export const policiesQueryKey = ['policies'] as const;

/** The workshop's pricing policy: labour rate, tax, fitting, disposal, bundle, deposit. */
export function getPolicies(): Promise<Policy> {
  return api.get<Policy>('/api/policies');
}

export function policiesQueryOptions() {
  return queryOptions({ queryKey: policiesQueryKey, queryFn: getPolicies });
}
