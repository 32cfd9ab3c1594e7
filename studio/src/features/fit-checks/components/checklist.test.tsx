import { Notifications } from '@mantine/notifications';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import { WorkshopAccessProvider } from '@/lib/workshop-access';
import type { Checklist as ChecklistAnswer, FitCheck } from '../api/queries';
import { Checklist } from './checklist';

const mm = (value: number) => Math.round(value * 1_000_000);

const feature = (id: string, name: string, kind: string, unit: string, spec: Record<string, unknown>) => ({
  id,
  partId: id.split('-')[0],
  name,
  kind,
  unit,
  spec,
  shown: {},
});

const ASSEMBLY = {
  id: 'a1',
  buildId: 'b1',
  name: '21-tooth coupler',
  notes: '',
  parts: [
    {
      position: 'input side',
      sortOrder: 0,
      part: { id: 'p1', partNumber: 'HL-2107', features: [feature('p1-bore', 'pilot bore', 'diameter', 'mm', { role: 'hole', nominalNm: mm(15), toleranceClass: 'H7' })] },
    },
    {
      position: 'shaft',
      sortOrder: 1,
      part: {
        id: 'p2',
        partNumber: 'DS-540',
        features: [
          feature('p2-journal', 'pilot journal', 'diameter', 'mm', { role: 'shaft', nominalNm: mm(15), toleranceClass: 'g6' }),
          feature('p2-length', 'overall length', 'length', 'mm', { lengthNm: mm(540), compressedNm: mm(520), extendedNm: mm(565) }),
        ],
      },
    },
  ],
  interfaces: [
    { id: 'i-fit', kind: 'bore_shaft', name: 'pilot', featureAId: 'p1-bore', featureBId: 'p2-journal', unit: 'mm' },
    { id: 'i-len', kind: 'length_window', name: 'shaft in tunnel', featureAId: 'p2-length', featureBId: null, unit: 'mm' },
  ],
};

const check = (overrides: Partial<FitCheck> & Pick<FitCheck, 'id' | 'interfaceId' | 'kind' | 'derived' | 'title' | 'state'>): FitCheck => ({
  assemblyId: 'a1',
  required: true,
  outcome: null,
  detail: null,
  reason: '',
  confirmedBy: null,
  confirmedAt: null,
  evidence: [],
  updatedAt: '2026-03-02T10:00:00.000Z',
  ...overrides,
});

const CHECKLIST: ChecklistAnswer = {
  verdict: 'no_fit',
  checks: [
    check({
      id: 'c-fit',
      interfaceId: 'i-fit',
      kind: 'fit',
      derived: true,
      title: 'Fit: pilot',
      state: 'bench_pass',
      outcome: 'pass',
      detail: {
        summary: 'clearance fit',
        reasons: ['clearance measured: 0.012 mm to 0.020 mm', 'at least 0 mm required'],
        isoFit: { hole: { upper: 18, lower: 0 }, shaft: { upper: -6, lower: -17 }, clearance: { max: 35, min: 6 }, kind: 'clearance' },
        clearanceMinNm: 12_000,
        clearanceMaxNm: 20_000,
        clearanceMeasuredNm: 16_000,
        minClearanceNm: 0,
      },
      evidence: [{ id: 'e1', kind: 'measurement', measurementId: 'm1', markId: null, photoUrl: null, note: '', addedBy: 'u1', createdAt: '2026-03-02T10:00:00.000Z' }],
    }),
    check({
      id: 'c-len',
      interfaceId: 'i-len',
      kind: 'length_window',
      derived: true,
      title: 'Length window: shaft in tunnel',
      state: 'no_fit',
      outcome: 'fail',
      detail: {
        summary: 'outside the window',
        reasons: ['pulls apart: at the longest installed length it needs 5 mm more extension than it has'],
        compressedNm: mm(520),
        extendedNm: mm(565),
        installedMinNm: mm(530),
        installedMaxNm: mm(570),
        marginNm: mm(5),
        compressionLeftNm: mm(10),
        extensionLeftNm: mm(-5),
      },
    }),
    check({ id: 'c-hand', interfaceId: null, kind: 'manual', derived: false, title: 'Test-fitted on the vehicle', state: 'open' }),
    check({ id: 'c-old', interfaceId: null, kind: 'manual', derived: false, title: 'Old boot check', state: 'retired', required: false }),
  ],
};

const READINGS = {
  measurements: [
    {
      id: 'm1',
      featureId: 'p1-bore',
      interfaceId: null,
      quantity: 'diameter',
      unit: 'mm',
      valueNm: mm(15.012),
      shown: '15.012 mm',
      instrument: { kind: 'bore_gauge', resolutionNm: 1000 },
      takenAt: '2026-03-02T10:00:00.000Z',
    },
  ],
  summary: null,
};

function show(readOnly = false) {
  const requests = stubApi([
    { path: /^\/workshops\/w1\/assemblies\/a1\/checklist$/, body: CHECKLIST },
    { path: /^\/workshops\/w1\/assemblies\/a1$/, body: ASSEMBLY },
    { path: /^\/workshops\/w1\/measurements$/, body: READINGS },
    { path: /^\/auth\/me$/, body: { user: null } },
    {
      method: 'POST',
      path: /^\/workshops\/w1\/checks\/c-hand\/transitions$/,
      status: 409,
      body: { statusCode: 409, message: 'Attach evidence (a measurement, a mark or a photo) before confirming.' },
    },
  ]);
  renderWithProviders(
    <WorkshopAccessProvider readOnly={readOnly}>
      <Notifications />
      <Checklist workshopId="w1" assemblyId="a1" />
    </WorkshopAccessProvider>,
  );
  return requests;
}

describe('Checklist', () => {
  it('read-only (a site admin, or a disabled workshop): the checks and their evidence, no control that changes them', async () => {
    show(true);
    const card = await screen.findByLabelText('Check: Test-fitted on the vehicle');
    expect(within(card).getByText('Test-fitted on the vehicle')).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Add a check by hand' })).toBeNull();
    expect(screen.queryAllByRole('button', { name: 'Attach a reading as evidence' })).toHaveLength(0);
    expect(screen.queryAllByRole('button', { name: 'Attach a photo' })).toHaveLength(0);
    expect(screen.queryAllByRole('button', { name: /^Confirm/ })).toHaveLength(0);
    // Reading the history and asking "what if" change nothing, so they stay.
    expect(screen.getAllByRole('button', { name: 'History' })).toHaveLength(4);
  });

  it('a member sees the controls that change checks', async () => {
    show();
    expect(await screen.findByRole('button', { name: 'Add a check by hand' })).toBeTruthy();
    expect(screen.getAllByRole('button', { name: 'Attach a photo' }).length).toBeGreaterThan(0);
  });

  afterEach(() => vi.restoreAllMocks());

  it('shows the roll-up verdict and each state as a shape and words', async () => {
    show();
    const verdict = await screen.findByTestId('checklist-verdict');
    expect(verdict.getAttribute('data-verdict')).toBe('no_fit');
    expect(within(verdict).getByText('Does not fit')).toBeTruthy();
    expect(within(verdict).getByText('0 of 3 required checks confirmed on the vehicle.')).toBeTruthy();

    const states = screen.getAllByTestId('check-state');
    expect(states.map((badge) => [badge.getAttribute('data-state'), badge.textContent])).toEqual([
      ['bench_pass', 'Passes on the bench'],
      ['no_fit', 'Does not fit'],
      ['open', 'Open'],
      ['retired', 'Retired'],
    ]);
    // Each state has its own icon shape, so colour is never the only difference.
    expect(states.map((badge) => badge.querySelector('svg')?.getAttribute('data-icon'))).toEqual(['bench_pass', 'no_fit', 'open', 'retired']);
  });

  it('draws the tolerance zones and the length window of the derived checks, with their reasons and evidence', async () => {
    show();
    await screen.findByTestId('checklist-verdict');
    const fitCard = screen.getAllByTestId('check-card')[0];
    expect(within(fitCard).getByTestId('tolerance-zone-diagram')).toBeTruthy();
    expect(within(fitCard).getByText('clearance measured: 0.012 mm to 0.020 mm')).toBeTruthy();
    expect(within(fitCard).getAllByTestId('marker-hole')).toHaveLength(1);
    expect(within(fitCard).getByTestId('evidence-list').textContent).toContain('pilot bore on HL-2107: 15.012 mm');

    const lengthCard = screen.getAllByTestId('check-card')[1];
    expect(within(lengthCard).getByTestId('length-window-diagram')).toBeTruthy();
    expect(within(lengthCard).getByTestId('extension-left').textContent).toBe('short 5 mm');
    // A derived check that does not pass is never offered for confirmation.
    expect(within(lengthCard).queryByRole('button', { name: 'Confirm…' })).toBeNull();
  });

  it('tells the API’s refusal to confirm without evidence in a notification', async () => {
    const requests = show();
    await screen.findByTestId('checklist-verdict');
    const manual = screen.getAllByTestId('check-card')[2];
    fireEvent.click(within(manual).getByRole('button', { name: 'Confirm…' }));
    const dialog = await screen.findByRole('dialog');
    fireEvent.change(within(dialog).getByRole('textbox', { name: /Reason/ }), { target: { value: 'Bolted up; turns by hand.' } });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Confirm' }));
    expect(await screen.findByText('Attach evidence (a measurement, a mark or a photo) before confirming.')).toBeTruthy();
    expect(requests.find((request) => request.method === 'POST')?.body).toEqual({ to: 'confirmed', reason: 'Bolted up; turns by hand.', from: 'open' });
  });

  it('sends a double-clicked Confirm once, and keeps the button disabled while it is on its way', async () => {
    const requests = show();
    // Hold the API's answer until the test lets it go, so the request is visibly in flight.
    let answer = () => {};
    const answered = new Promise<void>((resolve) => (answer = resolve));
    const fetchSpy = vi.mocked(globalThis.fetch);
    const stubbed = fetchSpy.getMockImplementation()!;
    fetchSpy.mockImplementation(async (input, init) => {
      if (init?.method === 'POST') await answered;
      return stubbed(input, init);
    });
    await screen.findByTestId('checklist-verdict');
    fireEvent.click(within(screen.getAllByTestId('check-card')[2]).getByRole('button', { name: 'Confirm…' }));
    const dialog = await screen.findByRole('dialog');
    fireEvent.change(within(dialog).getByRole('textbox', { name: /Reason/ }), { target: { value: 'Bolted up; turns by hand.' } });
    const button = within(dialog).getByRole('button', { name: 'Confirm' });
    fireEvent.click(button);
    fireEvent.click(button);
    await waitFor(() => expect(button.hasAttribute('disabled')).toBe(true));
    fireEvent.click(button);
    answer();
    expect(await screen.findByText('Attach evidence (a measurement, a mark or a photo) before confirming.')).toBeTruthy();
    expect(requests.filter((request) => request.method === 'POST')).toHaveLength(1);
  });

  it('asks for a reason before changing a state', async () => {
    const requests = show();
    await screen.findByTestId('checklist-verdict');
    fireEvent.click(within(screen.getAllByTestId('check-card')[2]).getByRole('button', { name: 'Confirm…' }));
    const dialog = await screen.findByRole('dialog');
    fireEvent.click(within(dialog).getByRole('button', { name: 'Confirm' }));
    expect(await within(dialog).findByText('Say why; the history keeps it')).toBeTruthy();
    expect(requests.some((request) => request.method === 'POST')).toBe(false);
  });
});
