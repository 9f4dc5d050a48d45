import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { StaffMember, UpdateStaffRequest } from '@/types/api';
import { staffQueryKey } from './get-staff';

export interface UpdateStaffInput {
  id: string;
  changes: UpdateStaffRequest;
}

export function updateStaff({ id, changes }: UpdateStaffInput): Promise<StaffMember> {
  return api.patch<StaffMember>(`/api/staff/${encodeURIComponent(id)}`, changes);
}

export function useUpdateStaff() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateStaff,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: staffQueryKey }),
  });
}
