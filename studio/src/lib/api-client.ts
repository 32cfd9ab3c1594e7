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
  /** JSON, or a FormData for a file upload (sent as multipart, with the browser's boundary). */
  body?: unknown;
  query?: Record<string, string | number | boolean | undefined>;
  signal?: AbortSignal;
  /** Some routes answer a non-2xx status with a useful body (the health route's 503). */
  acceptStatuses?: number[];
  /** The browser cache's mode for this request (`fetch`'s `cache`); default: as the answer's headers say. */
  cache?: RequestCache;
}

/** The double-submit CSRF token: the API sets the readable `fw_csrf` cookie; we echo it in a header. */
export const CSRF_COOKIE = 'fw_csrf';
export const CSRF_HEADER = 'X-CSRF-Token';

function readCookie(name: string): string | undefined {
  for (const part of document.cookie.split(';')) {
    const [key, ...rest] = part.trim().split('=');
    if (key === name) return decodeURIComponent(rest.join('='));
  }
  return undefined;
}

let csrfFetch: Promise<unknown> | undefined;

/** The CSRF token, asking the API for one first (GET /api/auth/me sets it) when the browser has none. */
async function csrfToken(): Promise<string | undefined> {
  const existing = readCookie(CSRF_COOKIE);
  if (existing) return existing;
  csrfFetch ??= fetch(new URL('/api/auth/me', window.location.origin), { credentials: 'include' })
    .catch(() => undefined)
    .finally(() => {
      csrfFetch = undefined;
    });
  await csrfFetch;
  return readCookie(CSRF_COOKIE);
}

/**
 * Told about every 401 from a request that expected a session (not the sign-in form itself), so the
 * session hook can forget the user and the route guard can send them to sign in.
 */
const unauthorizedListeners = new Set<() => void>();
export function onUnauthorized(listener: () => void): () => void {
  unauthorizedListeners.add(listener);
  return () => {
    unauthorizedListeners.delete(listener);
  };
}

export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const url = new URL(`/api${path}`, window.location.origin);
  for (const [key, value] of Object.entries(options.query ?? {})) {
    if (value !== undefined) url.searchParams.set(key, String(value));
  }
  const method = options.method ?? 'GET';
  const headers: Record<string, string> = { Accept: 'application/json' };
  const isForm = typeof FormData !== 'undefined' && options.body instanceof FormData;
  if (options.body !== undefined && !isForm) headers['Content-Type'] = 'application/json';
  if (method !== 'GET') {
    const token = await csrfToken();
    if (token) headers[CSRF_HEADER] = token;
  }

  let response: Response;
  try {
    response = await fetch(url, {
      method,
      headers,
      body: options.body === undefined ? undefined : isForm ? (options.body as FormData) : JSON.stringify(options.body),
      credentials: 'include',
      signal: options.signal,
      cache: options.cache,
    });
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    throw new ApiError(0, readableMessage(0, null), null);
  }

  const body: unknown = response.status === 204 ? null : await response.json().catch(() => null);
  if (response.status === 401 && !path.startsWith('/auth/login')) {
    for (const listener of unauthorizedListeners) listener();
  }
  if (!response.ok && !options.acceptStatuses?.includes(response.status)) {
    throw new ApiError(response.status, readableMessage(response.status, body), body);
  }
  return body as T;
}
