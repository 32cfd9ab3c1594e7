/** The one way the studio talks to the API: same-origin, cookies included, errors made readable. */

export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly body: unknown,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

interface ErrorBody {
  message?: string | string[];
  line?: number;
}

function readableMessage(status: number, body: unknown): string {
  const { message, line } = (typeof body === 'object' && body !== null ? body : {}) as ErrorBody;
  const text = Array.isArray(message) ? message.join('. ') : message;
  if (text) return line === undefined ? text : `Line ${line}: ${text.replace(/^Line \d+:\s*/, '')}`;
  if (status === 0) return 'Could not reach the server. Check your connection and try again.';
  if (status === 401) return 'Please sign in to continue.';
  if (status === 403) return 'You do not have access to this.';
  if (status === 404) return 'Not found.';
  if (status === 429) return 'Too many attempts. Please wait a moment and try again.';
  if (status >= 500) return 'The server had a problem. Please try again shortly.';
  return `Request failed (${status}).`;
}

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  body?: unknown;
  query?: Record<string, string | number | boolean | undefined>;
  signal?: AbortSignal;
  /** Some routes answer a non-2xx status with a useful body (the health route's 503). */
  acceptStatuses?: number[];
}

export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const url = new URL(`/api${path}`, window.location.origin);
  for (const [key, value] of Object.entries(options.query ?? {})) {
    if (value !== undefined) url.searchParams.set(key, String(value));
  }
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';

  let response: Response;
  try {
    response = await fetch(url, {
      method: options.method ?? 'GET',
      headers,
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      credentials: 'include',
      signal: options.signal,
    });
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    throw new ApiError(0, readableMessage(0, null), null);
  }

  const body: unknown = response.status === 204 ? null : await response.json().catch(() => null);
  if (!response.ok && !options.acceptStatuses?.includes(response.status)) {
    throw new ApiError(response.status, readableMessage(response.status, body), body);
  }
  return body as T;
}
