import { fireEvent, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import { FeatureForm } from './feature-form';
import { pitchFromDesignation, readingForIdentify } from './spline-identify-offer';

/*
 * What the API answers for 20 teeth at 26.67 mm (worked in api/src/engine/splines.spec.ts):
 * 20/40 DP Do = (20 + 1)/20 = 1.05 in = 26.67 mm exactly; m1.25 Dee = 1.25 × 21 = 26.25 mm, 0.42 mm under.
 */
const IDENTIFIED = {
  teeth: 20,
  feature: 'major',
  measured: { value: 26.67, unit: 'mm', resolution: 0.01 },
  candidates: [
    {
      designation: '20T 20/40 DP 30° flat root side fit (ANSI B92.1)',
      standard: 'ANSI B92.1',
      pitch: '20/40',
      pressureAngle: 30,
      alsoFits: [],
      basicDiameter: { value: 1.05, unit: 'in', converted: { value: 26.67, unit: 'mm' } },
      deviation: { value: 0, unit: 'mm' },
      explainsReading: true,
    },
    {
      designation: '20T m1.25 30° flat root side fit (ISO 4156)',
      standard: 'ISO 4156 / ANSI B92.2M',
      pitch: 'm1.25',
      pressureAngle: 30,
      alsoFits: [],
      basicDiameter: { value: 26.25, unit: 'mm', converted: { value: 1.03346457, unit: 'in' } },
      deviation: { value: 0.42, unit: 'mm' },
      explainsReading: false,
    },
  ],
  pitfalls: ['inch/metric swap: 20T 20/40 DP … and 20T m1.25 … differ by only 0.42 mm on this diameter'],
  rule: "Fitwright's own rule, not a standard's: …",
};

describe('readingForIdentify', () => {
  it('sends inches or millimetres exactly, with the resolution its decimals state', () => {
    expect(readingForIdentify('26.67', 'mm')).toEqual({ value: 26.67, unit: 'mm', resolution: 0.01 });
    expect(readingForIdentify('1.0500', 'in')).toEqual({ value: 1.05, unit: 'in', resolution: 0.0001 });
    // 1050 thou = 1.05 in; one thou (no decimals written) leaves the resolution to the API's default.
    expect(readingForIdentify('1050', 'thou')).toEqual({ value: 1.05, unit: 'in', resolution: undefined });
    expect(readingForIdentify('26670', 'um')).toEqual({ value: 26.67, unit: 'mm', resolution: undefined });
    expect(readingForIdentify('1.2505 in', 'mm')).toEqual({ value: 1.2505, unit: 'in', resolution: 0.0001 }); // the text's unit wins
    expect(readingForIdentify('about an inch', 'in')).toBeNull();
  });
});

describe('pitchFromDesignation', () => {
  it('reads "16/32" as diametral 16 with stub 32, and "m1.25" as module 1.25', () => {
    expect(pitchFromDesignation('16/32')).toEqual({ system: 'diametral', diametralPitch: 16, stubPitch: 32 });
    expect(pitchFromDesignation('m1.25')).toEqual({ system: 'module', module: 1.25 });
    expect(pitchFromDesignation('fine')).toBeNull();
  });
});

describe('identification offered where a spline is recorded', () => {
  afterEach(() => vi.restoreAllMocks());

  it('asks with the teeth and the major diameter, flags the swap, and "Use" fills the pitch', async () => {
    const requests = stubApi([{ path: /^\/tools\/splines\/identify\?/, body: IDENTIFIED }]);
    const onSubmit = vi.fn();
    renderWithProviders(<FeatureForm pending={false} onSubmit={onSubmit} />);
    fireEvent.change(screen.getByRole('textbox', { name: 'Name' }), { target: { value: 'motor shaft spline' } });
    fireEvent.change(screen.getByRole('textbox', { name: 'Teeth' }), { target: { value: '20' } });
    fireEvent.change(screen.getByRole('textbox', { name: 'Major diameter' }), { target: { value: '26.67' } });
    fireEvent.click(screen.getByRole('button', { name: 'Identify from the measured diameter' }));

    const table = await screen.findByRole('table', { name: 'Candidate designations' });
    expect(requests[0]?.url.search).toBe('?teeth=20&majorDiameter=26.67&unit=mm&resolution=0.01');
    expect(screen.getByTestId('spline-pitfall').textContent).toMatch(/inch\/metric swap/);
    expect(within(table).getByText('+0.42 mm')).toBeTruthy();
    expect(within(table).getByText('1.05 in (26.67 mm)')).toBeTruthy();

    fireEvent.click(within(table).getByRole('button', { name: 'Use 20T 20/40 DP 30° flat root side fit (ANSI B92.1)' }));
    fireEvent.click(screen.getByRole('button', { name: 'Add feature' }));
    expect(onSubmit).toHaveBeenCalledTimes(1);
    expect(onSubmit.mock.calls[0]?.[0]).toMatchObject({ teeth: 20, diametralPitch: 20, stubPitch: 40, majorDiameter: '26.67' });
  }, 30_000);

  it('asks for the bore of a hub and sends it as the minor diameter', async () => {
    const requests = stubApi([{ path: /^\/tools\/splines\/identify\?/, body: { ...IDENTIFIED, feature: 'minor', pitfalls: [] } }]);
    renderWithProviders(<FeatureForm pending={false} onSubmit={vi.fn()} />);
    fireEvent.change(screen.getByRole('textbox', { name: 'Teeth' }), { target: { value: '21' } });
    fireEvent.click(screen.getByRole('radio', { name: 'Internal (hub)' }));
    fireEvent.change(screen.getByRole('textbox', { name: 'Measured bore (minor diameter)' }), { target: { value: '1.2505 in' } });
    fireEvent.click(screen.getByRole('button', { name: 'Identify from the measured diameter' }));
    await screen.findByRole('table', { name: 'Candidate designations' });
    expect(requests[0]?.url.search).toBe('?teeth=21&minorDiameter=1.2505&unit=in&resolution=0.0001');
  }, 30_000);

  it('says what is missing instead of asking', () => {
    const requests = stubApi([]);
    renderWithProviders(<FeatureForm pending={false} onSubmit={vi.fn()} />);
    fireEvent.click(screen.getByRole('button', { name: 'Identify from the measured diameter' }));
    expect(screen.getByRole('alert').textContent).toBe('Count the teeth first.');
    expect(requests).toHaveLength(0);
  });
});
