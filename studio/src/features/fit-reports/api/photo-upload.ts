import { ApiError, CSRF_COOKIE, CSRF_HEADER } from '@/lib/api-client';
import type { FitReport } from './queries';

function csrfCookie(): string | undefined {
  const pair = document.cookie
    .split(';')
    .map((part) => part.trim())
    .find((part) => part.startsWith(`${CSRF_COOKIE}=`));
  return pair ? decodeURIComponent(pair.slice(CSRF_COOKIE.length + 1)) : undefined;
}

function messageOf(status: number, body: unknown): string {
  const message = typeof body === 'object' && body !== null ? (body as { message?: unknown }).message : undefined;
  if (typeof message === 'string') return message;
  if (Array.isArray(message)) return message.join('. ');
  if (status === 0) return 'Could not reach the server. Check your connection and try again.';
  if (status === 413) return 'The photo is too large.';
  return `The photo was not accepted (${status}).`;
}

/**
 * Sends one photo of a report I made (POST /fit-reports/:id/photos, field "photo"). It uses
 * XMLHttpRequest rather than the API client because fetch cannot report upload progress; the report
 * was just created through the API client, so the CSRF cookie is already set.
 */
export function uploadReportPhoto(reportId: string, file: File, onProgress: (fraction: number) => void): Promise<FitReport> {
  return new Promise((resolve, reject) => {
    const form = new FormData();
    form.append('photo', file);
    const request = new XMLHttpRequest();
    request.open('POST', `/api/fit-reports/${encodeURIComponent(reportId)}/photos`);
    request.withCredentials = true;
    request.setRequestHeader('Accept', 'application/json');
    const token = csrfCookie();
    if (token) request.setRequestHeader(CSRF_HEADER, token);
    request.upload.onprogress = (event) => {
      if (event.lengthComputable && event.total > 0) onProgress(event.loaded / event.total);
    };
    request.onload = () => {
      let body: unknown = null;
      try {
        body = JSON.parse(request.responseText);
      } catch {
        // A proxy's HTML error page: the status says enough.
      }
      if (request.status >= 200 && request.status < 300) resolve(body as FitReport);
      else reject(new ApiError(request.status, messageOf(request.status, body), body));
    };
    request.onerror = () => reject(new ApiError(0, messageOf(0, null), null));
    request.send(form);
  });
}
