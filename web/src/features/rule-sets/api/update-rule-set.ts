import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { RuleSet, RuleSetListResponse, UpdateRuleSetRequest } from '@/types/api';
import { ruleSetsQueryKey, ruleSetsQueryOptions } from './get-rule-sets';

export interface UpdateRuleSetInput {
  id: string;
  changes: UpdateRuleSetRequest;
}

export function updateRuleSet({ id, changes }: UpdateRuleSetInput): Promise<RuleSet> {
  return api.patch<RuleSet>(`/api/rule-sets/${encodeURIComponent(id)}`, changes);
}

export function useUpdateRuleSet() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateRuleSet,
    onSuccess: async (updated) => {
      // The list shows the saved set at once; the refetch then confirms it.
      queryClient.setQueryData<RuleSetListResponse>(ruleSetsQueryOptions().queryKey, (list) =>
        list
          ? { items: list.items.map((item) => (item.id === updated.id ? updated : item)) }
          : list,
      );
      await queryClient.invalidateQueries({ queryKey: ruleSetsQueryKey });
    },
  });
}
