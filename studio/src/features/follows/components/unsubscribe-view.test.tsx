import { fireEvent, screen, waitFor } from '@testing-library/react';
import { StrictMode } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import { UnsubscribeView } from './unsubscribe-view';

const signedOut = { path: /^\/auth\/me$/, body: { user: null } };

function renderPage(token: string | null) {
  return renderWithProviders(
    <StrictMode>
      <UnsubscribeView token={token} />
    </StrictMode>,
  );
}

describe('UnsubscribeView', () => {
  afterEach(() => vi.restoreAllMocks());

  it('sends the link’s token once as the page opens and says what stopped', async () => {
    const requests = stubApi([signedOut, { method: 'POST', path: /^\/follows\/unsubscribe$/, body: { status: 'unfollowed', stopped: 'follow', label: '21-tooth coupler stack', stillFollowing: [] } }]);
    renderPage('tok-123');
    expect((await screen.findByTestId('unsubscribe-outcome')).textContent).toContain('You will no longer get fit news about 21-tooth coupler stack.');
    const posts = requests.filter((request) => request.method === 'POST');
    expect(posts).toHaveLength(1);
    expect(posts[0].url.pathname).toBe('/api/follows/unsubscribe');
    expect(posts[0].body).toEqual({ token: 'tok-123' });
    expect(screen.getByRole('link', { name: 'Browse published guides' }).getAttribute('href')).toBe('/guides');
    expect(screen.getByTestId('still-following-none').textContent).toBe('Nothing else you follow brings news of this.');
  });

  it('lists the other follows that still bring the same news, and stops one with the same link', async () => {
    const buildFollow = {
      id: 'f-build',
      targetKind: 'build',
      targetId: 'b1',
      label: 'Motor-to-gearbox coupler',
      workshop: { name: 'Harrow Lane Garage', slug: 'harrow-lane' },
      createdAt: '2026-03-01T10:00:00.000Z',
    };
    const shopFollow = { ...buildFollow, id: 'f-shop', targetKind: 'workshop', targetId: 'w1', label: 'Harrow Lane Garage' };
    const requests = stubApi([
      signedOut,
      {
        method: 'POST',
        path: /^\/follows\/unsubscribe$/,
        body: ({ body }: { body: unknown }) =>
          (body as { followId?: string }).followId === 'f-build'
            ? { status: 'unfollowed', stopped: 'follow', label: '21-tooth coupler stack', stillFollowing: [shopFollow] }
            : { status: 'unfollowed', stopped: 'follow', label: '21-tooth coupler stack', stillFollowing: [buildFollow, shopFollow] },
      },
    ]);
    renderPage('tok-123');
    const still = await screen.findByTestId('still-following');
    expect(still.textContent).toContain('Build: Motor-to-gearbox coupler (Harrow Lane Garage)');
    expect(still.textContent).toContain('Workshop: Harrow Lane Garage');
    fireEvent.click(screen.getByRole('button', { name: 'Stop Motor-to-gearbox coupler' }));
    await waitFor(() => expect(screen.queryByRole('button', { name: 'Stop Motor-to-gearbox coupler' })).toBeNull());
    expect(screen.getByRole('button', { name: 'Stop Harrow Lane Garage' })).toBeTruthy();
    expect(requests.filter((request) => request.method === 'POST').map((request) => request.body)).toEqual([
      { token: 'tok-123' },
      { token: 'tok-123', followId: 'f-build' },
    ]);
  });

  it('names the fit report when the mail came because of one', async () => {
    stubApi([signedOut, { method: 'POST', path: /^\/follows\/unsubscribe$/, body: { status: 'unfollowed', stopped: 'report', label: 'your fit report', stillFollowing: [] } }]);
    renderPage('tok-123');
    expect((await screen.findByTestId('unsubscribe-outcome')).textContent).toContain('You will no longer get fit news about your fit report.');
  });

  it('says so when the link was already used', async () => {
    stubApi([signedOut, { method: 'POST', path: /^\/follows\/unsubscribe$/, body: { status: 'already', stopped: 'follow', label: 'Harrow Lane Garage', stillFollowing: [] } }]);
    renderPage('tok-123');
    expect((await screen.findByTestId('unsubscribe-outcome')).textContent).toContain('You had already stopped fit news about Harrow Lane Garage.');
  });

  it('explains an unknown link in words', async () => {
    stubApi([signedOut, { method: 'POST', path: /^\/follows\/unsubscribe$/, status: 404, body: { statusCode: 404, message: 'Unknown link' } }]);
    renderPage('not-a-token');
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toMatch(/We do not know this link.*open it again from the e-mail/);
    expect(screen.queryByTestId('unsubscribe-outcome')).toBeNull();
  });

  it('a link without its token asks for nothing', async () => {
    const requests = stubApi([signedOut]);
    renderPage(null);
    expect((await screen.findByRole('alert')).textContent).toMatch(/This link is incomplete/);
    expect(requests.filter((request) => request.method === 'POST')).toEqual([]);
  });
});

describe('UnsubscribeView: wider stops', () => {
  afterEach(() => vi.restoreAllMocks());

  const buildFollow = {
    id: 'f-build',
    targetKind: 'build',
    targetId: 'b1',
    label: 'Motor-to-gearbox coupler',
    delivery: 'at_once',
    workshop: { name: 'Harrow Lane Garage', slug: 'harrow-lane' },
    createdAt: '2026-03-01T10:00:00.000Z',
  };
  const elsewhere = { ...buildFollow, id: 'f-other', label: 'Bench vice jaws', workshop: { name: 'Copperbeck Works', slug: 'copperbeck' } };
  const unsubscribeRoute = (answer: (body: { followId?: string; scope?: string }) => { status: number; body: unknown }) => ({
    method: 'POST' as const,
    path: /^\/follows\/unsubscribe$/,
    reply: ({ body }: { body: unknown }) => answer(body as { scope?: string }),
  });
  const posts = (requests: ReturnType<typeof stubApi>) => requests.filter((request) => request.method === 'POST').map((request) => request.body);

  it('a followed item’s link stops its workshop, then everything, saying what each stopped', async () => {
    const requests = stubApi([
      signedOut,
      unsubscribeRoute(({ scope }) => {
        if (scope === 'workshop') return { status: 200, body: { status: 'unfollowed', stopped: 'workshop', label: 'all fit news from Harrow Lane Garage', stillFollowing: [elsewhere] } };
        if (scope === 'everything') return { status: 200, body: { status: 'unfollowed', stopped: 'everything', label: 'all fit news', stillFollowing: [] } };
        return { status: 200, body: { status: 'unfollowed', stopped: 'follow', label: '21-tooth coupler stack', stillFollowing: [buildFollow] } };
      }),
    ]);
    renderPage('tok-123');
    fireEvent.click(await screen.findByRole('button', { name: 'Stop all fit news from Harrow Lane Garage' }));
    expect((await screen.findByTestId('wider-outcome-workshop')).textContent).toBe(
      'We stopped all fit news from Harrow Lane Garage: its follows and the news of your fit reports there.',
    );
    // The list of follows in that workshop went with it, and so did the offer itself.
    expect(screen.queryByTestId('still-following')).toBeNull();
    expect(screen.queryByRole('button', { name: /from Harrow Lane Garage/ })).toBeNull();
    expect(screen.getByTestId('unsubscribe-outcome').textContent).toContain('You will no longer get fit news about 21-tooth coupler stack.');

    fireEvent.click(screen.getByRole('button', { name: 'Stop all fit news' }));
    expect((await screen.findByTestId('wider-outcome-everything')).textContent).toBe('We stopped all fit news: every follow and the news of your fit reports.');
    expect(screen.getByTestId('wider-outcome-workshop')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /Stop all fit news/ })).toBeNull();
    expect(posts(requests)).toEqual([{ token: 'tok-123' }, { token: 'tok-123', scope: 'workshop' }, { token: 'tok-123', scope: 'everything' }]);
  });

  it('names no workshop it does not know, and says when there was nothing more to stop', async () => {
    stubApi([
      signedOut,
      unsubscribeRoute(({ scope }) =>
        scope === 'workshop'
          ? { status: 200, body: { status: 'already', stopped: 'workshop', label: 'all fit news from Harrow Lane Garage', stillFollowing: [] } }
          : { status: 200, body: { status: 'unfollowed', stopped: 'report', label: 'your fit report', stillFollowing: [] } },
      ),
    ]);
    renderPage('tok-123');
    fireEvent.click(await screen.findByRole('button', { name: 'Stop all fit news from this workshop' }));
    expect((await screen.findByTestId('wider-outcome-workshop')).textContent).toBe(
      'Nothing more to stop: all fit news from Harrow Lane Garage was already stopped.',
    );
  });

  it('a digest’s link offers all fit news but not one workshop', async () => {
    const requests = stubApi([
      signedOut,
      unsubscribeRoute(({ scope }) =>
        scope === 'everything'
          ? { status: 200, body: { status: 'unfollowed', stopped: 'everything', label: 'all fit news', stillFollowing: [] } }
          : { status: 200, body: { status: 'unfollowed', stopped: 'digest', label: 'your daily digest', stillFollowing: [buildFollow, elsewhere] } },
      ),
    ]);
    renderPage('tok-digest');
    const everything = await screen.findByRole('button', { name: 'Stop all fit news' });
    expect(screen.queryByRole('button', { name: /Stop all fit news from/ })).toBeNull();
    fireEvent.click(everything);
    expect((await screen.findByTestId('wider-outcome-everything')).textContent).toContain('We stopped all fit news');
    expect(screen.queryByTestId('still-following')).toBeNull();
    expect(posts(requests)).toEqual([{ token: 'tok-digest' }, { token: 'tok-digest', scope: 'everything' }]);
  });

  it('the new-fit-report mail’s link offers all fit news too', async () => {
    stubApi([signedOut, unsubscribeRoute(() => ({ status: 200, body: { status: 'unfollowed', stopped: 'fit_report_mail', label: 'mail about new fit reports', stillFollowing: [] } }))]);
    renderPage('tok-reports');
    expect(await screen.findByRole('button', { name: 'Stop all fit news' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: /Stop all fit news from/ })).toBeNull();
  });

  it('says in a sentence why a wider stop failed, and keeps the choice open', async () => {
    stubApi([
      signedOut,
      unsubscribeRoute(({ scope }) =>
        scope === 'everything'
          ? { status: 503, body: { statusCode: 503, message: 'The mail settings cannot be changed just now, try again in a minute' } }
          : { status: 200, body: { status: 'unfollowed', stopped: 'follow', label: '21-tooth coupler stack', stillFollowing: [] } },
      ),
    ]);
    renderPage('tok-123');
    fireEvent.click(await screen.findByRole('button', { name: 'Stop all fit news' }));
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toBe('Nothing more was stoppedThe mail settings cannot be changed just now, try again in a minute.');
    expect(screen.queryByTestId('wider-outcome-everything')).toBeNull();
    expect(screen.getByRole('button', { name: 'Stop all fit news' })).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Stop all fit news from this workshop' })).toBeTruthy();
  });
});
