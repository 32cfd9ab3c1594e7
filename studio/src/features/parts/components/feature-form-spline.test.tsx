import { fireEvent, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import type { PartFeature } from '../api/queries';
import { FeatureForm } from './feature-form';

/** A stored 27-tooth hub as the API answers it: `fit` and `toleranceClass` are the spec's names. */
const STORED: PartFeature = {
  id: 'f1',
  partId: 'p1',
  name: 'hub spline',
  kind: 'spline',
  unit: 'in',
  spec: { teeth: 27, gender: 'internal', diametralPitch: 16, stubPitch: 32, pressureAngle: 30, fit: 'side', toleranceClass: 5 },
  shown: { pitch: '16/32 DP', standard: 'ANSI B92.1', pressureAngle: '30°', fit: 'side fit', toleranceClass: 'class 5' },
};

const choice = (group: string, option: string) =>
  within(screen.getByRole('radiogroup', { name: group })).getByRole('radio', { name: option });

describe('the spline attributes the fit finder matches on, in the part feature form', () => {
  afterEach(() => vi.restoreAllMocks());

  it('offers pressure angle, fit and tolerance class as choices and sends them typed', () => {
    stubApi([]);
    const onSubmit = vi.fn();
    renderWithProviders(<FeatureForm pending={false} onSubmit={onSubmit} />);
    expect(
      within(screen.getByRole('radiogroup', { name: 'Pressure angle' }))
        .getAllByRole('radio')
        .map((radio) => radio.getAttribute('value')),
    ).toEqual(['30', '37.5', '45', 'unknown']);
    expect(
      within(screen.getByRole('radiogroup', { name: 'Tolerance class' }))
        .getAllByRole('radio')
        .map((radio) => radio.getAttribute('value')),
    ).toEqual(['4', '5', '6', '7', 'unknown']);
    // Nothing is claimed until someone chooses: all three start at "Not known".
    expect((choice('Fit', 'Not known') as HTMLInputElement).checked).toBe(true);

    fireEvent.change(screen.getByRole('textbox', { name: 'Name' }), { target: { value: 'motor spline' } });
    fireEvent.change(screen.getByRole('textbox', { name: 'Teeth' }), { target: { value: '21' } });
    fireEvent.click(choice('Pressure angle', '37.5°'));
    fireEvent.click(choice('Fit', 'Major diameter'));
    fireEvent.click(choice('Tolerance class', '6'));
    fireEvent.click(screen.getByRole('button', { name: 'Add feature' }));

    expect(onSubmit).toHaveBeenCalledTimes(1);
    expect(onSubmit.mock.calls[0]?.[0]).toMatchObject({ teeth: 21, pressureAngle: 37.5, splineFit: 'major', splineClass: 6 });
  }, 30_000);

  it('shows a stored spline\'s choices when editing, and clears one set back to "Not known"', () => {
    stubApi([]);
    const onSubmit = vi.fn();
    renderWithProviders(<FeatureForm feature={STORED} pending={false} onSubmit={onSubmit} />);
    expect((choice('Pressure angle', '30°') as HTMLInputElement).checked).toBe(true);
    expect((choice('Fit', 'Side fit') as HTMLInputElement).checked).toBe(true);
    expect((choice('Tolerance class', '5') as HTMLInputElement).checked).toBe(true);

    fireEvent.click(choice('Tolerance class', 'Not known'));
    fireEvent.click(screen.getByRole('button', { name: 'Save feature' }));

    expect(onSubmit).toHaveBeenCalledTimes(1);
    expect(onSubmit.mock.calls[0]?.[0]).toMatchObject({ pressureAngle: 30, splineFit: 'side', splineClass: null });
  }, 30_000);
});
