import type { WalkPhoto } from '@/shared/schemas/walks';
import { apiErrorSchema } from '@/shared/schemas/api-error';
import type { PhotoFile } from '@/components/walk/walk-source';
import { ApiError } from './api-client';

/** Where a photo goes and what to say when it never arrives (staff and guests name the other end differently). */
export interface PhotoUploadTarget {
  /** Path under /api, as for api(): `/walks/12/photos`. */
  path: string;
  /** Message for a network failure (status 0). */
  unreachable: string;
}

/**
 * POSTs a photo at a step as multipart with upload progress (fetch has none,
 * so XMLHttpRequest). Refusals become ApiError with the server's message.
 */
export function uploadPhoto(target: PhotoUploadTarget, file: PhotoFile, step: string, onProgress?: (fraction: number) => void): Promise<WalkPhoto> {
  return new Promise((resolve, reject) => {
    const form = new FormData();
    form.append('step', step);
    if ('blob' in file) form.append('photo', file.blob, file.name);
    // React Native's FormData takes a { uri, name, type } object for a file on disk.
    else form.append('photo', file as unknown as Blob);
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api${target.path}`);
    xhr.withCredentials = true;
    // The server's CSRF guard refuses state changes without this header.
    xhr.setRequestHeader('X-Baywalk-Request', '1');
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && onProgress) onProgress(e.loaded / e.total);
    };
    xhr.onerror = () => reject(new ApiError(0, 'network', target.unreachable));
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
