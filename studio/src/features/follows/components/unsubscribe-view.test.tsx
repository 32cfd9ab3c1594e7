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
