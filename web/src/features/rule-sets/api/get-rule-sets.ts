import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { RuleSetListResponse } from '@/types/api';

export const ruleSetsQueryKey = ['rule-sets'] as const;

export function getRuleSets(): Promise<RuleSetListResponse> {
  return api.get<RuleSetListResponse>('/api/rule-sets');
}

/** Every rule set, the default first. */
export function ruleSetsQueryOptions() {
  return queryOptions({ queryKey: [...ruleSetsQueryKey, 'list'] as const, queryFn: getRuleSets });
}
