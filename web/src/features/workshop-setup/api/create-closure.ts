import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CreateClosureRequest, WorkshopSetup } from '@/types/api';
import { setupChanged } from './setup-changed';

/** Manager: shuts the workshop from one local date to another (both included), with a reason. */
export function createClosure(body: CreateClosureRequest): Promise<WorkshopSetup> {
  return api.post<WorkshopSetup>('/api/workshop/closures', body);
}

export function useCreateClosure() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createClosure,
    onSuccess: (setup) => setupChanged(queryClient, setup),
  });
}
