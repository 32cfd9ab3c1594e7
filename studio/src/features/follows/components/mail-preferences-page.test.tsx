import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import type { MailPreferences } from '../api/queries';
import { MailPreferencesPage, MailPreferencesSection } from './mail-preferences-page';

/** Harrow Lane Garage's demo follows as the preferences routes describe them (invented). */
function testPreferences(overrides: Partial<MailPreferences> = {}): MailPreferences {
  return {
    email: 'rowan@example.test',
    timeZone: 'UTC',
    digestHour: 8,
    digestWeekday: 1,
    fitReportMail: 'at_once',
    pausedAt: null,
    pausedNote: null,
    follows: [
      { id: 'f-asm', targetKind: 'assembly', label: '21-tooth coupler stack', workshopName: 'Harrow Lane Garage', delivery: 'at_once' },
      { id: 'f-ws', targetKind: 'workshop', label: 'Harrow Lane Garage', workshopName: 'Harrow Lane Garage', delivery: 'weekly' },
    ],
    ...overrides,
  };
}

/** Answers GET and PUT like the API: a PUT applies the change and answers the whole new state. */
function stubPreferences(path: RegExp, start: MailPreferences) {
  let current = start;
  const requests = stubApi([
    { path, body: () => current },
    {
      method: 'PUT',
      path,
      body: ({ body }: { body: unknown }) => {
        const change = body as { follows?: { followId: string; delivery: MailPreferences['follows'][number]['delivery'] }[] } & Partial<MailPreferences> & {
          resume?: boolean;
        };
        const { follows, resume, ...settings } = change;
        current = {
          ...current,
          ...settings,
          ...(resume ? { pausedAt: null, pausedNote: null } : {}),
          follows: current.follows.map((follow) => ({ ...follow, delivery: follows?.find((item) => item.followId === follow.id)?.delivery ?? follow.delivery })),
        };
        return current;
      },
    },
  ]);
  return requests;
}

describe('MailPreferencesPage (a mail’s preferences link, signed out)', () => {
  afterEach(() => vi.restoreAllMocks());

  it('shows each follow’s delivery and the digest hour, and saves only what changed with the link’s token', async () => {
    const requests = stubPreferences(/^\/follows\/preferences\/link\?token=tok-123$/, testPreferences());
    renderWithProviders(<MailPreferencesPage token="tok-123" />);
    const table = await screen.findByRole('table', { name: 'Delivery of each follow' });
    expect(within(table).getAllByTestId('preference-row').map((row) => row.textContent?.replace(/Every change.*$/, ''))).toEqual([
      '21-tooth coupler stack (assembly)Harrow Lane Garage',
      'Harrow Lane Garage (workshop)Harrow Lane Garage',
    ]);
    const assembly = screen.getByRole('combobox', { name: 'Delivery for 21-tooth coupler stack' }) as HTMLSelectElement;
    expect(assembly.value).toBe('at_once');
    expect((screen.getByRole('combobox', { name: 'Delivery for Harrow Lane Garage' }) as HTMLSelectElement).value).toBe('weekly');
    expect((screen.getByRole('combobox', { name: 'Hour' }) as HTMLSelectElement).value).toBe('8');
    expect(screen.getByRole('button', { name: 'Save mail preferences' }).hasAttribute('disabled')).toBe(true);

    fireEvent.change(assembly, { target: { value: 'daily' } });
    fireEvent.change(screen.getByRole('combobox', { name: 'Hour' }), { target: { value: '18' } });
    fireEvent.change(screen.getByRole('combobox', { name: 'Time zone' }), { target: { value: 'Europe/Berlin' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save mail preferences' }));

    expect((await screen.findByTestId('preferences-saved')).textContent).toMatch(/Saved/);
    const puts = requests.filter((request) => request.method === 'PUT');
    expect(puts).toHaveLength(1);
    expect(puts[0].url.pathname).toBe('/api/follows/preferences/link');
    expect(puts[0].url.searchParams.get('token')).toBe('tok-123');
    expect(puts[0].body).toEqual({ timeZone: 'Europe/Berlin', digestHour: 18, follows: [{ followId: 'f-asm', delivery: 'daily' }] });
    await waitFor(() =>
      expect((screen.getByRole('combobox', { name: 'Delivery for 21-tooth coupler stack' }) as HTMLSelectElement).value).toBe('daily'),
    );
    expect((screen.getByRole('combobox', { name: 'Time zone' }) as HTMLSelectElement).value).toBe('Europe/Berlin');
    expect(screen.getByRole('button', { name: 'Save mail preferences' }).hasAttribute('disabled')).toBe(true);
  }, 30_000);

  it('says a link it does not know is at fault, and one without a token is incomplete', async () => {
    stubApi([{ path: /^\/follows\/preferences\/link/, status: 404, body: { statusCode: 404, message: 'This link is not known.', code: 'link_unknown' } }]);
    const { unmount } = renderWithProviders(<MailPreferencesPage token="gone" />);
    expect((await screen.findByRole('alert')).textContent).toMatch(/We do not know this link/);
    expect(screen.queryByRole('table')).toBeNull();
    unmount();
    renderWithProviders(<MailPreferencesPage token={null} />);
    expect(screen.getByRole('alert').textContent).toMatch(/This link is incomplete/);
  });

  it('shows the refusals note when mail is paused, and resumes it', async () => {
    const note = 'Mail to rowan@example.test is paused: its mail server refused our mail 3 times (last answer: 550 mailbox unavailable). Check the address, then resume.';
    const requests = stubPreferences(/^\/follows\/preferences\/link\?token=tok-9$/, testPreferences({ pausedAt: '2026-12-01T09:00:00.000Z', pausedNote: note }));
    renderWithProviders(<MailPreferencesPage token="tok-9" />);
    const paused = await screen.findByTestId('mail-paused');
    expect(paused.textContent).toContain('550 mailbox unavailable');
    fireEvent.click(within(paused).getByRole('button', { name: 'Resume mail' }));
    await waitFor(() => expect(screen.queryByTestId('mail-paused')).toBeNull());
    expect(requests.filter((request) => request.method === 'PUT').map((request) => request.body)).toEqual([{ resume: true }]);
  });
});

describe('MailPreferencesSection (account page, signed in)', () => {
  afterEach(() => vi.restoreAllMocks());

  it('reads and saves my preferences without a token, and turns fit-report mail off', async () => {
    const requests = stubPreferences(/^\/follows\/preferences$/, testPreferences({ follows: [] }));
    renderWithProviders(<MailPreferencesSection />);
    expect((await screen.findByTestId('preferences-no-follows')).textContent).toMatch(/You follow nothing/);
    const reports = screen.getByRole('checkbox', { name: /fit report to a workshop I own or edit/ }) as HTMLInputElement;
    expect(reports.checked).toBe(true);
    fireEvent.click(reports);
    fireEvent.change(screen.getByRole('combobox', { name: 'Weekly digest on' }), { target: { value: '5' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save mail preferences' }));
    await screen.findByTestId('preferences-saved');
    const puts = requests.filter((request) => request.method === 'PUT');
    expect(puts.map((request) => `${request.url.pathname}${request.url.search}`)).toEqual(['/api/follows/preferences']);
    expect(puts[0].body).toEqual({ digestWeekday: 5, fitReportMail: 'off' });
  });
});
