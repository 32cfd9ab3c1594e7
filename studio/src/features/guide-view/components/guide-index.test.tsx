import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import { GuideIndex } from './guide-index';
import { formatDate } from '@/lib/dates';
import type { PublishedGuideSummary } from '../api/types';

const CARD: PublishedGuideSummary = {
  workshop: { name: 'Harrow Lane Garage', slug: 'harrow-lane-garage' },
  slug: 'motor-to-gearbox-coupler',
  title: 'Fitting the motor-to-gearbox coupler',
  buildTitle: 'Motor-to-gearbox coupler',
  publishedAt: '2026-03-02T10:00:00.000Z',
  revision: 2,
  stepCount: 5,
  skillLevel: 'seasoned_fitter',
  estimatedMinutes: 180,
  posterUrl: '/api/guides/harrow-lane-garage/motor-to-gearbox-coupler/poster',
  path: '/guides/harrow-lane-garage/motor-to-gearbox-coupler',
};

describe('GuideIndex', () => {
  afterEach(() => vi.restoreAllMocks());

  it('shows each published guide as a card that links to it', async () => {
    stubApi([{ path: /^\/guides$/, body: [CARD] }]);
    renderWithProviders(<GuideIndex />, { route: '/guides' });
    const card = await screen.findByTestId('guide-card');
    const link = within(card).getByRole('link', { name: 'Fitting the motor-to-gearbox coupler' });
    expect(link.getAttribute('href')).toBe('/guides/harrow-lane-garage/motor-to-gearbox-coupler');
    expect(within(card).getByText('Harrow Lane Garage')).toBeTruthy();
    expect(within(card).getByText('Build: Motor-to-gearbox coupler')).toBeTruthy();
    expect(within(card).getByText(`Revision 2 · ${formatDate('2026-03-02T10:00:00.000Z')} · 5 steps`)).toBeTruthy();
    expect(within(card).getByTestId('guide-skill').textContent).toBe('Skill: Seasoned fitter (3 of 3)');
    expect(within(card).getByTestId('guide-time').textContent).toBe('Time: about 3 h');
  });

  it('asks the API with the search once typing pauses', async () => {
    const requests = stubApi([
      { path: /^\/guides\?q=spline$/, body: [] },
      { path: /^\/guides$/, body: [CARD] },
    ]);
    renderWithProviders(<GuideIndex />, { route: '/guides' });
    await screen.findByTestId('guide-card');
    fireEvent.change(screen.getByRole('searchbox', { name: 'Search guides' }), { target: { value: 'spline ' } });
    expect(await screen.findByText('No published guide matches “spline”.')).toBeTruthy();
    await waitFor(() => expect(requests.at(-1)?.url.search).toBe('?q=spline'));
  });
});
