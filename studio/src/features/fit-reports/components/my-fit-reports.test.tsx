import { screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import { MyFitReports } from './my-fit-reports';
import { testReport } from './test-reports';

describe('MyFitReports', () => {
  afterEach(() => vi.restoreAllMocks());

  it('lists my reports: outcome, parts, the guide, the status in words and the workshop’s note', async () => {
    stubApi([
      {
        path: /^\/fit-reports$/,
        body: [
          testReport({
            id: 'r2',
            outcome: 'no_fit',
            parts: 'HL-2707 27-tooth coupler',
            status: 'declined',
            creatorNote: 'Your gearbox has the 23-tooth input shaft.',
          }),
          testReport({
            id: 'r1',
            status: 'investigating',
            fitCheck: { id: 'c1', title: 'Coupler slides on by hand', state: 'confirmed', assemblyName: '21-tooth coupler stack' },
            photos: [{ id: 'p1', url: '/api/fit-reports/r1/photos/p1' }],
          }),
        ],
      },
    ]);
    renderWithProviders(<MyFitReports />);
    const list = await screen.findByRole('list', { name: 'My fit reports' });
    const [declined, investigating] = within(list).getAllByTestId('my-fit-report');
    expect(within(declined).getByTestId('report-outcome').textContent).toBe('It did not fit');
    expect(within(declined).getByTestId('report-parts').textContent).toBe('HL-2707 27-tooth coupler');
    expect(within(declined).getByTestId('report-status').textContent).toBe('Declined by the workshop');
    expect(within(declined).getByTestId('creator-note').textContent).toContain('Your gearbox has the 23-tooth input shaft.');
    expect(within(declined).getByRole('link', { name: 'Fitting the motor-to-gearbox coupler' }).getAttribute('href')).toBe(
      '/guides/harrow-lane-garage/motor-to-gearbox-coupler',
    );

    expect(within(investigating).getByTestId('report-outcome').textContent).toBe('It fit');
    expect(within(investigating).getByTestId('report-status').textContent).toBe('Investigating: the workshop is looking into it');
    expect(within(investigating).getByTestId('report-check').textContent).toBe(
      'Checked as “Coupler slides on by hand” (21-tooth coupler stack):Confirmed on the vehicle',
    );
    expect(within(investigating).getByText(/· 1 photo$/)).toBeTruthy();
    expect(within(investigating).queryByTestId('creator-note')).toBeNull();
  });

  it('says how to send one when there is none', async () => {
    stubApi([{ path: /^\/fit-reports$/, body: [] }]);
    renderWithProviders(<MyFitReports />);
    await waitFor(() => expect(screen.getByTestId('my-fit-reports-empty').textContent).toMatch(/You have sent no fit reports/));
    expect(screen.getByRole('link', { name: 'published guide' }).getAttribute('href')).toBe('/guides');
  });
});
