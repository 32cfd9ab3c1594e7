import { afterEach, describe, expect, it, vi } from 'vitest';
import { ApiError, apiRequest } from './api-client';

function answer(status: number, body: unknown) {
  const fetchSpy = vi
    .spyOn(globalThis, 'fetch')
    .mockResolvedValue(new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } }));
  return fetchSpy;
}

describe('apiRequest', () => {
  afterEach(() => vi.restoreAllMocks());

  it('sends JSON with cookies and builds the query string', async () => {
    const fetchSpy = answer(200, { ok: true });
    await apiRequest('/tools/fits', { query: { size: 25, hole: 'H7', skipped: undefined } });
    const [url, init] = fetchSpy.mock.calls[0];
    expect(String(url)).toMatch(/\/api\/tools\/fits\?size=25&hole=H7$/);
    expect(init?.credentials).toBe('include');
  });

  it('turns a validation error list into one sentence', async () => {
    answer(400, { statusCode: 400, message: ['size must be a number', 'hole must be a hole tolerance class such as H7'] });
    await expect(apiRequest('/tools/fits')).rejects.toMatchObject({
      status: 400,
      message: 'size must be a number. hole must be a hole tolerance class such as H7',
    });
  });

  it('names the line of a parse error once', async () => {
    answer(422, { statusCode: 422, message: 'Line 3: expected a cue timing', line: 3 });
    await expect(apiRequest('/tools/transcripts/parse', { method: 'POST', body: {} })).rejects.toThrow(
      'Line 3: expected a cue timing',
    );
  });

  it('explains a rate limit without a body', async () => {
    vi.spyOn(globalThis, 'fetch').mockResolvedValue(new Response('', { status: 429 }));
    const error = await apiRequest('/auth/login').catch((caught: unknown) => caught);
    expect(error).toBeInstanceOf(ApiError);
    expect((error as ApiError).message).toMatch(/Too many attempts/);
  });
});
