import { screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import type { Workshop } from '../api/queries';
import { WorkshopHeader } from './workshop-header';

const WORKSHOP: Workshop = {
  id: 'w1',
  slug: 'harrow-lane',
  name: 'Harrow Lane Garage',
  description: '',
  logoUrl: null,
  disabled: false,
  role: 'owner',
  createdAt: '2026-12-01T00:00:00.000Z',
  showMemberNames: false,
};

describe('WorkshopHeader', () => {
  afterEach(() => vi.restoreAllMocks());

  it('counts the new fit reports on the Fit reports tab', async () => {
    const requests = stubApi([{ path: /^\/workshops\/w1\/fit-reports\?status=new$/, body: [{ id: 'r1' }, { id: 'r2' }, { id: 'r3' }] }]);
    renderWithProviders(<WorkshopHeader workshop={WORKSHOP} />, { route: '/workshops/w1/builds' });
    const badge = await screen.findByTestId('new-fit-report-count');
    expect(badge.textContent).toBe('3');
    expect(within(screen.getByRole('tab', { name: /Fit reports/ })).getByTestId('new-fit-report-count')).toBe(badge);
    expect(screen.getByRole('tab', { name: /Fit reports/ }).textContent).toContain('3');
    expect(requests[0].url.searchParams.get('status')).toBe('new');
  });

  it('shows no badge when nothing new has arrived', async () => {
    const requests = stubApi([{ path: /^\/workshops\/w1\/fit-reports\?status=new$/, body: [] }]);
    renderWithProviders(<WorkshopHeader workshop={WORKSHOP} />, { route: '/workshops/w1/builds' });
    await vi.waitFor(() => expect(requests).toHaveLength(1));
    expect(screen.getByRole('tab', { name: /Fit reports/ })).toBeTruthy();
    expect(screen.queryByTestId('new-fit-report-count')).toBeNull();
  });
});
