import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { StaffListResponse } from '@/types/api';

export const staffQueryKey = ['staff'] as const;

export function getStaff(): Promise<StaffListResponse> {
  return api.get<StaffListResponse>('/api/staff');
}

export function staffListQueryOptions() {
  return queryOptions({ queryKey: [...staffQueryKey, 'list'] as const, queryFn: getStaff });
}
