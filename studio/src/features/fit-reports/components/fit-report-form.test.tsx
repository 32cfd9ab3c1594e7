import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import { uploadReportPhoto } from '../api/photo-upload';
import { FitReportForm } from './fit-report-form';
import { ReportFitButton } from './report-fit-button';
import { fakeFile, signedInUser, testReport } from './test-reports';

// XMLHttpRequest carries the photos (for progress); here each upload answers as the test says.
vi.mock('../api/photo-upload', () => ({ uploadReportPhoto: vi.fn() }));

const GUIDE = '/guides/harrow-lane-garage/motor-to-gearbox-coupler';
const CREATE = /^\/guides\/harrow-lane-garage\/motor-to-gearbox-coupler\/fit-reports$/;

function showForm({ emailVerified = true } = {}) {
  const onClose = vi.fn();
  renderWithProviders(
    <FitReportForm workshopSlug="harrow-lane-garage" guideSlug="motor-to-gearbox-coupler" emailVerified={emailVerified} onClose={onClose} />,
    { route: GUIDE },
  );
  return { onClose, form: screen.getByRole('form', { name: 'Report a fit' }) };
}

function choosePhotos(files: File[]) {
  const input = screen.getByTestId('report-photos-dropzone').querySelector('input[type=file]');
  if (!input) throw new Error('the dropzone has no file input');
  fireEvent.change(input, { target: { files } });
}

const posted = (requests: ReturnType<typeof stubApi>) =>
  requests.filter((request) => request.method === 'POST' && CREATE.test(request.url.pathname.replace(/^\/api/, '')));

describe('FitReportForm', () => {
  afterEach(() => {
    vi.restoreAllMocks();
    vi.mocked(uploadReportPhoto).mockReset();
  });

  it('asks for the outcome and the parts before sending anything', async () => {
    const requests = stubApi([{ method: 'POST', path: CREATE, status: 201, body: testReport() }]);
    const { form } = showForm();
    // Neither outcome is chosen for the person.
    expect(within(form).getAllByRole('radio').map((radio) => (radio as HTMLInputElement).checked)).toEqual([false, false]);
    fireEvent.change(within(form).getByRole('textbox', { name: /Vehicle/ }), { target: { value: 'x'.repeat(201) } });
    fireEvent.click(within(form).getByRole('button', { name: 'Send report' }));
    expect(await within(form).findByText('Choose whether it fit')).toBeTruthy();
    expect(within(form).getByText('Say which parts you combined: part numbers and makers')).toBeTruthy();
    expect(within(form).getByText('At most 200 characters (now 201)')).toBeTruthy();
    // Spaces alone are not parts.
    fireEvent.change(within(form).getByRole('textbox', { name: /What you combined/ }), { target: { value: '   ' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Send report' }));
    expect(await within(form).findByText('Say which parts you combined: part numbers and makers')).toBeTruthy();
    expect(requests).toEqual([]);
  });

  it('sends the chosen outcome in words ("It did not fit") with trimmed fields, then thanks the person', async () => {
    const requests = stubApi([{ method: 'POST', path: CREATE, status: 201, body: testReport({ outcome: 'no_fit' }) }]);
    const { form } = showForm();
    fireEvent.click(within(form).getByRole('radio', { name: 'It did not fit' }));
    fireEvent.change(within(form).getByRole('textbox', { name: /What you combined/ }), {
      target: { value: '  HL-2707 27-tooth coupler, Brackwater Drive  ' },
    });
    fireEvent.change(within(form).getByRole('textbox', { name: /Notes/ }), { target: { value: 'Binds a quarter turn in.' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Send report' }));
    const thanks = await screen.findByTestId('fit-report-sent');
    expect(thanks.textContent).toContain('Thanks — Harrow Lane Garage will review it. You’ll be e-mailed if it is verified.');
    expect(posted(requests).map((request) => request.body)).toEqual([
      { outcome: 'no_fit', parts: 'HL-2707 27-tooth coupler, Brackwater Drive', notes: 'Binds a quarter turn in.' },
    ]);
    expect(within(thanks).getByRole('link', { name: 'Your fit reports, in your account' }).getAttribute('href')).toBe('/account');
    // No photos were chosen, so none is sent.
    expect(uploadReportPhoto).not.toHaveBeenCalled();
  });

  it('says when the verdict e-mail cannot reach an unconfirmed address', async () => {
    stubApi([{ method: 'POST', path: CREATE, status: 201, body: testReport() }]);
    const { form } = showForm({ emailVerified: false });
    fireEvent.click(within(form).getByRole('radio', { name: 'It fit' }));
    fireEvent.change(within(form).getByRole('textbox', { name: /What you combined/ }), { target: { value: 'HL-2107' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Send report' }));
    expect((await screen.findByTestId('fit-report-sent')).textContent).toContain('Confirm your e-mail address first');
  });

  it('refuses other files and too large photos, takes at most six, and sends each after the report exists', async () => {
    const requests = stubApi([{ method: 'POST', path: CREATE, status: 201, body: testReport({ id: 'r9' }) }]);
    const { form } = showForm();
    const large = fakeFile('whole-bay.jpg', 'image/jpeg');
    Object.defineProperty(large, 'size', { value: 16 * 1024 * 1024 });
    choosePhotos([fakeFile('notes.txt', 'text/plain'), large, fakeFile('spline-1.png', 'image/png'), fakeFile('spline-2.webp', 'image/webp')]);
    const problems = await screen.findByTestId('report-photo-problems');
    expect(problems.textContent).toContain('"notes.txt" is not a photo we accept. Choose JPEG, PNG or WebP images.');
    expect(problems.textContent).toContain('"whole-bay.jpg" is 16 MB; each photo may be at most 15 MB.');
    expect(screen.getAllByTestId('chosen-photo').map((row) => row.textContent)).toEqual(['spline-1.png2 kB', 'spline-2.webp2 kB']);

    choosePhotos(['a', 'b', 'c', 'd', 'e'].map((name) => fakeFile(`${name}.jpg`, 'image/jpeg')));
    expect((await screen.findByTestId('report-photo-problems')).textContent).toContain(
      'A report takes up to 6 photos; "e.jpg" was left out.',
    );
    expect(screen.getAllByTestId('chosen-photo')).toHaveLength(6);
    expect(screen.getByText('6 photos chosen: that is the most a report takes.')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Remove spline-2.webp' }));
    expect(screen.getAllByTestId('chosen-photo')).toHaveLength(5);

    // The third photo fails the first time, and is sent again on request.
    let attempts = 0;
    vi.mocked(uploadReportPhoto).mockImplementation(async (_reportId, file, onProgress) => {
      onProgress(0.5);
      if (file.name === 'b.jpg' && attempts++ === 0) throw new ApiError(400, 'The photo must be a PNG, JPEG or WebP image', null);
      return testReport({ id: 'r9' });
    });
    fireEvent.click(within(form).getByRole('radio', { name: 'It fit' }));
    fireEvent.change(within(form).getByRole('textbox', { name: /What you combined/ }), { target: { value: 'HL-2107 coupler' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Send report' }));

    const list = await screen.findByRole('list', { name: 'Photos being sent' });
    await waitFor(() =>
      expect(within(list).getAllByTestId('photo-progress').map((row) => row.getAttribute('data-phase'))).toEqual(['sent', 'sent', 'failed', 'sent', 'sent']),
    );
    expect(vi.mocked(uploadReportPhoto).mock.calls.map(([reportId, file]) => `${reportId}:${file.name}`)).toEqual([
      'r9:spline-1.png',
      'r9:a.jpg',
      'r9:b.jpg',
      'r9:c.jpg',
      'r9:d.jpg',
    ]);
    expect(posted(requests)).toHaveLength(1);
    const failed = within(list).getAllByTestId('photo-progress')[2];
    expect(failed.textContent).toContain('Not sent');
    expect(failed.textContent).toContain('The photo must be a PNG, JPEG or WebP image');
    fireEvent.click(within(failed).getByRole('button', { name: 'Try again' }));
    await waitFor(() => expect(failed.getAttribute('data-phase')).toBe('sent'));
    expect(within(failed).getByTestId('photo-phase').textContent).toBe('Sent');
  });

  it('shows the server’s refusal (too many reports) above the form and keeps what was typed', async () => {
    stubApi([
      {
        method: 'POST',
        path: CREATE,
        status: 429,
        body: { statusCode: 429, message: 'You have sent 10 fit reports in the last hour. Please wait before sending another.' },
      },
    ]);
    const { form } = showForm();
    fireEvent.click(within(form).getByRole('radio', { name: 'It fit' }));
    fireEvent.change(within(form).getByRole('textbox', { name: /What you combined/ }), { target: { value: 'HL-2107' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Send report' }));
    expect((await within(form).findByRole('alert')).textContent).toBe(
      'You have sent 10 fit reports in the last hour. Please wait before sending another.',
    );
    expect((within(form).getByRole('textbox', { name: /What you combined/ }) as HTMLTextAreaElement).value).toBe('HL-2107');
  });
});

describe('ReportFitButton', () => {
  afterEach(() => vi.restoreAllMocks());

  it('signed out: offers to sign in and come back to the guide', async () => {
    stubApi([{ path: /^\/auth\/me$/, body: { user: null } }]);
    renderWithProviders(<ReportFitButton workshopSlug="harrow-lane-garage" guideSlug="motor-to-gearbox-coupler" guideTitle="Fitting the coupler" />, {
      route: `${GUIDE}?t=4`,
    });
    const link = await screen.findByRole('link', { name: 'Sign in to report a fit' });
    expect(link.getAttribute('href')).toBe(`/sign-in?next=${encodeURIComponent(`${GUIDE}?t=4`)}`);
    expect(screen.queryByRole('button', { name: 'Report a fit' })).toBeNull();
  });

  it('signed in: opens the form in a dialog named after the guide', async () => {
    stubApi([{ path: /^\/auth\/me$/, body: { user: signedInUser } }]);
    renderWithProviders(<ReportFitButton workshopSlug="harrow-lane-garage" guideSlug="motor-to-gearbox-coupler" guideTitle="Fitting the coupler" />, {
      route: GUIDE,
    });
    fireEvent.click(await screen.findByRole('button', { name: 'Report a fit' }));
    const dialog = await screen.findByRole('dialog', { name: 'Report a fit: Fitting the coupler' });
    // The form itself loads when the dialog opens (it is kept out of the guide's first load).
    expect(await within(dialog).findByRole('form', { name: 'Report a fit' })).toBeTruthy();
  });
});
