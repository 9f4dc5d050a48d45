import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { WorkshopSetup } from '@/types/api';
import { setupChanged } from './setup-changed';

/** Manager: removes a closure; its days open again with the usual hours. */
export function deleteClosure(id: string): Promise<WorkshopSetup> {
  return api.delete<WorkshopSetup>(`/api/workshop/closures/${encodeURIComponent(id)}`);
}

export function useDeleteClosure() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteClosure,
    onSuccess: (setup) => setupChanged(queryClient, setup),
  });
}
