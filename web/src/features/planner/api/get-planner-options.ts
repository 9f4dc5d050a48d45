import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { PlannerOptionsRequest, PlannerOptionsResponse } from '@/types/api';

/**
 * Every product of a kind made for the vehicle, each checked as the package would be with it in
 * place (or added): the planner shows only what fits, with the effect on diameter and speedo.
 * A POST because the current selection travels in the body; it writes nothing.
 */
export function getPlannerOptions(body: PlannerOptionsRequest): Promise<PlannerOptionsResponse> {
  return api.compute<PlannerOptionsResponse>('/api/planner/options', body);
}

export function plannerOptionsQueryOptions(body: PlannerOptionsRequest) {
  return queryOptions({
    queryKey: ['planner', 'options', body] as const,
    queryFn: () => getPlannerOptions(body),
    // A changed selection keeps the last answer on screen until the new one arrives.
    placeholderData: keepPreviousData,
  });
}
