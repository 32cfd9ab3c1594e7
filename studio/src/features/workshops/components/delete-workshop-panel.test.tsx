import { fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import type { Workshop } from '../api/queries';
import { DeleteWorkshopPanel } from './workshop-settings';

vi.mock('@/lib/notify', () => ({ notifyError: vi.fn(), notifyDone: vi.fn() }));

const workshop: Workshop = {
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

describe('DeleteWorkshopPanel', () => {
  afterEach(() => vi.restoreAllMocks());

  it('keeps the button off until the name is typed exactly, then deletes with that name', async () => {
    const requests = stubApi([{ method: 'DELETE', path: /^\/workshops\/w1$/, status: 204, body: null }]);
    renderWithProviders(<DeleteWorkshopPanel workshop={workshop} />);
    const button = screen.getByRole('button', { name: 'Delete this workshop' });
    const field = screen.getByLabelText("Type the workshop's name, Harrow Lane Garage, to confirm");
    fireEvent.change(field, { target: { value: 'harrow lane garage' } });
    expect((button as HTMLButtonElement).disabled).toBe(true);
    fireEvent.change(field, { target: { value: 'Harrow Lane Garage' } });
    expect((button as HTMLButtonElement).disabled).toBe(false);
    fireEvent.click(button);
    await waitFor(() => expect(requests.filter((request) => request.method === 'DELETE').map((request) => [request.url.pathname, request.body])).toEqual([
      ['/api/workshops/w1', { confirmName: 'Harrow Lane Garage' }],
    ]));
  });

  it('shows the server’s refusal as a sentence', async () => {
    stubApi([{ method: 'DELETE', path: /^\/workshops\/w1$/, status: 403, body: { statusCode: 403, message: 'Only an owner may do this.' } }]);
    renderWithProviders(<DeleteWorkshopPanel workshop={workshop} />);
    fireEvent.change(screen.getByLabelText(/Type the workshop's name/), { target: { value: 'Harrow Lane Garage' } });
    fireEvent.click(screen.getByRole('button', { name: 'Delete this workshop' }));
    expect((await screen.findByRole('alert')).textContent).toContain('Only an owner may do this.');
  });
});
