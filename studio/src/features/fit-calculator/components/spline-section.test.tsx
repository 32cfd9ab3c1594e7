import { fireEvent, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import { SplineSection } from './spline-section';

/** A length as the API gives it; the millimetres are the inches × 25.4 (exact conversion). */
function inches(value: number) {
  return { value, unit: 'in', converted: { value: Math.round(value * 25.4 * 1e6) / 1e6, unit: 'mm' } };
}

// 21T 16/32 30° flat root side fit, worked from the ANSI B92.1 equations (see api/src/engine/splines.spec.ts):
// D = 21/16, Db = D cos 30°, p = π/16, E = T = π/32, Dri = 22.35/16, Do = 22/16, Di = 20/16, Dre = 19.65/16,
// cF = 0.002 (0.001 D = 0.0013 raised to the minimum), DFi = 1.375 + 0.004, DFe = 1.25 − 0.004.
const ANSWER = {
  designation: '21T 16/32 DP 30° flat root side fit (ANSI B92.1)',
  standard: 'ANSI B92.1',
  teeth: 21,
  pitch: '16/32',
  pressureAngle: 30,
  root: 'flat',
  fit: 'side',
  unit: 'in',
  dimensions: {
    pitchDiameter: inches(1.3125),
    baseDiameter: inches(1.13665835),
    circularPitch: inches(0.19634954),
    basicSpaceWidth: inches(0.09817477),
    basicToothThickness: inches(0.09817477),
    internalMajorDiameter: inches(1.396875),
    externalMajorDiameter: inches(1.375),
    internalMinorDiameter: inches(1.25),
    externalMinorDiameter: inches(1.228125),
    internalFormDiameter: inches(1.379),
    externalFormDiameter: inches(1.246),
    formClearance: inches(0.002),
  },
  notes: ['ANSI B92.1: D = N/P'],
};

describe('SplineSection', () => {
  afterEach(() => vi.restoreAllMocks());

  it('asks the API and shows each basic dimension with its conversion, and the key-diameter drawing', async () => {
    const requests = stubApi([{ path: /^\/tools\/splines\?/, body: ANSWER }]);
    renderWithProviders(<SplineSection />);
    fireEvent.click(screen.getByRole('button', { name: 'Show dimensions' }));
    const table = await screen.findByRole('table', { name: 'Spline basic dimensions' });
    const row = within(table).getByText('External major diameter (shaft)').closest('tr');
    expect(row?.textContent).toBe('External major diameter (shaft)1.3750 in34.925 mm'); // 1.375 × 25.4 = 34.925
    expect(screen.getByTestId('spline-diameters-diagram')).toBeTruthy();
    expect(screen.getByText('ANSI B92.1: D = N/P')).toBeTruthy();
    expect(requests[0]?.url.search).toBe('?teeth=21&pitch=16%2F32&pressureAngle=30&root=flat&fit=side');
  });

  it('switches to a fillet root side fit when the pressure angle is 37.5° or 45°', async () => {
    const requests = stubApi([{ path: /^\/tools\/splines\?/, body: ANSWER }]);
    renderWithProviders(<SplineSection />);
    fireEvent.click(screen.getByRole('radio', { name: '45°' }));
    fireEvent.click(screen.getByRole('button', { name: 'Show dimensions' }));
    await screen.findByTestId('spline-result');
    expect(requests[0]?.url.searchParams.get('root')).toBe('fillet');
    expect(requests[0]?.url.searchParams.get('fit')).toBe('side');
  });

  it("puts the API's complaint about the pitch under the pitch", async () => {
    stubApi([
      {
        path: /^\/tools\/splines\?/,
        status: 400,
        body: { statusCode: 400, message: 'pitch: 14 is not an ANSI B92.1 diametral pitch; standard pitches are 2.5/5, 3/6' },
      },
    ]);
    renderWithProviders(<SplineSection />);
    fireEvent.change(screen.getByRole('combobox', { name: 'Pitch' }), { target: { value: '14/28' } });
    fireEvent.click(screen.getByRole('button', { name: 'Show dimensions' }));
    expect(await screen.findByText(/14 is not an ANSI B92.1 diametral pitch/)).toBeTruthy();
    expect(screen.getByRole('combobox', { name: 'Pitch' }).getAttribute('aria-invalid')).toBe('true');
  });

  it('checks the tooth count before asking', async () => {
    const requests = stubApi([]);
    renderWithProviders(<SplineSection />);
    fireEvent.change(screen.getByRole('textbox', { name: 'Teeth' }), { target: { value: 'twenty' } });
    fireEvent.click(screen.getByRole('button', { name: 'Show dimensions' }));
    expect(await screen.findByText('Count the teeth: a whole number such as 21')).toBeTruthy();
    expect(requests).toHaveLength(0);
  });
});
