import { vi } from 'vitest';

export interface StubRoute {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  /** Matched against the path after /api, query string included. */
  path: RegExp;
  status?: number;
  /** The answer's body, or a function giving it from the request. */
  body?: unknown | ((request: { url: URL; body: unknown }) => unknown);
  /** For answers that change from call to call, status included. */
  reply?: (request: { url: URL; body: unknown }) => { status: number; body: unknown };
}

export interface StubbedRequest {
  method: string;
  url: URL;
  body: unknown;
}

/**
 * Answers the studio's API requests from a list of routes, first match wins, and records them.
 * A request no route matches answers 404 and is recorded too, so a test sees what it missed.
 */
export function stubApi(routes: StubRoute[]): StubbedRequest[] {
  const seen: StubbedRequest[] = [];
  vi.spyOn(globalThis, 'fetch').mockImplementation(async (input, init) => {
    const url = new URL(input instanceof Request ? input.url : String(input));
    const method = init?.method ?? 'GET';
    const body: unknown = typeof init?.body === 'string' ? JSON.parse(init.body) : null;
    seen.push({ method, url, body });
    const path = `${url.pathname.replace(/^\/api/, '')}${url.search}`;
    const route = routes.find((candidate) => (candidate.method ?? 'GET') === method && candidate.path.test(path));
    if (!route) return json(404, { statusCode: 404, message: `no stub for ${method} ${path}` });
    if (route.reply) {
      const { status, body: replyBody } = route.reply({ url, body });
      return json(status, replyBody);
    }
    const answer = typeof route.body === 'function' ? (route.body as (request: { url: URL; body: unknown }) => unknown)({ url, body }) : route.body;
    return json(route.status ?? 200, answer);
  });
  return seen;
}

function json(status: number, body: unknown): Response {
  if (status === 204) return new Response(null, { status });
  return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
}
