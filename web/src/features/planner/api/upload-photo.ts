import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Upload, UploadKind } from '@/types/api';
import { uploadsQueryKey } from './get-uploads';

/** The multipart fields the API reads. */
export const PHOTO_FIELD = 'photo';
export const PHOTO_KIND_FIELD = 'kind';

export interface UploadPhotoInput {
  file: File;
  kind: UploadKind;
}

export function uploadPhoto({ file, kind }: UploadPhotoInput): Promise<Upload> {
  const form = new FormData();
  // The text field first: the server reads it before the file arrives.
  form.append(PHOTO_KIND_FIELD, kind);
  form.append(PHOTO_FIELD, file, file.name);
  return api.postForm<Upload>('/api/uploads', form);
}

export function useUploadPhoto() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadPhoto,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: uploadsQueryKey }),
  });
}
