import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { env } from '@/config/env';
import { api, ApiError, resetCsrfToken } from '@/lib/api-client';
import { mapKeys } from './map-keys';
import type { Basemap } from '@shared/schemas/map';

export interface UploadBasemapInput {
  sugarbushId: number;
  file: File;
  name?: string;
}

/** Share sent so far, 0–1; null while the size is unknown. */
export type UploadProgress = (share: number | null) => void;

function errorFrom(xhr: XMLHttpRequest): ApiError {
  let body: { error?: { code?: unknown; message?: unknown } } | null = null;
  try {
    body = JSON.parse(xhr.responseText);
  } catch {
    // Not JSON: fall back to the status line.
  }
  const code = typeof body?.error?.code === 'string' ? body.error.code : `http-${xhr.status}`;
  const message =
    typeof body?.error?.message === 'string'
      ? body.error.message
      : xhr.status === 413
        ? 'The file is larger than this server accepts.'
        : `The server answered ${xhr.status} ${xhr.statusText}`.trim();
  return new ApiError(xhr.status, code, message);
}

function send(input: UploadBasemapInput, token: string, onProgress: UploadProgress) {
  return new Promise<Basemap>((resolve, reject) => {
    const form = new FormData();
    form.append('file', input.file);
    if (input.name) form.append('name', input.name);
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `${env.apiBaseUrl}/sugarbushes/${input.sugarbushId}/basemaps`);
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.setRequestHeader('x-csrf-token', token);
    xhr.withCredentials = true;
    xhr.upload.onprogress = (event) =>
      onProgress(event.lengthComputable ? event.loaded / event.total : null);
    xhr.onload = () => {
      if (xhr.status >= 200 && xhr.status < 300) {
        try {
          resolve(JSON.parse(xhr.responseText) as Basemap);
        } catch {
          reject(new ApiError(xhr.status, 'bad-answer', 'The server sent an unreadable answer.'));
        }
      } else reject(errorFrom(xhr));
    };
    xhr.onerror = () =>
      reject(
        new ApiError(
          0,
          'network',
          "Couldn't reach Clearwood. Check your connection and try again.",
        ),
      );
    xhr.send(form);
  });
}

/**
 * Sends an MBTiles file with XMLHttpRequest rather than fetch, because only XHR reports upload
 * progress. A stale CSRF token is refreshed once, as the API client does.
 */
export async function uploadBasemap(input: UploadBasemapInput, onProgress: UploadProgress) {
  const { token } = await api.get<{ token: string }>('/auth/csrf');
  try {
    return await send(input, token, onProgress);
  } catch (error) {
    if (error instanceof ApiError && error.status === 403 && error.code === 'csrf-invalid') {
      resetCsrfToken();
      const fresh = await api.get<{ token: string }>('/auth/csrf');
      return send(input, fresh.token, onProgress);
    }
    throw error;
  }
}

export function useUploadBasemap(sugarbushId: number) {
  const queryClient = useQueryClient();
  const [progress, setProgress] = useState<number | null>(null);
  const mutation = useMutation({
    mutationFn: (input: Omit<UploadBasemapInput, 'sugarbushId'>) => {
      setProgress(0);
      return uploadBasemap({ ...input, sugarbushId }, setProgress);
    },
    onSettled: () => {
      setProgress(null);
      return queryClient.invalidateQueries({ queryKey: mapKeys.basemaps(sugarbushId) });
    },
  });
  return { ...mutation, progress };
}
