import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { UploadListResponse } from '@/types/api';

export const uploadsQueryKey = ['uploads'] as const;

/** The signed-in user's own photos (the planner keeps those not yet attached to a quote). */
export function getUploads(): Promise<UploadListResponse> {
  return api.get<UploadListResponse>('/api/uploads');
}

export function uploadsQueryOptions() {
  return queryOptions({ queryKey: [...uploadsQueryKey, 'list'] as const, queryFn: getUploads });
}
