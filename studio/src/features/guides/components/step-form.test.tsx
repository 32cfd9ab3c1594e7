import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import type { FootageChoice } from '../api/types';
import { StepForm } from './step-form';
import { aStep } from './test-fixtures';

afterEach(() => vi.restoreAllMocks());

const MAIN: FootageChoice = { id: 'f1', title: 'Coupler fitting', state: 'ready', durationMs: 600_000, width: 640, height: 360, posterUrl: null };

function renderForm(props: Partial<Parameters<typeof StepForm>[0]> = {}) {
  const onDone = vi.fn();
  const requests = stubApi([
    { method: 'POST', path: /^\/workshops\/w1\/guides\/g1\/steps$/, status: 201, body: ({ body }: { body: unknown }) => ({ id: 's9', position: 1, marks: [], ...(body as object) }) },
    { method: 'PATCH', path: /^\/workshops\/w1\/guides\/g1\/steps\/s1$/, body: ({ body }: { body: unknown }) => ({ id: 's1', position: 1, marks: [], ...(body as object) }) },
  ]);
  renderWithProviders(
    <StepForm workshopId="w1" guideId="g1" step={null} mainFootage={MAIN} readPositionMs={() => 75_340} onDone={onDone} {...props} />,
  );
  return { requests, onDone };
}

/** Mantine's Select is a combobox: open it and click the option by its name. */
async function pick(label: RegExp, option: string) {
  const input = screen.getAllByLabelText(label).find((element) => element.tagName === 'INPUT')!;
  fireEvent.click(input);
  await waitFor(() => expect(input.getAttribute('aria-controls')).toBeTruthy());
  const listbox = document.getElementById(input.getAttribute('aria-controls')!)!;
  fireEvent.click(await within(listbox).findByRole('option', { name: option, hidden: true }));
}

const submit = async (name: string) => {
  await act(async () => {
    fireEvent.click(screen.getByRole('button', { name }));
  });
};

describe('StepForm', () => {
  it('reads a typed m:ss.s time and sends milliseconds in the main footage, with a caution', async () => {
    const { requests, onDone } = renderForm();
    fireEvent.change(screen.getByLabelText(/^Title/), { target: { value: 'Support the gearbox' } });
    fireEvent.change(screen.getByLabelText(/^At/), { target: { value: '1:02.5' } });
    fireEvent.change(screen.getByLabelText('Until (optional)'), { target: { value: '1:30' } });
    await pick(/^Caution$/, 'WARNING');
    fireEvent.change(screen.getByLabelText(/^Caution text/), { target: { value: 'Use a transmission jack.' } });
    await submit('Add step');
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    expect(requests.find((request) => request.method === 'POST')?.body).toEqual({
      title: 'Support the gearbox',
      body: '',
      footageId: 'f1',
      startMs: 62_500,
      endMs: 90_000,
      caution: { level: 'WARNING', text: 'Use a transmission jack.' },
      estimatedMinutes: null,
    });
  });

  it('sends the step’s time in whole minutes, says it in hours and minutes, and refuses one out of range before asking', async () => {
    const { requests, onDone } = renderForm();
    fireEvent.change(screen.getByLabelText(/^Title/), { target: { value: 'Press the bearing' } });
    const minutes = screen.getByLabelText(/^Time for this step, minutes/);
    fireEvent.change(minutes, { target: { value: '1500' } });
    await submit('Add step');
    expect(await screen.findByText('At most 1440 minutes (24 h)')).toBeTruthy();
    expect(requests.some((request) => request.method === 'POST')).toBe(false);
    fireEvent.change(minutes, { target: { value: '75' } });
    expect(screen.getByText('About 1 h 15 min')).toBeTruthy();
    await submit('Add step');
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    expect(requests.find((request) => request.method === 'POST')?.body).toMatchObject({ title: 'Press the bearing', estimatedMinutes: 75 });
  });

  it('clears a step’s time with null when the field is emptied', async () => {
    const { requests, onDone } = renderForm({ step: aStep({ id: 's1', position: 1, title: 'Press the bearing', estimatedMinutes: 30 }) });
    const minutes = screen.getByLabelText(/^Time for this step, minutes/) as HTMLInputElement;
    expect(minutes.value).toBe('30');
    fireEvent.change(minutes, { target: { value: '' } });
    await submit('Save step');
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    expect(requests.find((request) => request.method === 'PATCH')?.body).toMatchObject({ estimatedMinutes: null });
  });

  it('takes the player’s current time', async () => {
    const { requests } = renderForm();
    fireEvent.change(screen.getByLabelText(/^Title/), { target: { value: 'Slide the coupler on' } });
    fireEvent.click(screen.getAllByRole('button', { name: 'Use current time' })[0]);
    expect((screen.getByLabelText(/^At/) as HTMLInputElement).value).toBe('1:15.3');
    await submit('Add step');
    await waitFor(() => expect(requests.some((request) => request.method === 'POST')).toBe(true));
    expect(requests.find((request) => request.method === 'POST')?.body).toMatchObject({ footageId: 'f1', startMs: 75_300, endMs: null, caution: null });
  });

  it('explains a time it cannot read, one past the end and an end before the start', async () => {
    const { requests } = renderForm();
    fireEvent.change(screen.getByLabelText(/^Title/), { target: { value: 'Torque the bolts' } });
    fireEvent.change(screen.getByLabelText(/^At/), { target: { value: '1:5' } });
    await submit('Add step');
    expect(screen.getByText('Write the time as m:ss or m:ss.s, e.g. 1:15.3')).toBeTruthy();
    fireEvent.change(screen.getByLabelText(/^At/), { target: { value: '12:00' } });
    await submit('Add step');
    expect(screen.getByText('The footage is 10:00.0 long')).toBeTruthy();
    fireEvent.change(screen.getByLabelText(/^At/), { target: { value: '2:00' } });
    fireEvent.change(screen.getByLabelText('Until (optional)'), { target: { value: '1:00' } });
    await submit('Add step');
    expect(screen.getByText('The end comes after the start')).toBeTruthy();
    expect(requests.some((request) => request.method === 'POST')).toBe(false);
  });

  it('edits a step: shows its time as m:ss.s and clears the moment when the field is emptied', async () => {
    const step = aStep({ id: 's1', position: 1, title: 'Support the gearbox', footageId: 'f1', startMs: 4_200, endMs: null });
    const { requests } = renderForm({ step });
    expect((screen.getByLabelText(/^At/) as HTMLInputElement).value).toBe('0:04.2');
    fireEvent.change(screen.getByLabelText(/^At/), { target: { value: '' } });
    await submit('Save step');
    await waitFor(() => expect(requests.some((request) => request.method === 'PATCH')).toBe(true));
    expect(requests.find((request) => request.method === 'PATCH')?.body).toMatchObject({ footageId: null, startMs: null, endMs: null });
  });

  it('puts the server’s field messages under their fields', async () => {
    stubApi([{ method: 'POST', path: /steps$/, status: 400, body: { statusCode: 400, message: ['title must be shorter than or equal to 200 characters'] } }]);
    renderWithProviders(<StepForm workshopId="w1" guideId="g1" step={null} mainFootage={null} readPositionMs={null} onDone={() => {}} />);
    expect(screen.getByText(/Choose the guide’s main footage above/)).toBeTruthy();
    fireEvent.change(screen.getByLabelText(/^Title/), { target: { value: 'Torque the bolts' } });
    await submit('Add step');
    expect(await screen.findByText('Title must be shorter than or equal to 200 characters')).toBeTruthy();
  });
});
