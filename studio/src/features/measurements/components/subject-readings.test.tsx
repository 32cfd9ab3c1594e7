import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import { SubjectReadings } from './subject-readings';

const IN = 25_400_000;
const reading = (id: string, value: string, valueNm: number) => ({
  id,
  featureId: 'f1',
  interfaceId: null,
  quantity: 'diameter',
  value,
  unit: 'in',
  valueNm,
  shown: `${value} in`,
  instrument: { kind: 'outside_micrometer', resolutionNm: 2540, resolution: '0.0001', calibratedOn: '2026-01-10', note: '' },
  temperatureC: 20,
  takenBy: 'u1',
  takenAt: '2026-03-02T10:00:00.000Z',
  footageId: null,
  footageTimeMs: null,
  note: '',
});

// 0.6692 in and 0.6690 in, read with a 0.0001 in micrometer.
const LIST = {
  measurements: [reading('m1', '0.6692', 0.6692 * IN), reading('m2', '0.6690', 0.669 * IN)],
  // Mean (0.6692 + 0.6690) / 2 = 0.6691 in = 0.6691 × 25 400 000 nm = 16 995 140 nm; spread 0.0002 in = 5 080 nm.
  summary: { count: 2, unit: 'in', meanNm: 16_995_140, spreadNm: 5_080, mean: '0.6691 in', spread: '0.0002 in' },
};

function show() {
  stubApi([{ path: /^\/workshops\/w1\/measurements\?featureId=f1$/, body: LIST }]);
  renderWithProviders(
    <SubjectReadings workshopId="w1" subject={{ featureId: 'f1' }} defaultUnit="in" defaultQuantity="diameter" label="pilot bore" />,
  );
}

describe('SubjectReadings', () => {
  afterEach(() => vi.restoreAllMocks());

  it('shows each reading as taken, and the summary', async () => {
    show();
    expect(await screen.findByText('2 readings · mean 0.6691 in · spread 0.0002 in')).toBeTruthy();
    const asTaken = screen.getAllByTestId('reading-as-taken').map((cell) => cell.textContent);
    expect(asTaken).toEqual(['0.6692 in', '0.6690 in']);
    expect(screen.getAllByTestId('reading-converted').map((cell) => cell.textContent)).toEqual(['0.6692 in', '0.6690 in']);
  });

  it('converts to the unit toggled, keeping the instrument resolution’s decimals', async () => {
    show();
    await screen.findByText(/2 readings/);
    const toggle = screen.getByRole('radiogroup');
    fireEvent.click(within(toggle).getByLabelText('mm'));
    // 0.0001 in is 2.54 µm: three decimals of a millimetre, no more. 0.6692 × 25.4 = 16.99768 → 16.998;
    // 0.6690 × 25.4 = 16.9926 → 16.993; mean 0.6691 × 25.4 = 16.99514 → 16.995; spread 0.0002 × 25.4 = 0.00508 → 0.005.
    await waitFor(() =>
      expect(screen.getAllByTestId('reading-converted').map((cell) => cell.textContent)).toEqual(['16.998 mm', '16.993 mm']),
    );
    expect(screen.getByRole('columnheader', { name: 'Converted (mm)' })).toBeTruthy();
    expect(screen.getByTestId('readings-summary').textContent).toContain('(mean 16.995 mm, spread 0.005 mm)');
    // The reading as taken never changes.
    expect(screen.getAllByTestId('reading-as-taken')[0].textContent).toBe('0.6692 in');

    fireEvent.click(within(toggle).getByLabelText('thou'));
    // 0.6692 in = 669.2 thou (1 thou = 0.001 in), one decimal for the 0.0001 in step.
    await waitFor(() =>
      expect(screen.getAllByTestId('reading-converted').map((cell) => cell.textContent)).toEqual(['669.2 thou', '669.0 thou']),
    );
  });

  it('puts the API’s message under the field it names', async () => {
    const requests = stubApi([
      { path: /^\/workshops\/w1\/measurements\?featureId=f1$/, body: LIST },
      { path: /^\/auth\/me$/, body: { user: null } },
      {
        method: 'POST',
        path: /^\/workshops\/w1\/measurements$/,
        status: 400,
        body: {
          statusCode: 400,
          message: 'resolution: "0.00001" is not a whole number of nanometres in in; round it to the instrument\'s resolution',
        },
      },
    ]);
    renderWithProviders(
      <SubjectReadings workshopId="w1" subject={{ featureId: 'f1' }} defaultUnit="in" defaultQuantity="diameter" label="pilot bore" />,
    );
    fireEvent.click(await screen.findByRole('button', { name: 'Add reading' }));
    fireEvent.change(screen.getByRole('textbox', { name: /^Reading/ }), { target: { value: '0.66915' } });
    fireEvent.change(screen.getByRole('textbox', { name: /^Resolution/ }), { target: { value: '0.00001' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save reading' }));
    expect(await screen.findByText(/^Resolution: "0.00001" is not a whole number of nanometres/)).toBeTruthy();
    const post = requests.find((request) => request.method === 'POST');
    expect(post?.body).toMatchObject({ featureId: 'f1', value: '0.66915', unit: 'in', resolution: '0.00001', quantity: 'diameter' });
  });
});
