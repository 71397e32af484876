import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { WalkPhoto } from '@/shared/schemas/walks';
import { apiErrorSchema } from '@/shared/schemas/api-error';
import { ApiError, api } from './api-client';
import { walkKeys } from './use-walks';

import type { PhotoFile } from '@/components/walk/walk-source';

/**
 * POST /api/walks/:id/photos as multipart with upload progress (fetch has
 * none, so XMLHttpRequest). Refusals become ApiError with the server's message.
 */
export function uploadWalkPhoto(walkId: number, file: PhotoFile, step: string, onProgress?: (fraction: number) => void): Promise<WalkPhoto> {
  return new Promise((resolve, reject) => {
    const form = new FormData();
    form.append('step', step);
    if ('blob' in file) form.append('photo', file.blob, file.name);
    // React Native's FormData takes a { uri, name, type } object for a file on disk.
    else form.append('photo', file as unknown as Blob);
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api/walks/${walkId}/photos`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('X-Baywalk-Request', '1');
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && onProgress) onProgress(e.loaded / e.total);
    };
    xhr.onerror = () => reject(new ApiError(0, 'network', 'The photo did not reach the server. Check the connection and try again.'));
    xhr.onload = () => {
      let body: unknown;
      try {
        body = JSON.parse(xhr.responseText);
      } catch {
        body = undefined;
      }
      if (xhr.status >= 200 && xhr.status < 300) return resolve((body as { photo: WalkPhoto }).photo);
      const parsed = apiErrorSchema.safeParse(body);
      reject(
        parsed.success
          ? new ApiError(xhr.status, parsed.data.error.code, parsed.data.error.message)
          : new ApiError(xhr.status, 'http', `The server answered ${xhr.status}. Try again in a moment.`),
      );
    };
    xhr.send(form);
  });
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
