import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { stubApi, type StubRoute } from '@/testing/api-stub';
import { fakeScrollLayout } from '@/testing/fake-scroll-layout';
import { renderWithProviders } from '@/testing/render';
import { createPlaybackClock } from '@/lib/playback-clock';
import type { Mark } from '../api/queries';
import { emptyLinks, MarkForm, type MarkDraft } from './mark-form';
import { MarksList } from './marks-list';

// An invented workshop: one build with one assembly, two parts, one reading already taken.
const PARTS = [
  { id: 'p1', partNumber: 'HL-2107', title: 'Motor coupler', features: [{ id: 'f1', name: 'motor bore', kind: 'diameter' }] },
  { id: 'p2', partNumber: 'OM-G5-IN', title: 'Gearbox input shaft', features: [{ id: 'f2', name: 'pilot nose', kind: 'diameter' }] },
];
const READING = {
  id: 'm1',
  featureId: 'f2',
  interfaceId: null,
  shown: '0.5902 in', // the demo's pilot nose as miked in its footage ("zero point five nine zero two inch")
  quantity: 'diameter',
  footageId: null,
  footageTimeMs: null,
};
const CHECKS = [
  { id: 'c1', title: 'Spline teeth match', state: 'bench_pass' },
  { id: 'c2', title: 'Test-fitted on the vehicle', state: 'confirmed' },
];

function linkTargetRoutes(extra: StubRoute[] = []): StubRoute[] {
  return [
    ...extra,
    { path: /^\/auth\/me$/, body: { user: null } },
    { path: /^\/workshops\/w1\/footage\/f1$/, body: { id: 'f1', buildId: 'b1' } },
    { path: /^\/workshops\/w1\/parts$/, body: PARTS },
    { path: /^\/workshops\/w1\/measurements$/, body: { measurements: [READING], summary: null } },
    { path: /^\/workshops\/w1\/builds$/, body: [{ id: 'b1', title: 'Motor-to-gearbox coupler' }] },
    { path: /^\/workshops\/w1\/builds\/b1\/assemblies$/, body: [{ id: 'a1', name: '21-tooth coupler stack' }] },
    { path: /^\/workshops\/w1\/assemblies\/a1$/, body: { id: 'a1', interfaces: [{ id: 'i1', name: 'pilot bearing on input shaft nose' }] } },
    { path: /^\/workshops\/w1\/assemblies\/a1\/checklist$/, body: { verdict: 'open', checks: CHECKS } },
  ];
}

const draft = (change: Partial<MarkDraft> = {}): MarkDraft => ({ startMs: 42_300, kind: 'note', label: '', ...emptyLinks, ...change });

function showForm(value: MarkDraft) {
  const onClose = vi.fn();
  renderWithProviders(<MarkForm workshopId="w1" footageId="f1" draft={value} onClose={onClose} />);
  return { onClose, form: screen.getByRole('form', { name: value.id ? 'Edit mark' : 'New mark' }) };
}

/** Mantine's Select is a combobox: open it and click the option by its name. */
async function pick(scope: HTMLElement, label: RegExp, option: string) {
  const input = await within(scope).findByLabelText(label);
  fireEvent.click(input);
  await waitFor(() => expect(input.getAttribute('aria-controls')).toBeTruthy());
  const listbox = document.getElementById(input.getAttribute('aria-controls')!)!;
  fireEvent.click(await within(listbox).findByRole('option', { name: option, hidden: true }));
}

const optionsOf = async (scope: HTMLElement, label: RegExp) => {
  const input = await within(scope).findByLabelText(label);
  fireEvent.click(input);
  await waitFor(() => expect(input.getAttribute('aria-controls')).toBeTruthy());
  const listbox = document.getElementById(input.getAttribute('aria-controls')!)!;
  await within(listbox).findAllByRole('option', { hidden: true });
  return listbox;
};

const posted = (requests: ReturnType<typeof stubApi>, path: RegExp) =>
  requests.filter((request) => request.method === 'POST' && path.test(request.url.pathname));

describe('MarkForm', () => {
  afterEach(() => vi.restoreAllMocks());

  it('offers the picker of each kind and sends only that kind’s link', async () => {
    const requests = stubApi(linkTargetRoutes([{ method: 'POST', path: /\/marks$/, body: { id: 'k1' } }]));
    const { form, onClose } = showForm(draft());
    // A note links nothing: no picker.
    expect(within(form).queryByLabelText(/Part shown|Reading shown|Fit check/)).toBeNull();

    await pick(form, /^Kind/, 'Part');
    await pick(form, /^Part shown/, 'HL-2107 — Motor coupler');
    await pick(form, /^Kind/, 'Check evidence');
    expect(within(form).queryByLabelText(/^Part shown/)).toBeNull();
    const checks = await optionsOf(form, /^Fit check it evidences/);
    expect(within(checks).getByText('21-tooth coupler stack')).toBeTruthy();
    expect(within(checks).getAllByRole('option', { hidden: true }).map((option) => option.textContent)).toEqual([
      'Spline teeth match · passes on the bench',
      'Test-fitted on the vehicle · confirmed',
    ]);
    fireEvent.click(within(checks).getByRole('option', { name: 'Test-fitted on the vehicle · confirmed', hidden: true }));
    fireEvent.change(within(form).getByRole('textbox', { name: 'Label' }), { target: { value: 'Turns freely by hand' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Save mark' }));

    await waitFor(() => expect(onClose).toHaveBeenCalled());
    const [saved] = posted(requests, /\/workshops\/w1\/footage\/f1\/marks$/);
    // The part picked before the kind changed is not sent with a check-evidence mark.
    expect(saved.body).toEqual({
      startMs: 42_300,
      kind: 'check_evidence',
      label: 'Turns freely by hand',
      partId: null,
      measurementId: null,
      fitCheckId: 'c2',
      guideStepId: null,
    });
  });

  it('says there are no guide steps yet while the guide-steps route answers 404', async () => {
    stubApi(linkTargetRoutes([{ path: /^\/workshops\/w1\/guide-steps/, status: 404, body: { statusCode: 404, message: 'Cannot GET' } }]));
    const { form } = showForm(draft({ kind: 'step' }));
    expect(await within(form).findByText('No guide steps yet')).toBeTruthy();
    expect(within(form).queryByRole('alert')).toBeNull();
  });

  it('offers the steps anchored in this footage first', async () => {
    const step = (id: string, position: number, title: string, startMs: number | null) => ({
      id,
      guideId: 'g1',
      guideTitle: 'Coupler install',
      position,
      title,
      startMs,
    });
    const requests = stubApi(
      linkTargetRoutes([
        { path: /^\/workshops\/w1\/guide-steps\?footageId=f1$/, body: [step('s2', 2, 'Seat the coupler', 61_000)] },
        { path: /^\/workshops\/w1\/guide-steps$/, body: [step('s1', 1, 'Lift the truck', null), step('s2', 2, 'Seat the coupler', 61_000)] },
        { method: 'POST', path: /\/marks$/, body: { id: 'k1' } },
      ]),
    );
    const { form, onClose } = showForm(draft({ kind: 'step' }));
    const listbox = await optionsOf(form, /^Guide step/);
    expect(within(listbox).getAllByRole('option', { hidden: true }).map((option) => option.textContent)).toEqual([
      'Coupler install · 2. Seat the coupler (1:01.0)',
      'Coupler install · 1. Lift the truck',
    ]);
    expect(within(listbox).getByText('Anchored in this footage')).toBeTruthy();
    fireEvent.click(within(listbox).getByRole('option', { name: 'Coupler install · 2. Seat the coupler (1:01.0)', hidden: true }));
    fireEvent.click(within(form).getByRole('button', { name: 'Save mark' }));
    await waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(posted(requests, /\/marks$/)[0].body).toMatchObject({ kind: 'step', guideStepId: 's2', partId: null });
  });

  it('records a spoken reading inline at the mark’s time, then links the mark to it and settles the suggestion', async () => {
    const requests = stubApi(
      linkTargetRoutes([
        { method: 'POST', path: /^\/workshops\/w1\/measurements$/, body: { id: 'm9', shown: '0.015 in', footageTimeMs: 42_300 } },
        { method: 'POST', path: /\/marks$/, body: { id: 'k1' } },
        { method: 'POST', path: /\/mark-suggestions\/s7\/dismiss$/, body: { id: 's7', status: 'dismissed' } },
      ]),
    );
    const spoken = { suggestionId: 's7', phrase: 'fifteen thousandths of an inch', value: '0.015', unit: 'in' as const };
    const { form, onClose } = showForm(draft({ kind: 'measurement', spoken }));

    // Opened where a measurement was spoken: the new reading is offered with its value and unit.
    const fields = within(form).getByTestId('new-reading');
    expect(within(fields).getByText(/Heard here: “fifteen thousandths of an inch”/)).toBeTruthy();
    expect((within(fields).getByRole('textbox', { name: /^Reading/ }) as HTMLInputElement).value).toBe('0.015');
    expect((within(fields).getByLabelText(/^Unit/) as HTMLInputElement).value).toBe('in');
    expect(within(fields).getByRole('textbox', { name: /^Resolution/ }).getAttribute('placeholder')).toBe('0.001');
    expect(within(fields).getByText('The reading is linked to this footage at 0:42.3.')).toBeTruthy();

    // Nothing is sent until the subject is known.
    fireEvent.click(within(form).getByRole('button', { name: 'Record reading and save mark' }));
    expect(await within(form).findByText('Choose the part feature or interface measured')).toBeTruthy();
    expect(posted(requests, /measurements$/)).toHaveLength(0);

    const subjects = await optionsOf(fields, /^Measured/);
    expect(within(subjects).getByText('Part features')).toBeTruthy();
    expect(within(subjects).getByText('Interfaces (across two parts)')).toBeTruthy();
    fireEvent.click(within(subjects).getByRole('option', { name: '21-tooth coupler stack — pilot bearing on input shaft nose', hidden: true }));
    // A clearance is what is read across an interface.
    expect((within(fields).getByLabelText(/^Quantity/) as HTMLInputElement).value).toBe('Clearance');
    await pick(fields, /^Instrument/, 'Feeler gauge');
    fireEvent.click(within(form).getByRole('button', { name: 'Record reading and save mark' }));

    await waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(posted(requests, /\/workshops\/w1\/measurements$/).map((request) => request.body)).toEqual([
      {
        interfaceId: 'i1',
        quantity: 'clearance',
        value: '0.015',
        unit: 'in',
        instrumentKind: 'feeler_gauge',
        resolution: '0.001',
        footageId: 'f1',
        footageTimeMs: 42_300,
      },
    ]);
    expect(posted(requests, /\/marks$/)[0].body).toMatchObject({ kind: 'measurement', startMs: 42_300, measurementId: 'm9', partId: null });
    await waitFor(() => expect(posted(requests, /\/mark-suggestions\/s7\/dismiss$/)).toHaveLength(1));
  });

  it('puts the API’s refusal of a typed reading under its field and records nothing twice', async () => {
    let readingCalls = 0;
    const requests = stubApi(
      linkTargetRoutes([
        {
          method: 'POST',
          path: /^\/workshops\/w1\/measurements$/,
          reply: () => {
            readingCalls += 1;
            return readingCalls === 1
              ? { status: 400, body: { statusCode: 400, message: 'resolution must be greater than zero' } }
              : { status: 201, body: { id: 'm9', shown: '24.012 mm', footageTimeMs: 42_300 } };
          },
        },
        { method: 'POST', path: /\/marks$/, reply: () => ({ status: 400, body: { statusCode: 400, message: 'startMs 42300 is past the end' } }) },
      ]),
    );
    const { form } = showForm(draft({ kind: 'measurement' }));
    // No spoken reading here: the form starts on the recorded readings.
    await within(form).findByLabelText(/^Reading shown/);
    fireEvent.click(within(form).getByRole('radio', { name: 'Record a new reading' }));
    const fields = within(form).getByTestId('new-reading');
    await pick(fields, /^Measured/, 'HL-2107 — motor bore');
    expect((within(fields).getByLabelText(/^Quantity/) as HTMLInputElement).value).toBe('Diameter');
    fireEvent.change(within(fields).getByRole('textbox', { name: /^Reading/ }), { target: { value: '24.012' } });
    fireEvent.change(within(fields).getByRole('textbox', { name: /^Resolution/ }), { target: { value: '0' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Record reading and save mark' }));
    expect(await within(form).findByText('Resolution must be greater than zero')).toBeTruthy();

    fireEvent.change(within(fields).getByRole('textbox', { name: /^Resolution/ }), { target: { value: '0.001' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Record reading and save mark' }));
    // The reading is recorded; the mark is refused: the form now links the recorded reading, so saving again records nothing new.
    await within(form).findByRole('button', { name: 'Save mark' });
    fireEvent.click(within(form).getByRole('button', { name: 'Save mark' }));
    await waitFor(() => expect(posted(requests, /\/marks$/)).toHaveLength(2));
    expect(posted(requests, /\/marks$/).map((request) => (request.body as { measurementId: string }).measurementId)).toEqual(['m9', 'm9']);
    expect(posted(requests, /\/measurements$/)).toHaveLength(2);
    expect(posted(requests, /\/measurements$/)[1].body).toMatchObject({ featureId: 'f1', value: '24.012', unit: 'mm', quantity: 'diameter' });
  });
});

describe('MarksList links', () => {
  // The list draws only the rows in view: jsdom needs a box and row heights to have any.
  beforeEach(() => fakeScrollLayout({ boxHeight: 360, rowHeight: 48 }));
  afterEach(() => vi.restoreAllMocks());

  const mark = (id: string, change: Partial<Mark>): Mark => ({
    id,
    footageId: 'f1',
    startMs: 1000,
    endMs: null,
    kind: 'note',
    label: '',
    ...emptyLinks,
    createdBy: null,
    createdAt: '2026-03-02T10:00:00.000Z',
    updatedAt: '2026-03-02T10:00:00.000Z',
    ...change,
  });

  it('names what each mark links to and opens its page', async () => {
    stubApi(linkTargetRoutes([{ path: /^\/workshops\/w1\/guide-steps/, status: 404, body: { statusCode: 404, message: 'Cannot GET' } }]));
    const marks = [
      mark('k1', { kind: 'part', partId: 'p1', label: 'Coupler' }),
      mark('k2', { kind: 'measurement', measurementId: 'm1', label: 'Pilot nose' }),
      mark('k3', { kind: 'check_evidence', fitCheckId: 'c2', label: 'Bolted up' }),
      mark('k4', { kind: 'caution', label: 'Stands under the truck' }),
    ];
    renderWithProviders(<MarksList workshopId="w1" footageId="f1" marks={marks} clock={createPlaybackClock()} onSeek={() => {}} onEdit={() => {}} />);
    const rows = screen.getAllByTestId('mark-row');
    const linkOf = async (row: HTMLElement) => within(row).findByTestId('mark-link');
    expect((await linkOf(rows[0])).textContent).toBe('→ HL-2107');
    expect((await linkOf(rows[0])).getAttribute('href')).toBe('/workshops/w1/parts/p1');
    expect((await linkOf(rows[1])).textContent).toBe('→ 0.5902 in');
    expect((await linkOf(rows[1])).getAttribute('href')).toBe('/workshops/w1/parts/p2');
    expect((await linkOf(rows[2])).textContent).toBe('→ Test-fitted on the vehicle');
    expect((await linkOf(rows[2])).getAttribute('href')).toBe('/workshops/w1/assemblies/a1');
    expect(within(rows[3]).queryByTestId('mark-link')).toBeNull();
  });

  it('names a step mark by its guide and opens the guide, or says the step is not found', async () => {
    stubApi(
      linkTargetRoutes([
        {
          path: /^\/workshops\/w1\/guide-steps/,
          body: [{ id: 's2', guideId: 'g1', guideTitle: 'Coupler install', position: 2, title: 'Seat the coupler', startMs: 61_000 }],
        },
      ]),
    );
    const marks = [mark('k5', { kind: 'step', guideStepId: 's2' }), mark('k6', { kind: 'step', guideStepId: 's9' })];
    renderWithProviders(<MarksList workshopId="w1" footageId="f1" marks={marks} clock={createPlaybackClock()} onSeek={() => {}} onEdit={() => {}} />);
    const [linked, gone] = screen.getAllByTestId('mark-row');
    const link = await within(linked).findByTestId('mark-link');
    expect(link.textContent).toBe('→ Coupler install · 2. Seat the coupler');
    expect(link.getAttribute('href')).toBe('/workshops/w1/guides/g1');
    expect((await within(gone).findByTestId('mark-link')).textContent).toBe('→ not found');
  });
});
