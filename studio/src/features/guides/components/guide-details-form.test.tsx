import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import { GuideDetailsForm } from './guide-details-form';
import { aGuide } from './test-fixtures';

afterEach(() => vi.restoreAllMocks());

function renderForm(guide = aGuide()) {
  const requests = stubApi([
    { path: /^\/workshops\/w1\/builds\/b1\/footage/, body: [] },
    { path: /^\/workshops\/w1\/builds\/b1\/assemblies/, body: [] },
    { method: 'PATCH', path: /^\/workshops\/w1\/guides\/g1$/, body: ({ body }: { body: unknown }) => ({ ...guide, ...(body as object) }) },
  ]);
  renderWithProviders(<GuideDetailsForm workshopId="w1" guide={guide} />);
  return requests;
}

const save = async () => {
  await act(async () => {
    fireEvent.click(screen.getByRole('button', { name: 'Save details' }));
  });
};

describe('GuideDetailsForm: skill level and time', () => {
  it('sends only the level and the minutes chosen, and says the time in hours and minutes', async () => {
    const requests = renderForm();
    const level = screen.getAllByLabelText('Skill level').find((element) => element.tagName === 'INPUT')!;
    fireEvent.click(level);
    await waitFor(() => expect(level.getAttribute('aria-controls')).toBeTruthy());
    const listbox = document.getElementById(level.getAttribute('aria-controls')!)!;
    fireEvent.click(await within(listbox).findByRole('option', { name: 'Seasoned fitter (3 of 3)', hidden: true }));
    fireEvent.change(screen.getByLabelText(/^Estimated time, minutes/), { target: { value: '200' } });
    expect(screen.getByText('The whole job: 3 h 20 min')).toBeTruthy();
    await save();
    await waitFor(() => expect(requests.some((request) => request.method === 'PATCH')).toBe(true));
    expect(requests.find((request) => request.method === 'PATCH')?.body).toEqual({ skillLevel: 'seasoned_fitter', estimatedMinutes: 200 });
  });

  it('refuses a time over 100 hours before asking the API', async () => {
    const requests = renderForm();
    fireEvent.change(screen.getByLabelText(/^Estimated time, minutes/), { target: { value: '7000' } });
    await save();
    expect(await screen.findByText('At most 6000 minutes (100 h)')).toBeTruthy();
    expect(requests.some((request) => request.method === 'PATCH')).toBe(false);
  });

  it('clears a saved time with null', async () => {
    const requests = renderForm(aGuide({ skillLevel: 'bench_starter', estimatedMinutes: 45 }));
    const minutes = screen.getByLabelText(/^Estimated time, minutes/) as HTMLInputElement;
    expect(minutes.value).toBe('45');
    fireEvent.change(minutes, { target: { value: '' } });
    await save();
    await waitFor(() => expect(requests.some((request) => request.method === 'PATCH')).toBe(true));
    expect(requests.find((request) => request.method === 'PATCH')?.body).toEqual({ estimatedMinutes: null });
  });
});
