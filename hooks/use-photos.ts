import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { WalkPhoto } from '@/shared/schemas/walks';
import { api } from './api-client';
import { uploadPhoto } from './upload';
import { walkKeys } from './use-walks';

import type { PhotoFile } from '@/components/walk/walk-source';

/** POST /api/walks/:id/photos as multipart with upload progress; refusals become ApiError with the server's message. */
export function uploadWalkPhoto(walkId: number, file: PhotoFile, step: string, onProgress?: (fraction: number) => void): Promise<WalkPhoto> {
  const target = { path: `/walks/${walkId}/photos`, unreachable: 'The photo did not reach the server. Check the connection and try again.' };
  return uploadPhoto(target, file, step, onProgress);
}

/** Upload a photo at a step of a walk; the walk is refreshed after. */
export function useUploadWalkPhoto(walkId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (v: { file: PhotoFile; step: string; onProgress?: (f: number) => void }) => uploadWalkPhoto(walkId, v.file, v.step, v.onProgress),
    onSuccess: () => void client.invalidateQueries({ queryKey: walkKeys.detail(walkId) }),
  });
}

/** DELETE /api/walks/:id/photos/:photoId. */
export function useRemoveWalkPhoto(walkId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (photoId: string) => api<void>(`/walks/${walkId}/photos/${photoId}`, { method: 'DELETE' }),
    onSuccess: () => void client.invalidateQueries({ queryKey: walkKeys.detail(walkId) }),
  });
}
