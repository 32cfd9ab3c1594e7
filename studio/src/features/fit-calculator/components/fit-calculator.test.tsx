import { fireEvent, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import { FitCalculator } from './fit-calculator';

describe('FitCalculator', () => {
  afterEach(() => vi.restoreAllMocks());

  it('answers the question in the address with limits, clearance, kind and the zone diagram', async () => {
    const requests = stubApi([
      {
        path: /^\/tools\/fits\?/,
        // ISO 286-2, 18–30 mm: H7 +21/0, g6 −7/−20 µm; clearance 21 − (−20) = 41 and 0 − (−7) = 7 µm.
        body: {
          hole: { upper: 21, lower: 0 },
          shaft: { upper: -7, lower: -20 },
          clearance: { max: 41, min: 7 },
          kind: 'clearance',
          convention: { jsRounding: 'none', description: 'js/JS = ±IT/2 exactly, as in the current ISO 286-2 tables' },
        },
      },
    ]);
    renderWithProviders(<FitCalculator />, { route: '/tools/fit-calculator?size=25&unit=mm&hole=H7&shaft=g6' });
    expect(await screen.findByTestId('fit-kind')).toBeTruthy();
    expect(screen.getByTestId('fit-kind').textContent).toMatch(/^Clearance fit/);
    const limits = screen.getByRole('table', { name: 'Limits' });
    expect(within(limits).getByText('25.021 mm')).toBeTruthy();
    expect(within(limits).getByText('24.980 mm')).toBeTruthy();
    expect(screen.getByTestId('tolerance-zone-diagram')).toBeTruthy();
    expect(screen.getByTestId('fit-convention').textContent).toBe('Convention: js/JS = ±IT/2 exactly, as in the current ISO 286-2 tables.');
    expect(requests[0].url.search).toBe('?size=25&unit=mm&hole=H7&shaft=g6');
  });

  it('puts the API’s complaint about a class under that class', async () => {
    stubApi([
      {
        path: /^\/tools\/fits\?/,
        status: 400,
        body: { statusCode: 400, message: ['shaft must be a shaft tolerance class such as g6'], errors: { shaft: 'shaft must be a shaft tolerance class such as g6' } },
      },
    ]);
    renderWithProviders(<FitCalculator />, { route: '/tools/fit-calculator?size=25&unit=mm&hole=H7&shaft=zz99' });
    expect(await screen.findByText('Shaft class must be a shaft tolerance class such as g6')).toBeTruthy();
  });

  it('checks the classes before asking', async () => {
    const requests = stubApi([]);
    renderWithProviders(<FitCalculator />, { route: '/tools/fit-calculator' });
    fireEvent.change(screen.getByRole('combobox', { name: 'Hole class' }), { target: { value: 'h7' } });
    fireEvent.click(screen.getByRole('button', { name: 'Calculate' }));
    expect(await screen.findByText('A hole class is written in capitals, e.g. H7')).toBeTruthy();
    expect(requests).toHaveLength(0);
  });
});
