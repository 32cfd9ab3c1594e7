import { fireEvent, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import type { InvitationOptOut } from '../api/queries';
import { InvitationOptOutPage } from './invitation-opt-out-page';

const LINK = /^\/invitations\/opt-out\?token=tok-stop-123$/;

/** Answers GET and PUT like the API: a PUT sets the state and answers it whole. */
function stubOptOut(start: InvitationOptOut) {
  let current = start;
  return stubApi([
    { path: LINK, body: () => current },
    {
      method: 'PUT',
      path: LINK,
      body: ({ body }: { body: unknown }) => {
        const { stopped } = body as { stopped: boolean };
        current = { ...current, stopped, stoppedSince: stopped ? '2026-12-05T13:30:00.000Z' : null };
        return current;
      },
    },
  ]);
}

describe('InvitationOptOutPage (an invitation mail’s "stop invitations" link, signed out)', () => {
  afterEach(() => vi.restoreAllMocks());

  it('changes nothing on opening; the button stops invitations with the link’s token, and the same page allows them again', async () => {
    const requests = stubOptOut({ email: 'sam.okafor@example.test', stopped: false, stoppedSince: null });
    renderWithProviders(<InvitationOptOutPage token="tok-stop-123" />);
    expect((await screen.findByTestId('invitations-allowed')).textContent).toContain('sam.okafor@example.test');
    expect(requests.filter((request) => request.method !== 'GET')).toEqual([]);

    fireEvent.click(screen.getByRole('button', { name: 'Stop all invitations to this address' }));
    const stopped = await screen.findByTestId('invitations-stopped');
    expect(stopped.textContent).toMatch(/Nobody on Fitwright can invite sam\.okafor@example\.test/);
    expect(stopped.textContent).toMatch(/nothing is sent/);
    const puts = requests.filter((request) => request.method === 'PUT');
    expect(puts).toHaveLength(1);
    expect(puts[0].url.pathname).toBe('/api/invitations/opt-out');
    expect(puts[0].url.searchParams.get('token')).toBe('tok-stop-123');
    expect(puts[0].body).toEqual({ stopped: true });

    fireEvent.click(screen.getByRole('button', { name: 'Allow invitations again' }));
    await screen.findByTestId('invitations-allowed');
    expect(requests.filter((request) => request.method === 'PUT').map((request) => request.body)).toEqual([{ stopped: true }, { stopped: false }]);
  });

  it('says the link is unknown (404) without offering the button', async () => {
    stubApi([{ path: LINK, status: 404, body: { statusCode: 404, message: 'We do not know this link.' } }]);
    renderWithProviders(<InvitationOptOutPage token="tok-stop-123" />);
    expect((await screen.findByRole('alert')).textContent).toMatch(/We do not know this link/);
    expect(screen.queryByRole('button', { name: /invitations/ })).toBeNull();
  });

  it('shows a failed change in words and keeps the state it had', async () => {
    stubApi([
      { path: LINK, body: { email: 'sam.okafor@example.test', stopped: false, stoppedSince: null } },
      { method: 'PUT', path: LINK, status: 503, body: { statusCode: 503, message: 'The database is not available right now. Try again in a moment.' } },
    ]);
    renderWithProviders(<InvitationOptOutPage token="tok-stop-123" />);
    fireEvent.click(await screen.findByRole('button', { name: 'Stop all invitations to this address' }));
    expect((await screen.findByRole('alert')).textContent).toMatch(/Not changed.*database is not available/);
    expect(screen.getByTestId('invitations-allowed')).toBeTruthy();
  });

  it('says a link without its token is incomplete', () => {
    const requests = stubApi([]);
    renderWithProviders(<InvitationOptOutPage token={null} />);
    expect(screen.getByRole('alert').textContent).toMatch(/This link is incomplete/);
    expect(requests).toEqual([]);
  });
});
