import { ApiError, apiRequest } from '@/lib/api-client';
import type { Footage, UploadState } from '../api/types';
import {
  FatalUploadError,
  PartsRejectedError,
  type SignedPart,
  StorageUnavailableError,
  type UploadTransport,
} from './multipart-upload';

/**
 * 404 (the footage was deleted) and 409 (the upload finished or was cancelled elsewhere) will not get
 * better by retrying; 503 means storage is down (wait for it); 422 on completion names parts storage
 * does not hold as recorded (send them again).
 */
function classify(error: unknown): unknown {
  if (!(error instanceof ApiError)) return error;
  if (error.status === 404 || error.status === 409) return new FatalUploadError(error.message);
  if (error.status === 503) return new StorageUnavailableError(error.message);
  const invalidParts = (error.body as { invalidParts?: unknown } | null)?.invalidParts;
  if (error.status === 422 && Array.isArray(invalidParts)) {
    return new PartsRejectedError(invalidParts.filter((part): part is number => Number.isInteger(part)), error.message);
  }
  return error;
}

/** The browser got no answer from storage at all (refused, reset, DNS), as opposed to an HTTP error status. */
class PartConnectionError extends Error {}

/** What the API's health check says of storage; false when the API cannot be asked either. */
export async function storageAvailable(): Promise<boolean> {
  try {
    const report = await apiRequest<{ checks?: { storage?: string } }>('/health', { acceptStatuses: [503] });
    return report.checks?.storage === 'up';
  } catch {
    return false;
  }
}

/** A part PUT that could not reach storage: when health says storage is down, wait for it instead of counting tries. */
async function putPartOrWaitForStorage(
  url: string,
  body: Blob,
  onProgress: (sentBytes: number) => void,
  signal: AbortSignal,
): Promise<string> {
  try {
    return await putPart(url, body, onProgress, signal);
  } catch (error) {
    if (error instanceof PartConnectionError && !signal.aborted && !(await storageAvailable())) {
      throw new StorageUnavailableError(error.message);
    }
    throw error;
  }
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
    request.onerror = () => reject(new PartConnectionError('the connection to storage failed'));
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
        (error: unknown) => Promise.reject(classify(error)),
      ),
    putPart: putPartOrWaitForStorage,
    recordPart: async (partNumber, etag) => {
      await apiRequest(`${base}/parts/${partNumber}`, { method: 'PUT', body: { etag } }).catch((error: unknown) =>
        Promise.reject(classify(error)),
      );
    },
    complete: async () => {
      await apiRequest<Footage>(`${base}/complete`, { method: 'POST' }).catch((error: unknown) => Promise.reject(classify(error)));
    },
    abort: async () => {
      await apiRequest<void>(base, { method: 'DELETE' }).catch((error: unknown) => {
        // Already gone is what we wanted.
        if (!(error instanceof ApiError && error.status === 404)) throw error;
      });
    },
    storageAvailable,
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
