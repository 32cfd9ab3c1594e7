import { ApiError, apiRequest } from '@/lib/api-client';
import type { Footage, UploadState } from '../api/types';
import { FatalUploadError, type SignedPart, type UploadTransport } from './multipart-upload';

/** 404 (the footage was deleted) and 409 (the upload finished or was cancelled elsewhere) will not get better by retrying. */
function fatalOr(error: unknown): unknown {
  if (error instanceof ApiError && (error.status === 404 || error.status === 409)) return new FatalUploadError(error.message);
  return error;
}

/**
 * PUTs one part to its presigned URL with XMLHttpRequest (fetch cannot report upload progress).
 * No credentials: storage answers CORS with "*", and the URL itself is the permission.
 */
export function putPart(url: string, body: Blob, onProgress: (sentBytes: number) => void, signal: AbortSignal): Promise<string> {
  return new Promise((resolve, reject) => {
    const request = new XMLHttpRequest();
    request.open('PUT', url);
    request.upload.onprogress = (event) => onProgress(event.loaded);
    request.onload = () => {
      const etag = request.getResponseHeader('ETag');
      if (request.status >= 200 && request.status < 300 && etag) resolve(etag);
      else if (request.status >= 200 && request.status < 300) reject(new Error('storage did not expose the ETag header (check its CORS rules)'));
      else reject(new Error(`storage answered ${request.status}`));
    };
    request.onerror = () => reject(new Error('the connection to storage failed'));
    request.ontimeout = () => reject(new Error('storage did not answer in time'));
    request.onabort = () => reject(new DOMException('aborted', 'AbortError'));
    signal.addEventListener('abort', () => request.abort(), { once: true });
    request.send(body);
  });
}

export function uploadTransport(workshopId: string, footageId: string): UploadTransport {
  const base = `/workshops/${workshopId}/footage/${footageId}/upload`;
  return {
    signParts: (partNumbers) =>
      apiRequest<{ urls: SignedPart[]; expiresAt: string }>(`${base}/part-urls`, { method: 'POST', body: { partNumbers } }).catch(
        (error: unknown) => Promise.reject(fatalOr(error)),
      ),
    putPart,
    recordPart: async (partNumber, etag) => {
      await apiRequest(`${base}/parts/${partNumber}`, { method: 'PUT', body: { etag } }).catch((error: unknown) =>
        Promise.reject(fatalOr(error)),
      );
    },
    complete: async () => {
      await apiRequest<Footage>(`${base}/complete`, { method: 'POST' }).catch((error: unknown) => Promise.reject(fatalOr(error)));
    },
    abort: async () => {
      await apiRequest<void>(base, { method: 'DELETE' }).catch((error: unknown) => {
        // Already gone is what we wanted.
        if (!(error instanceof ApiError && error.status === 404)) throw error;
      });
    },
  };
}

export interface StartedUpload {
  footage: Footage;
  upload: UploadState;
}

export function createFootage(workshopId: string, buildId: string, file: File): Promise<StartedUpload> {
  return apiRequest<StartedUpload>(`/workshops/${workshopId}/builds/${buildId}/footage`, {
    method: 'POST',
    body: { fileName: file.name, contentType: file.type, sizeBytes: file.size },
  });
}

export function fetchUploadState(workshopId: string, footageId: string): Promise<UploadState> {
  return apiRequest<UploadState>(`/workshops/${workshopId}/footage/${footageId}/upload`);
}
