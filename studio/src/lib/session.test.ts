import { afterEach, describe, expect, it, vi } from 'vitest';
import { apiRequest, onUnauthorized } from './api-client';
import { safeNextPath } from './session';

describe('safeNextPath', () => {
  it('follows only paths on this site', () => {
    expect(safeNextPath('/workshops/w1/members?x=1', '/workshops')).toBe('/workshops/w1/members?x=1');
    expect(safeNextPath('https://elsewhere.example/', '/workshops')).toBe('/workshops');
    expect(safeNextPath('//elsewhere.example/', '/workshops')).toBe('/workshops');
    expect(safeNextPath('/\\elsewhere.example', '/workshops')).toBe('/workshops');
    expect(safeNextPath(null, '/workshops')).toBe('/workshops');
  });
});

describe('apiRequest and the session', () => {
  afterEach(() => vi.restoreAllMocks());

  it('tells listeners about a 401, except from the sign-in form itself', async () => {
    vi.spyOn(globalThis, 'fetch').mockImplementation(
      async () => new Response(JSON.stringify({ statusCode: 401, message: 'Please sign in to continue.' }), { status: 401 }),
    );
    const listener = vi.fn();
    const stop = onUnauthorized(listener);
    await expect(apiRequest('/workshops')).rejects.toThrow('Please sign in to continue.');
    expect(listener).toHaveBeenCalledTimes(1);
    await expect(apiRequest('/auth/login', { method: 'POST', body: {} })).rejects.toThrow();
    expect(listener).toHaveBeenCalledTimes(1);
    stop();
  });

  it('sends a file upload as multipart, with the CSRF header and no JSON content type', async () => {
    document.cookie = 'fw_csrf=upload-token-0123456789abcdefgh';
    const fetchSpy = vi.spyOn(globalThis, 'fetch').mockResolvedValue(new Response('{}', { status: 200 }));
    const body = new FormData();
    body.append('logo', new Blob(['png']), 'logo.png');
    await apiRequest('/workshops/w1/logo', { method: 'PUT', body });
    const [, init] = fetchSpy.mock.calls[0];
    const headers = new Headers(init?.headers);
    expect(init?.body).toBe(body);
    expect(headers.get('Content-Type')).toBeNull();
    expect(headers.get('X-CSRF-Token')).toBe('upload-token-0123456789abcdefgh');
    document.cookie = 'fw_csrf=; expires=Thu, 01 Jan 1970 00:00:00 GMT';
  });
});
