import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CreateStaffRequest, StaffMember } from '@/types/api';
import { staffQueryKey } from './get-staff';

export function createStaff(body: CreateStaffRequest): Promise<StaffMember> {
  return api.post<StaffMember>('/api/staff', body);
}

export function useCreateStaff() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createStaff,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: staffQueryKey }),
  });
}
