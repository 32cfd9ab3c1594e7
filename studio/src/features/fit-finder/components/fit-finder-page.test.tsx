import { fireEvent, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import { formatDate } from '@/lib/dates';
import type { FitFinderAnswer, FitFinderResult } from '../api/queries';
import { FitFinderPage } from './fit-finder-page';

const MATCH: FitFinderResult = {
  verdict: 'match',
  state: 'confirmed',
  workshop: { name: 'Harrow Lane Garage', slug: 'harrow-lane-garage' },
  guide: { title: 'Fitting the 21-tooth coupler stack', slug: 'fitting', path: '/guides/harrow-lane-garage/fitting', revision: 1, publishedAt: '2026-11-02T10:00:00.000Z' },
  buildTitle: 'Motor-to-gearbox coupler',
  vehicle: 'Compact pickup, 1980s, electric conversion',
  assembly: '21-tooth coupler stack',
  checks: [
    {
      id: 'c1',
      title: 'Spline match: coupler to gearbox input',
      criterion: 'spline',
      state: 'confirmed',
      verdict: 'match',
      reasons: ['21 teeth on both', 'pitch diameter 1.3125 in'],
      measurements: [{ feature: 'OM-G5-IN pilot nose', value: '0.5902 in', unit: 'in', millimetres: 14.99108, instrument: 'outside_micrometer', takenAt: '2026-11-01T10:00:00.000Z' }],
      confirmedAt: '2026-11-03T10:00:00.000Z',
      confirmedBy: 'Rowan Avery',
      evidenceAtSeconds: 41.5,
    },
  ],
  fitReports: { fit: 2, noFit: 1 },
  link: '/guides/harrow-lane-garage/fitting?t=41.5',
};

const NEAR: FitFinderResult = {
  ...MATCH,
  verdict: 'near_miss',
  state: 'bench_pass',
  workshop: { name: 'Quarry Hill Fabrication', slug: 'quarry-hill-fabrication' },
  guide: { ...MATCH.guide, title: 'A 24/48-pitch coupler', path: '/guides/quarry-hill-fabrication/coupler' },
  checks: [{ ...MATCH.checks[0], id: 'c2', state: 'bench_pass', verdict: 'near_miss', reasons: ['same teeth, other pitch: 16/32 asked, this is 24/48'], confirmedAt: null, confirmedBy: null, evidenceAtSeconds: null, measurements: [] }],
  link: '/guides/quarry-hill-fabrication/coupler',
};

const ANSWER: FitFinderAnswer = {
  understood: ['spline: 21 teeth, 16/32 diametral pitch (ANSI B92.1)'],
  total: 1,
  totalCapped: false,
  offset: 0,
  limit: 10,
  results: [MATCH],
  nearMissTotal: 1,
  nearMissCapped: false,
  nearMisses: [NEAR],
};

describe('FitFinderPage', () => {
  afterEach(() => vi.restoreAllMocks());

  it('sends the spline as typed and shows matches with their state, and near misses apart with the reason', async () => {
    const requests = stubApi([{ path: /^\/fit-finder\?/, body: ANSWER }]);
    renderWithProviders(<FitFinderPage />, { route: '/fit-finder' });
    fireEvent.change(screen.getByLabelText('Teeth'), { target: { value: '21' } });
    fireEvent.change(screen.getByLabelText(/^Pitch/), { target: { value: '16/32' } });
    fireEvent.click(screen.getByRole('button', { name: 'Find proven fits' }));

    const match = await screen.findByTestId('finder-result', {}, { timeout: 10_000 });
    const sent = requests.at(-1)!.url.searchParams;
    expect([sent.get('splineTeeth'), sent.get('splinePitch'), sent.get('unit'), sent.get('limit')]).toEqual(['21', '16/32', 'mm', '10']);
    // The result's state and its check's state, each with its words beside the glyph.
    expect(within(match).getAllByText('Confirmed on the vehicle')).toHaveLength(2);
    expect(within(match).getByRole('link', { name: 'Fitting the 21-tooth coupler stack' }).getAttribute('href')).toBe('/guides/harrow-lane-garage/fitting?t=41.5');
    expect(within(match).getByRole('link', { name: 'Open the guide at the evidence' })).toBeTruthy();
    expect(within(match).getByText(`Confirmed by Rowan Avery on ${formatDate('2026-11-03T10:00:00.000Z')}`)).toBeTruthy();
    expect(within(match).getByText('Measured: OM-G5-IN pilot nose 0.5902 in')).toBeTruthy();
    expect(within(match).getByText('Fit reports: 2 it fit · 1 it did not')).toBeTruthy();
    expect(match.querySelector('[data-icon="confirmed"]')).not.toBeNull();

    const near = screen.getByTestId('finder-near-miss');
    expect(within(near).getByText('Near miss')).toBeTruthy();
    expect(within(near).getByText('same teeth, other pitch: 16/32 asked, this is 24/48')).toBeTruthy();
    expect(within(near).getByRole('link', { name: 'Open the guide' })).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'Near misses' })).toBeTruthy();
  }, 30_000);

  it('shows the API’s refusal naming the field', async () => {
    stubApi([{ path: /^\/fit-finder\?/, status: 400, body: { statusCode: 400, message: 'splinePitch: cannot read spline pitch "sixteen"' } }]);
    renderWithProviders(<FitFinderPage />, { route: '/fit-finder?splineTeeth=21&splinePitch=sixteen' });
    expect(await screen.findByText('splinePitch: cannot read spline pitch "sixteen"', {}, { timeout: 10_000 })).toBeTruthy();
  }, 30_000);

  it('asks nothing until something is described', () => {
    const requests = stubApi([]);
    renderWithProviders(<FitFinderPage />, { route: '/fit-finder' });
    expect(screen.getByText(/Give at least one thing you have/)).toBeTruthy();
    expect(requests).toHaveLength(0);
  });
});
