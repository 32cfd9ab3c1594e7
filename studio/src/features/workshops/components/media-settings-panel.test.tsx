import { fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import type { Workshop } from '../api/queries';
import { MediaSettingsPanel } from './media-settings-panel';
import { WorkshopSettingsPage } from './workshop-settings';

vi.mock('@/lib/notify', () => ({ notifyError: vi.fn(), notifyDone: vi.fn() }));

const OWNER_VIEW: Workshop = {
  id: 'w1',
  slug: 'harrow-lane-garage',
  name: 'Harrow Lane Garage',
  description: '',
  logoUrl: null,
  disabled: false,
  role: 'owner',
  createdAt: '2026-12-01T00:00:00.000Z',
  showMemberNames: false,
};

const SETTINGS_PATH = /^\/workshops\/w1\/media-settings$/;
// Mantine's label element wraps the description too, so the switch's name starts with its label.
const KEEP = /^Keep original uploads/;

describe('MediaSettingsPanel', () => {
  afterEach(() => vi.restoreAllMocks());

  it('shows the stored choice and sends the new one when the owner switches it', async () => {
    const requests = stubApi([
      { path: SETTINGS_PATH, body: { keepOriginals: true } },
      { method: 'PUT', path: SETTINGS_PATH, body: ({ body }: { body: unknown }) => body },
    ]);
    renderWithProviders(<MediaSettingsPanel workshop={OWNER_VIEW} />);
    const toggle = (await screen.findByRole('switch', { name: KEEP })) as HTMLInputElement;
    expect(toggle.checked).toBe(true);
    expect(screen.getByText(/can be made again later/)).toBeTruthy();

    fireEvent.click(toggle);
    await waitFor(() => expect(requests.filter((request) => request.method === 'PUT').map((request) => [request.url.pathname, request.body])).toEqual([
      ['/api/workshops/w1/media-settings', { keepOriginals: false }],
    ]));
    await waitFor(() => expect((screen.getByRole('switch', { name: KEEP }) as HTMLInputElement).checked).toBe(false));
    expect(screen.getByText(/Originals are deleted once their web versions are ready/)).toBeTruthy();
  });

  it('puts the switch back and says why when the API refuses', async () => {
    stubApi([
      { path: SETTINGS_PATH, body: { keepOriginals: true } },
      { method: 'PUT', path: SETTINGS_PATH, status: 403, body: { statusCode: 403, message: 'Only an owner of this workshop may do this.', code: 'forbidden' } },
    ]);
    renderWithProviders(<MediaSettingsPanel workshop={OWNER_VIEW} />);
    fireEvent.click(await screen.findByRole('switch', { name: KEEP }));
    expect((await screen.findByRole('alert')).textContent).toContain('Only an owner of this workshop may do this.');
    expect((screen.getByRole('switch', { name: KEEP }) as HTMLInputElement).checked).toBe(true);
  });

  it('cannot be changed in a disabled workshop', async () => {
    stubApi([{ path: SETTINGS_PATH, body: { keepOriginals: false } }]);
    renderWithProviders(<MediaSettingsPanel workshop={{ ...OWNER_VIEW, disabled: true }} />);
    const toggle = (await screen.findByRole('switch', { name: KEEP })) as HTMLInputElement;
    expect(toggle.checked).toBe(false);
    expect(toggle.disabled).toBe(true);
  });
});

describe('the workshop settings page: footage storage', () => {
  afterEach(() => vi.restoreAllMocks());

  function renderPageAs(role: Workshop['role']) {
    const requests = stubApi([
      { path: /^\/workshops\/w1$/, body: { ...OWNER_VIEW, role } },
      { path: /^\/workshops\/w1\/fit-reports\?status=new$/, body: [] },
      { path: SETTINGS_PATH, body: { keepOriginals: true } },
    ]);
    renderWithProviders(<WorkshopSettingsPage workshopId="w1" />, { route: '/workshops/w1/settings' });
    return requests;
  }

  it('offers the choice to owners', async () => {
    renderPageAs('owner');
    expect(await screen.findByRole('heading', { name: 'Footage storage' })).toBeTruthy();
    expect(await screen.findByRole('switch', { name: KEEP })).toBeTruthy();
  });

  it('leaves it out for editors, without asking the API', async () => {
    const requests = renderPageAs('editor');
    expect(await screen.findByRole('heading', { name: 'Details' })).toBeTruthy();
    expect(screen.queryByRole('heading', { name: 'Footage storage' })).toBeNull();
    expect(screen.queryByRole('switch', { name: KEEP })).toBeNull();
    expect(requests.some((request) => request.url.pathname.endsWith('/media-settings'))).toBe(false);
  });
});
