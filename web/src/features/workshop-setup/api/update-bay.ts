import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { UpdateBayRequest, WorkshopSetup } from '@/types/api';
import { setupChanged } from './setup-changed';

export interface UpdateBayInput {
  id: string;
  changes: UpdateBayRequest;
}

/** Manager: renames a bay, changes its kind or place in the order, or switches it off or on. */
export function updateBay({ id, changes }: UpdateBayInput): Promise<WorkshopSetup> {
  return api.patch<WorkshopSetup>(`/api/workshop/bays/${encodeURIComponent(id)}`, changes);
}

export function useUpdateBay() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateBay,
    onSuccess: (setup) => setupChanged(queryClient, setup),
  });
}
