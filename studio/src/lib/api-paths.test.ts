import { afterEach, describe, expect, expectTypeOf, it } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { api, fillPath, type ApiPath } from './api-paths';
import type { ApiSchema } from './api-types';

describe('api (typed by path)', () => {
  afterEach(() => {
    document.cookie = 'fw_csrf=; expires=Thu, 01 Jan 1970 00:00:00 GMT';
  });

  it('puts each path parameter, URL-encoded, in its place and sends the query', async () => {
    const requests = stubApi([{ path: /^\/guides\/harrow-lane%2F1\/motor%20coupler\/cues\?/, body: { cues: [], total: 0 } }]);
    const window = await api.get('/guides/{workshopSlug}/{guideSlug}/cues', {
      path: { workshopSlug: 'harrow-lane/1', guideSlug: 'motor coupler' },
      query: { fromIndex: 0, limit: 100 },
    });
    expect(window).toEqual({ cues: [], total: 0 });
    expect(requests[0].method).toBe('GET');
    expect(requests[0].url.searchParams.get('limit')).toBe('100');
  });

  it('sends the method it is called by, with the JSON body', async () => {
    document.cookie = 'fw_csrf=token-1';
    const requests = stubApi([{ method: 'POST', path: /^\/follows$/, status: 201, body: { id: 'f1' } }]);
    await api.post('/follows', { body: { targetKind: 'build', targetId: 'b1' } });
    expect(requests[0]).toMatchObject({ method: 'POST', body: { targetKind: 'build', targetId: 'b1' } });
  });

  it('refuses a path template without its parameter', () => {
    expect(() => fillPath('/guides/{workshopSlug}/{guideSlug}', { workshopSlug: 'w' })).toThrow('{guideSlug}');
  });

  it('types the answer, the parameters and the paths from the contract (checked by tsc)', () => {
    expectTypeOf(api.get<'/guides'>).returns.resolves.toEqualTypeOf<ApiSchema<'PublishedGuideSummaryDto'>[]>();
    expectTypeOf(api.get<'/guides/{workshopSlug}/{guideSlug}'>).returns.resolves.toEqualTypeOf<ApiSchema<'PublishedGuideDto'>>();
    expectTypeOf<'/guides'>().toExtend<ApiPath<'get'>>();
    // Not a route of the API, and not a GET route: a rename on the API side fails here and in every caller.
    expectTypeOf<'/guide'>().not.toExtend<ApiPath<'get'>>();
    expectTypeOf<'/follows/unsubscribe'>().not.toExtend<ApiPath<'get'>>();
    const call = () =>
      // @ts-expect-error the follow-along read needs its path parameters
      api.get('/guides/{workshopSlug}/{guideSlug}', {});
    expect(typeof call).toBe('function');
  });
});
