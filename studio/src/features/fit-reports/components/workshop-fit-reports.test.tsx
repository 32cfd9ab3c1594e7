import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { notifyDone } from '@/lib/notify';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import type { FitReport, FitReportChanges } from '../api/queries';
import { testReport } from './test-reports';
import { WorkshopFitReports } from './workshop-fit-reports';
import { formatDate } from '@/lib/dates';

vi.mock('@/lib/notify', () => ({ notifyError: vi.fn(), notifyDone: vi.fn() }));

const PAGE = '/workshops/w1/fit-reports';

const REPORTS: FitReport[] = [
  testReport({
    id: 'r-new-1',
    reporter: { displayName: 'Morgan Tull' },
    photos: [
      { id: 'p1', url: '/api/workshops/w1/fit-reports/r-new-1/photos/p1' },
      { id: 'p2', url: '/api/workshops/w1/fit-reports/r-new-1/photos/p2' },
    ],
  }),
  testReport({ id: 'r-new-2', outcome: 'no_fit', parts: 'HL-2707 27-tooth coupler', vehicle: '', notes: '', reporter: { displayName: 'Jo Brannock' } }),
  testReport({
    id: 'r-inv',
    status: 'investigating',
    reporter: { displayName: 'Sam Orrell' },
    fitCheck: { id: 'c-spline', title: 'Spline: coupler to motor shaft', state: 'bench_pass', assemblyName: '21-tooth coupler stack' },
  }),
  testReport({ id: 'r-dec', status: 'declined', reporter: { displayName: 'Lee Carrow' }, creatorNote: 'Different gearbox.' }),
];

const CHECKS = [
  { id: 'c-spline', title: 'Spline: coupler to motor shaft', state: 'bench_pass', required: true },
  { id: 'c-manual', title: 'Coupler slides on by hand', state: 'open', required: true },
  { id: 'c-old', title: 'Old seal check', state: 'retired', required: false },
];

/** The workshop's reports, changed by PATCH as the server would (tying a new report moves it on). */
function serveReports(reports: FitReport[]) {
  return stubApi([
    { path: /^\/workshops\/w1\/fit-reports$/, body: () => reports },
    {
      method: 'PATCH',
      path: /^\/workshops\/w1\/fit-reports\/[\w-]+$/,
      reply: ({ url, body }) => {
        const index = reports.findIndex((report) => report.id === url.pathname.split('/').pop());
        const changes = body as FitReportChanges;
        const current = reports[index];
        const check = CHECKS.find((candidate) => candidate.id === changes.fitCheckId);
        const updated: FitReport = {
          ...current,
          ...(changes.status ? { status: changes.status } : {}),
          ...(changes.creatorNote !== undefined ? { creatorNote: changes.creatorNote } : {}),
          ...(changes.fitCheckId === null ? { fitCheck: null } : {}),
          ...(check
            ? {
                fitCheck: { id: check.id, title: check.title, state: check.state as 'open', assemblyName: '21-tooth coupler stack' },
                status: current.status === 'new' ? 'investigating' : current.status,
              }
            : {}),
        };
        reports[index] = updated;
        return { status: 200, body: updated };
      },
    },
    { path: /^\/workshops\/w1\/builds$/, body: [{ id: 'b1', title: 'Motor-to-gearbox coupler' }] },
    { path: /^\/workshops\/w1\/builds\/b1\/assemblies$/, body: [{ id: 'a1', name: '21-tooth coupler stack' }] },
    { path: /^\/workshops\/w1\/assemblies\/a1\/checklist$/, body: { verdict: 'open', checks: CHECKS } },
  ]);
}

const filter = () => screen.getByTestId('report-status-filter');
const shownReporters = () => screen.queryAllByTestId('fit-report').map((card) => card.getAttribute('aria-label'));

/** Mantine's Select is a combobox: open it and click the option by its name. */
async function pick(scope: HTMLElement, label: string, option: string) {
  const input = within(scope).getByRole('combobox', { name: label });
  fireEvent.click(input);
  await waitFor(() => expect(input.getAttribute('aria-controls')).toBeTruthy());
  const listbox = document.getElementById(input.getAttribute('aria-controls')!)!;
  fireEvent.click(await within(listbox).findByRole('option', { name: option, hidden: true }));
}

describe('WorkshopFitReports', () => {
  afterEach(() => {
    vi.restoreAllMocks();
    vi.mocked(notifyDone).mockClear();
  });

  it('shows new reports first, with a count per status, and filters by status (kept in the address)', async () => {
    serveReports(structuredClone(REPORTS));
    renderWithProviders(<WorkshopFitReports workshopId="w1" />, { route: PAGE });
    await waitFor(() => expect(shownReporters()).toEqual(['Fit report from Morgan Tull', 'Fit report from Jo Brannock']));
    expect(within(filter()).getAllByRole('radio').map((radio) => radio.closest('div')?.textContent)).toEqual([
      'New (2)',
      'Investigating (1)',
      'Verified (0)',
      'Declined (1)',
    ]);

    // The claim in full: outcome in words, reporter, guide, parts, vehicle, notes and photos.
    const first = screen.getAllByTestId('fit-report')[0];
    expect(within(first).getByTestId('report-outcome').textContent).toBe('It fit');
    expect(within(first).getByTestId('report-origin').textContent).toBe(
      `From Morgan Tull · ${formatDate('2026-03-04T10:00:00.000Z')} · Fitting the motor-to-gearbox coupler · build Motor-to-gearbox coupler`,
    );
    expect(within(first).getByRole('link', { name: 'Fitting the motor-to-gearbox coupler' }).getAttribute('href')).toBe(
      '/guides/harrow-lane-garage/motor-to-gearbox-coupler',
    );
    expect(within(first).getByText('1984 compact pickup, 4x2')).toBeTruthy();
    expect(within(first).getByText('Slid on by hand after deburring the spline ends.')).toBeTruthy();
    expect(within(screen.getAllByTestId('fit-report')[1]).getByTestId('report-outcome').textContent).toBe('It did not fit');

    // A thumbnail opens the photo large.
    const thumbnails = within(first).getAllByRole('button', { name: /^Enlarge photo/ });
    expect(thumbnails).toHaveLength(2);
    fireEvent.click(thumbnails[1]);
    const enlarged = await screen.findByTestId('enlarged-photo');
    expect(enlarged.getAttribute('src')).toBe('/api/workshops/w1/fit-reports/r-new-1/photos/p2');
    expect(enlarged.getAttribute('alt')).toBe('Photo 2 of 2 from Morgan Tull');

    fireEvent.click(within(filter()).getByRole('radio', { name: 'Declined (1)' }));
    await waitFor(() => expect(shownReporters()).toEqual(['Fit report from Lee Carrow']));
    fireEvent.click(within(filter()).getByRole('radio', { name: 'Verified (0)' }));
    expect((await screen.findByTestId('fit-reports-empty')).textContent).toBe('No verified reports yet.');
  });

  it('opens on the status the address asks for', async () => {
    serveReports(structuredClone(REPORTS));
    renderWithProviders(<WorkshopFitReports workshopId="w1" />, { route: `${PAGE}?status=investigating` });
    await waitFor(() => expect(shownReporters()).toEqual(['Fit report from Sam Orrell']));
    const card = screen.getByTestId('fit-report');
    expect(within(card).getByTestId('report-check').textContent).toContain('Tied to Spline: coupler to motor shaft (21-tooth coupler stack)');
    expect(within(card).getByTestId('check-state').textContent).toBe('Passes on the bench');
  });

  it('ties a new report to one of the assembly’s checks, which moves it to Investigating, and unties it', async () => {
    const reports = structuredClone(REPORTS);
    const requests = serveReports(reports);
    renderWithProviders(<WorkshopFitReports workshopId="w1" />, { route: PAGE });
    await waitFor(() => expect(shownReporters()).toHaveLength(2));
    const card = screen.getAllByTestId('fit-report')[0];
    fireEvent.click(within(card).getByRole('button', { name: 'Tie to a fit check' }));
    const form = within(card).getByRole('form', { name: 'Tie to a fit check' });

    // The report's build is chosen, and its only assembly with it; retired checks are not offered.
    await waitFor(() => expect((within(form).getByRole('combobox', { name: 'Assembly' }) as HTMLInputElement).value).toBe('21-tooth coupler stack'));
    expect((within(form).getByRole('combobox', { name: 'Build' }) as HTMLInputElement).value).toBe('Motor-to-gearbox coupler');
    fireEvent.click(within(form).getByRole('button', { name: 'Tie' }));
    expect(await within(form).findByText('Pick the fit check that verifies this report')).toBeTruthy();
    const checkInput = within(form).getByRole('combobox', { name: 'Fit check' });
    await waitFor(() => expect((checkInput as HTMLInputElement).disabled).toBe(false));
    fireEvent.click(checkInput);
    await waitFor(() => expect(checkInput.getAttribute('aria-controls')).toBeTruthy());
    const listbox = document.getElementById(checkInput.getAttribute('aria-controls')!)!;
    await waitFor(() =>
      expect(within(listbox).getAllByRole('option', { hidden: true }).map((option) => option.textContent)).toEqual([
        'Spline: coupler to motor shaft (passes on the bench)',
        'Coupler slides on by hand (open)',
      ]),
    );
    await pick(form, 'Fit check', 'Coupler slides on by hand (open)');
    fireEvent.click(within(form).getByRole('button', { name: 'Tie' }));

    await waitFor(() => expect(shownReporters()).toEqual(['Fit report from Jo Brannock']));
    const patches = requests.filter((request) => request.method === 'PATCH');
    expect(patches.map((request) => [request.url.pathname, request.body])).toEqual([['/api/workshops/w1/fit-reports/r-new-1', { fitCheckId: 'c-manual' }]]);
    expect(notifyDone).toHaveBeenCalledWith('Tied to “Coupler slides on by hand”. It is now under Investigating.');
    expect(within(filter()).getByRole('radio', { name: 'Investigating (2)' })).toBeTruthy();

    // Under Investigating it shows its check, and can be untied.
    fireEvent.click(within(filter()).getByRole('radio', { name: 'Investigating (2)' }));
    const tied = await screen.findByRole('listitem', { name: 'Fit report from Morgan Tull' });
    expect(within(tied).getByTestId('report-check').textContent).toContain('Tied to Coupler slides on by hand (21-tooth coupler stack)');
    fireEvent.click(within(tied).getByRole('button', { name: 'Untie' }));
    await waitFor(() => expect(within(tied).getByRole('button', { name: 'Tie to a fit check' })).toBeTruthy());
    expect(requests.filter((request) => request.method === 'PATCH').map((request) => request.body)).toEqual([
      { fitCheckId: 'c-manual' },
      { fitCheckId: null },
    ]);
  });

  it('sets the status and saves a note to the reporter', async () => {
    const requests = serveReports(structuredClone(REPORTS));
    renderWithProviders(<WorkshopFitReports workshopId="w1" />, { route: `${PAGE}?status=declined` });
    const card = await screen.findByRole('listitem', { name: 'Fit report from Lee Carrow' });
    const note = within(card).getByRole('textbox', { name: /Note to the reporter/ }) as HTMLTextAreaElement;
    expect(note.value).toBe('Different gearbox.');
    const save = within(card).getByRole('button', { name: 'Save note' }) as HTMLButtonElement;
    expect(save.disabled).toBe(true);
    fireEvent.change(note, { target: { value: ' Your gearbox has the 23-tooth input shaft; this coupler is for the 21-tooth one. ' } });
    fireEvent.click(save);
    await waitFor(() => expect(notifyDone).toHaveBeenCalledWith('Note saved. The reporter sees it in their account.'));

    await pick(card, 'Status', 'Verified');
    await waitFor(() => expect(shownReporters()).toEqual([]));
    expect(requests.filter((request) => request.method === 'PATCH').map((request) => request.body)).toEqual([
      { creatorNote: 'Your gearbox has the 23-tooth input shaft; this coupler is for the 21-tooth one.' },
      { status: 'verified' },
    ]);
    expect(within(filter()).getByRole('radio', { name: 'Verified (1)' })).toBeTruthy();
  });

  it('reads only, for a site admin or a disabled workshop', async () => {
    const requests = serveReports(structuredClone(REPORTS));
    renderWithProviders(<WorkshopFitReports workshopId="w1" readOnly />, { route: `${PAGE}?status=declined` });
    const card = await screen.findByRole('listitem', { name: 'Fit report from Lee Carrow' });
    expect(within(card).queryByRole('button')).toBeNull();
    expect(within(card).queryByRole('textbox')).toBeNull();
    expect(within(card).getByText('Different gearbox.')).toBeTruthy();
    expect(requests.every((request) => request.method === 'GET')).toBe(true);
  });
});
