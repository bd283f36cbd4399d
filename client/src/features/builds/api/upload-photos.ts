import { useMutation, useQueryClient } from '@tanstack/react-query';
import { ErrorResponseSchema } from '@shared/errors';
import type { Photo } from '@shared/schemas/build';
import { ApiError, getCsrfToken, setCsrfToken } from '@client/lib/api';
import { byPosition, updateCachedPhotos } from './photo-cache';

type Progress = (fraction: number) => void;

function toApiError(status: number, text: string): ApiError {
  let body: unknown = null;
  try {
    body = JSON.parse(text);
  } catch {
    // not JSON: fall through to the generic message
  }
  const parsed = ErrorResponseSchema.safeParse(body);
  if (parsed.success) return new ApiError(status, parsed.data.error.code, parsed.data.error.message, parsed.data.error.fields);
  if (status === 413) return new ApiError(status, 'PAYLOAD_TOO_LARGE', 'That file is too large to upload.');
  return new ApiError(status, 'INTERNAL', `The server answered ${status}. Please try again.`);
}

/** One request through XMLHttpRequest, because fetch cannot report upload progress. */
function send(buildId: number, files: File[], onProgress: Progress): Promise<{ photos: Photo[] }> {
  return new Promise((resolve, reject) => {
    const body = new FormData();
    for (const file of files) body.append('photos', file);
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api/builds/${buildId}/photos`);
    xhr.setRequestHeader('Accept', 'application/json');
    const token = getCsrfToken();
    if (token) xhr.setRequestHeader('X-CSRF-Token', token);
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) onProgress(e.loaded / e.total);
    };
    xhr.onload = () => {
      if (xhr.status >= 200 && xhr.status < 300) resolve(JSON.parse(xhr.responseText) as { photos: Photo[] });
      else reject(toApiError(xhr.status, xhr.responseText));
    };
    xhr.onerror = () => reject(new ApiError(0, 'NETWORK', 'The upload stopped: no connection to Placard. Try again.'));
    xhr.send(body);
  });
}

export async function uploadPhotos(buildId: number, files: File[], onProgress: Progress = () => {}): Promise<{ photos: Photo[] }> {
  try {
    return await send(buildId, files, onProgress);
  } catch (err) {
    // A stale CSRF token is renewed once, as api() does.
    if (!(err instanceof ApiError) || err.code !== 'CSRF_INVALID') throw err;
    const res = await fetch('/api/session', { credentials: 'same-origin' });
    if (res.ok) setCsrfToken(((await res.json()) as { csrfToken: string }).csrfToken);
    return send(buildId, files, onProgress);
  }
}

/** Uploads one file per call, so each file has its own progress bar and its own error. */
export function useUploadPhoto(buildId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ file, onProgress }: { file: File; onProgress: Progress }) => uploadPhotos(buildId, [file], onProgress),
    onSuccess: ({ photos }) => {
      updateCachedPhotos(qc, buildId, (old) => {
        const added = new Map(photos.map((p) => [p.id, p]));
        return byPosition([...old.filter((p) => !added.has(p.id)), ...photos]);
      });
    },
  });
}
