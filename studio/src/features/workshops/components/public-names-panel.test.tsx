import { fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import type { Workshop } from '../api/queries';
import { WorkshopSettingsPage } from './workshop-settings';

vi.mock('@/lib/notify', () => ({ notifyError: vi.fn(), notifyDone: vi.fn() }));

const EDITOR_VIEW: Workshop = {
  id: 'w1',
  slug: 'harrow-lane-garage',
  name: 'Harrow Lane Garage',
  description: '',
  logoUrl: null,
  disabled: false,
  role: 'editor',
  createdAt: '2026-12-01T00:00:00.000Z',
  showMemberNames: false,
};

const WORKSHOP_PATH = /^\/workshops\/w1$/;
// Mantine's label element wraps the description too, so the switch's name starts with its label.
const NAMES = /^Show members' names on public pages/;

function renderPage(view: Workshop, patch?: { status: number; body: (body: unknown) => unknown }) {
  let stored = view;
  const requests = stubApi([
    { path: WORKSHOP_PATH, body: () => stored },
    { path: /^\/workshops\/w1\/fit-reports\?status=new$/, body: [] },
    { path: /^\/workshops\/w1\/media-settings$/, body: { keepOriginals: true } },
    { path: /^\/workshops$/, body: [] },
    {
      method: 'PATCH',
      path: WORKSHOP_PATH,
      reply: ({ body }) => {
        if (patch) return { status: patch.status, body: patch.body(body) };
        stored = { ...stored, ...(body as Partial<Workshop>) };
        return { status: 200, body: stored };
      },
    },
  ]);
  renderWithProviders(<WorkshopSettingsPage workshopId="w1" />, { route: '/workshops/w1/settings' });
  return requests;
}

const patches = (requests: ReturnType<typeof stubApi>) =>
  requests.filter((request) => request.method === 'PATCH').map((request) => [request.url.pathname, request.body]);

describe('workshop settings: members’ names on public pages', () => {
  afterEach(() => vi.restoreAllMocks());

  it('is off by default and an editor turns it on', async () => {
    const requests = renderPage(EDITOR_VIEW);
    expect(await screen.findByRole('heading', { name: 'Public pages' })).toBeTruthy();
    const toggle = (await screen.findByRole('switch', { name: NAMES })) as HTMLInputElement;
    expect(toggle.checked).toBe(false);
    expect(toggle.disabled).toBe(false);
    expect(screen.getByText(/say which member confirmed each check/)).toBeTruthy();

    fireEvent.click(toggle);
    await waitFor(() => expect(patches(requests)).toEqual([['/api/workshops/w1', { showMemberNames: true }]]));
    await waitFor(() => expect((screen.getByRole('switch', { name: NAMES }) as HTMLInputElement).checked).toBe(true));
    await waitFor(() => expect((screen.getByRole('switch', { name: NAMES }) as HTMLInputElement).disabled).toBe(false));
    // Still on once the saved workshop has been read again.
    expect((screen.getByRole('switch', { name: NAMES }) as HTMLInputElement).checked).toBe(true);
  });

  it('an owner turns it off again', async () => {
    const requests = renderPage({ ...EDITOR_VIEW, role: 'owner', showMemberNames: true });
    const toggle = (await screen.findByRole('switch', { name: NAMES })) as HTMLInputElement;
    expect(toggle.checked).toBe(true);
    fireEvent.click(toggle);
    await waitFor(() => expect(patches(requests)).toEqual([['/api/workshops/w1', { showMemberNames: false }]]));
    await waitFor(() => expect((screen.getByRole('switch', { name: NAMES }) as HTMLInputElement).disabled).toBe(false));
    expect((screen.getByRole('switch', { name: NAMES }) as HTMLInputElement).checked).toBe(false);
  });

  it('puts the switch back and says why when the API refuses', async () => {
    renderPage(EDITOR_VIEW, {
      status: 403,
      body: () => ({ statusCode: 403, message: 'This workshop is disabled; nothing in it can be changed.', code: 'forbidden' }),
    });
    fireEvent.click(await screen.findByRole('switch', { name: NAMES }));
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('The setting was not changed');
    expect(alert.textContent).toContain('This workshop is disabled; nothing in it can be changed.');
    expect((screen.getByRole('switch', { name: NAMES }) as HTMLInputElement).checked).toBe(false);
  });

  it('is read-only for a site admin who is not a member', async () => {
    const requests = renderPage({ ...EDITOR_VIEW, role: 'admin', showMemberNames: true });
    const toggle = (await screen.findByRole('switch', { name: NAMES })) as HTMLInputElement;
    expect(toggle.checked).toBe(true);
    expect(toggle.disabled).toBe(true);
    fireEvent.click(toggle);
    expect(patches(requests)).toEqual([]);
  });

  it('is read-only in a disabled workshop', async () => {
    renderPage({ ...EDITOR_VIEW, role: 'owner', disabled: true });
    const toggle = (await screen.findByRole('switch', { name: NAMES })) as HTMLInputElement;
    expect(toggle.checked).toBe(false);
    expect(toggle.disabled).toBe(true);
  });
});
