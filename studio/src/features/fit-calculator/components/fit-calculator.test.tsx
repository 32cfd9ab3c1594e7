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
    expect(screen.queryByTestId('press-caution')).toBeNull();
  });

  it('carries the usual pressing caution on an interference fit, and none on a clearance fit', async () => {
    stubApi([
      {
        path: /^\/tools\/fits\?/,
        // ISO 286-2, 18–30 mm: H7 +21/0, p6 +35/+22 µm; clearance 21 − 22 = −1 and 0 − 35 = −35 µm: always interference.
        body: {
          hole: { upper: 21, lower: 0 },
          shaft: { upper: 35, lower: 22 },
          clearance: { max: -1, min: -35 },
          kind: 'interference',
          convention: { jsRounding: 'none', description: 'js/JS = ±IT/2 exactly, as in the current ISO 286-2 tables' },
        },
      },
    ]);
    renderWithProviders(<FitCalculator />, { route: '/tools/fit-calculator?size=25&unit=mm&hole=H7&shaft=p6' });
    const caution = await screen.findByTestId('press-caution');
    expect(caution.getAttribute('data-level')).toBe('WARNING');
    expect(caution.querySelector('[data-symbol="safety-alert"]')).toBeTruthy();
    expect(caution.textContent).toMatch(/eye protection.*line of force.*heat-resistant gloves/);
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

  it('asks for the older js/JS rounding only when ticked, and says on screen which convention applied', async () => {
    const requests = stubApi([
      {
        path: /^\/tools\/fits\?/,
        // ISO 286-2, 18–30 mm: IT7 = 21 µm, rounded down to 20 → JS7 ±10 µm; h6 0/−13 µm.
        body: {
          hole: { upper: 10, lower: -10 },
          shaft: { upper: 0, lower: -13 },
          clearance: { max: 23, min: -10 },
          kind: 'transition',
          convention: { jsRounding: 'even', description: 'js/JS = ±IT/2 with odd IT7–IT11 rounded down to even (older practice)' },
        },
      },
    ]);
    renderWithProviders(<FitCalculator />, { route: '/tools/fit-calculator' });
    fireEvent.change(screen.getByRole('combobox', { name: 'Hole class' }), { target: { value: 'JS7' } });
    fireEvent.change(screen.getByRole('combobox', { name: 'Shaft class' }), { target: { value: 'h6' } });
    fireEvent.click(screen.getByRole('checkbox', { name: /round odd IT7–IT11 down to even/ }));
    fireEvent.click(screen.getByRole('button', { name: 'Calculate' }));
    expect(await screen.findByTestId('fit-convention')).toBeTruthy();
    expect(screen.getByTestId('fit-convention').textContent).toBe('Convention: js/JS = ±IT/2 with odd IT7–IT11 rounded down to even (older practice).');
    expect(requests[0]?.url.searchParams.get('jsRounding')).toBe('even');
  }, 30_000);

  it('checks the classes before asking', async () => {
    const requests = stubApi([]);
    renderWithProviders(<FitCalculator />, { route: '/tools/fit-calculator' });
    fireEvent.change(screen.getByRole('combobox', { name: 'Hole class' }), { target: { value: 'h7' } });
    fireEvent.click(screen.getByRole('button', { name: 'Calculate' }));
    expect(await screen.findByText('Hole class must be capital letters and an IT grade, such as H7')).toBeTruthy();
    expect(requests).toHaveLength(0);
  });

  it('takes the old answer away when the next question is invalid, and names the size rule', async () => {
    const requests = stubApi([
      {
        path: /^\/tools\/fits\?/,
        // ISO 286-2, 18–30 mm: H7 +21/0, g6 −7/−20 µm.
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
    expect(await screen.findByTestId('fit-result')).toBeTruthy();
    const size = screen.getByRole('textbox', { name: 'Nominal size' });
    for (const [typed, message] of [
      ['0', 'Nominal size must be greater than 0 mm and at most 500 mm'],
      ['600', 'Nominal size must be greater than 0 mm and at most 500 mm'],
      ['-3', 'Nominal size must be a number such as 25 or 0.984, greater than 0 mm and at most 500 mm'],
    ]) {
      fireEvent.change(size, { target: { value: typed } });
      fireEvent.click(screen.getByRole('button', { name: 'Calculate' }));
      expect(await screen.findByText(message)).toBeTruthy();
      expect(screen.queryByTestId('fit-result')).toBeNull();
    }
    expect(requests).toHaveLength(1);
  }, 30_000);
});
