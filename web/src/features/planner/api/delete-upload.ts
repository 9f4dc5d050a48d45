import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { uploadsQueryKey } from './get-uploads';

export function deleteUpload(id: string): Promise<void> {
  return api.delete(`/api/uploads/${encodeURIComponent(id)}`);
}

export function useDeleteUpload() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteUpload,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: uploadsQueryKey }),
  });
}
