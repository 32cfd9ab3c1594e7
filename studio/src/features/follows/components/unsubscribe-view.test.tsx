import { screen } from '@testing-library/react';
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
    const requests = stubApi([signedOut, { method: 'POST', path: /^\/follows\/unsubscribe$/, body: { status: 'unfollowed', label: '21-tooth coupler stack' } }]);
    renderPage('tok-123');
    expect((await screen.findByTestId('unsubscribe-outcome')).textContent).toContain('You will no longer get fit news about 21-tooth coupler stack.');
    const posts = requests.filter((request) => request.method === 'POST');
    expect(posts).toHaveLength(1);
    expect(posts[0].url.pathname).toBe('/api/follows/unsubscribe');
    expect(posts[0].body).toEqual({ token: 'tok-123' });
    expect(screen.getByRole('link', { name: 'Browse published guides' }).getAttribute('href')).toBe('/guides');
  });

  it('says so when the link was already used', async () => {
    stubApi([signedOut, { method: 'POST', path: /^\/follows\/unsubscribe$/, body: { status: 'already', label: 'Harrow Lane Garage' } }]);
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
