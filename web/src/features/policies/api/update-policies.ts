import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Policy, UpdatePolicyRequest } from '@/types/api';
import { policiesQueryKey } from './get-policies';

/** Replaces the whole policy (every field is sent); new quotes are priced with it. */
export function updatePolicies(body: UpdatePolicyRequest): Promise<Policy> {
  return api.put<Policy>('/api/policies', body);
}

export function useUpdatePolicies() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePolicies,
    onSuccess: (policy) => queryClient.setQueryData(policiesQueryKey, policy),
  });
}
