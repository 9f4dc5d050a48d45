import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CreateBayRequest, WorkshopSetup } from '@/types/api';
import { setupChanged } from './setup-changed';

/** Manager: adds a bay (placed after the others); answers the whole set-up. */
export function createBay(body: CreateBayRequest): Promise<WorkshopSetup> {
  return api.post<WorkshopSetup>('/api/workshop/bays', body);
}

export function useCreateBay() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createBay,
    onSuccess: (setup) => setupChanged(queryClient, setup),
  });
}
