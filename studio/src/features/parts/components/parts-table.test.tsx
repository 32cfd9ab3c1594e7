import { fireEvent, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import type { Part } from '../api/queries';
import { PartsTable } from './parts-table';

const PART: Part = {
  id: 'p1',
  workshopId: 'w1',
  partNumber: 'HL-2107',
  maker: 'Brackwater Driveline',
  title: '27-tooth motor coupler',
  category: 'coupler',
  source: 'new',
  notes: '',
  photos: [],
  features: [
    {
      id: 'f1',
      partId: 'p1',
      name: 'input spline',
      kind: 'spline',
      unit: 'in',
      spec: { teeth: 27, gender: 'internal', diametralPitch: 16, stubPitch: 32 },
      shown: { pitch: '16/32 DP' },
    },
  ],
  createdAt: '2026-03-01T00:00:00.000Z',
  updatedAt: '2026-03-01T00:00:00.000Z',
};

describe('PartsTable', () => {
  afterEach(() => vi.restoreAllMocks());

  it('lists parts with their features and sends the filters to the API', async () => {
    const requests = stubApi([{ path: /^\/workshops\/w1\/parts/, body: [PART] }]);
    renderWithProviders(<PartsTable workshopId="w1" />);
    expect(await screen.findByText('HL-2107')).toBeTruthy();
    expect(screen.getByText(/27-tooth internal, 16\/32 DP/)).toBeTruthy();
    fireEvent.change(screen.getByRole('textbox', { name: 'Spline teeth' }), { target: { value: '27' } });
    await vi.waitFor(() => expect(requests.some((request) => request.url.searchParams.get('splineTeeth') === '27')).toBe(true));
  });

  it('shows a validation error under its field and a duplicate part number under the part number', async () => {
    let attempt = 0;
    stubApi([
      { path: /^\/workshops\/w1\/parts/, body: [] },
      { path: /^\/auth\/me$/, body: { user: null } },
      {
        method: 'POST',
        path: /^\/workshops\/w1\/parts$/,
        reply: () => {
          attempt += 1;
          return attempt === 1
            ? {
                status: 400,
                body: {
                  statusCode: 400,
                  message: ['partNumber must contain a letter or digit'],
                  errors: { partNumber: 'partNumber must contain a letter or digit' },
                },
              }
            : {
                status: 409,
                body: { statusCode: 409, message: 'Part number HL-2107 is already in this workshop, or two features share a name' },
              };
        },
      },
    ]);
    renderWithProviders(<PartsTable workshopId="w1" />);
    fireEvent.click(await screen.findByRole('button', { name: 'New part' }));
    const form = await screen.findByRole('form', { name: 'Create part' });
    fireEvent.change(within(form).getByRole('textbox', { name: /Part number/ }), { target: { value: '--' } });
    fireEvent.change(within(form).getByRole('textbox', { name: /Title/ }), { target: { value: 'Pilot bearing' } });
    // Mantine's Select is a combobox: open it and pick the option.
    const category = within(form).getByLabelText(/^Category/);
    fireEvent.click(category);
    await vi.waitFor(() => expect(category.getAttribute('aria-controls')).toBeTruthy());
    const listbox = document.getElementById(category.getAttribute('aria-controls')!)!;
    fireEvent.click(within(listbox).getByRole('option', { name: 'Bearing', hidden: true }));
    fireEvent.click(within(form).getByRole('button', { name: 'Create part' }));
    expect(await within(form).findByText('Part number must contain a letter or digit')).toBeTruthy();
    expect(within(form).getByRole('textbox', { name: /Part number/ }).getAttribute('aria-invalid')).toBe('true');

    fireEvent.change(within(form).getByRole('textbox', { name: /Part number/ }), { target: { value: 'HL-2107' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Create part' }));
    expect(await within(form).findByText(/Part number HL-2107 is already in this workshop/)).toBeTruthy();
    expect(within(form).queryByText('Part number must contain a letter or digit')).toBeNull();
  });
});
