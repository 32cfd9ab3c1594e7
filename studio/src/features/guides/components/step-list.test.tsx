import { useQuery } from '@tanstack/react-query';
import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import { guideQueries } from '../api/queries';
import { moveStep, StepList } from './step-list';
import { aGuide, aStep } from './test-fixtures';

const STEPS = [
  aStep({ id: 's1', position: 1, title: 'Support the gearbox', startMs: 4_200, footageId: 'f1', caution: { level: 'WARNING', text: 'Use a transmission jack.' } }),
  aStep({
    id: 's2',
    position: 2,
    title: 'Slide the coupler on',
    body: '<p>Grease the <strong>splines</strong> first.</p>',
    marks: [
      {
        id: 'm1',
        footageId: 'f1',
        kind: 'part',
        label: 'Coupler HL-2127',
        startMs: 75_300,
        endMs: null,
        partId: 'p1',
        measurementId: null,
        fitCheckId: null,
        guideStepId: 's2',
        createdBy: 'u1',
        createdAt: '2026-03-02T10:00:00.000Z',
        updatedAt: '2026-03-02T10:00:00.000Z',
      },
    ],
  }),
  aStep({ id: 's3', position: 3, title: 'Torque the bolts' }),
];

afterEach(() => vi.restoreAllMocks());

function renderList(onSeek = vi.fn()) {
  const guide = aGuide({ footageId: 'f1', steps: STEPS });
  const requests = stubApi([
    {
      method: 'PUT',
      path: /^\/workshops\/w1\/guides\/g1\/steps\/order$/,
      body: ({ body }: { body: unknown }) => {
        const { stepIds } = body as { stepIds: string[] };
        return { ...guide, steps: stepIds.map((id, index) => ({ ...STEPS.find((step) => step.id === id)!, position: index + 1 })) };
      },
    },
    { method: 'DELETE', path: /^\/workshops\/w1\/guides\/g1\/steps\/s2$/, status: 204 },
    { path: /^\/workshops\/w1\/guides\/g1$/, body: guide },
  ]);
  // The list is drawn from the cached guide, as on the editor page.
  const Page = () => {
    const { data } = useQuery({ ...guideQueries.detail('w1', 'g1'), initialData: guide, staleTime: Infinity });
    return <StepList workshopId="w1" guideId="g1" steps={data.steps} mainFootageId="f1" onSeek={onSeek} onEdit={() => {}} />;
  };
  return { ...renderWithProviders(<Page />), requests };
}

describe('moveStep', () => {
  it('swaps with the neighbour and leaves the ends alone', () => {
    expect(moveStep(['a', 'b', 'c'], 'b', 'up')).toEqual(['b', 'a', 'c']);
    expect(moveStep(['a', 'b', 'c'], 'b', 'down')).toEqual(['a', 'c', 'b']);
    const ids = ['a', 'b'];
    expect(moveStep(ids, 'a', 'up')).toBe(ids);
    expect(moveStep(ids, 'b', 'down')).toBe(ids);
  });
});

describe('StepList', () => {
  it('shows each step in order with its moment, caution in words, body and linked marks', () => {
    renderList();
    const cards = screen.getAllByTestId('step-card');
    expect(cards.map((card) => within(card).getByRole('heading').textContent)).toEqual(['Support the gearbox', 'Slide the coupler on', 'Torque the bolts']);
    expect(within(cards[0]).getByText('Step 1')).toBeTruthy();
    expect(within(cards[0]).getByTestId('step-time').textContent).toBe('0:04.2');
    // The editor shows a caution as the reader will: the ANSI Z535 safety alert symbol and the word, then the text.
    const caution = within(cards[0]).getByTestId('step-caution');
    expect(caution.querySelector('[data-signal-header]')?.textContent).toBe('WARNING');
    expect(caution.querySelector('[data-signal-header] [data-symbol="safety-alert"]')).toBeTruthy();
    expect(caution.textContent).toBe('WARNINGUse a transmission jack.');
    expect(within(cards[1]).getByText('splines').tagName).toBe('STRONG');
    expect(within(cards[1]).getByTestId('step-mark').textContent).toBe('1:15.3 Part Coupler HL-2127');
    expect(within(cards[2]).queryByTestId('step-time')).toBeNull();
  });

  it('disables moving the first step up and the last one down', () => {
    renderList();
    expect((screen.getByRole('button', { name: 'Move step 1, Support the gearbox, up' }) as HTMLButtonElement).disabled).toBe(true);
    expect((screen.getByRole('button', { name: 'Move step 1, Support the gearbox, down' }) as HTMLButtonElement).disabled).toBe(false);
    expect((screen.getByRole('button', { name: 'Move step 3, Torque the bolts, down' }) as HTMLButtonElement).disabled).toBe(true);
  });

  it('sends the whole new order when a step moves, and says where it went', async () => {
    const { requests, queryClient } = renderList();
    const down = screen.getByRole('button', { name: 'Move step 1, Support the gearbox, down' });
    down.focus();
    fireEvent.click(down);
    await waitFor(() => expect(requests.some((request) => request.method === 'PUT')).toBe(true));
    const put = requests.find((request) => request.method === 'PUT')!;
    expect(put.url.pathname).toBe('/api/workshops/w1/guides/g1/steps/order');
    expect(put.body).toEqual({ stepIds: ['s2', 's1', 's3'] });
    expect(screen.getByRole('status').textContent).toBe('“Support the gearbox” is now step 2 of 3.');
    // Shown at once, kept after the server's answer, and the keyboard stays on the moved step's button.
    const headings = () => screen.getAllByTestId('step-card').map((card) => within(card).getByRole('heading').textContent);
    expect(headings()).toEqual(['Slide the coupler on', 'Support the gearbox', 'Torque the bolts']);
    expect(document.activeElement?.getAttribute('aria-label')).toBe('Move step 2, Support the gearbox, down');
    await waitFor(() => expect(queryClient.isMutating()).toBe(0));
    expect(queryClient.getQueryData(guideQueries.detail('w1', 'g1').queryKey)?.steps.map((step) => step.id)).toEqual(['s2', 's1', 's3']);

    // Moving it down again puts it last: the button there is disabled, so focus goes to its "up" twin.
    fireEvent.click(screen.getByRole('button', { name: 'Move step 2, Support the gearbox, down' }));
    await waitFor(() => expect(requests.filter((request) => request.method === 'PUT')).toHaveLength(2));
    expect(requests.filter((request) => request.method === 'PUT')[1].body).toEqual({ stepIds: ['s2', 's3', 's1'] });
    expect(headings()).toEqual(['Slide the coupler on', 'Torque the bolts', 'Support the gearbox']);
    expect(document.activeElement?.getAttribute('aria-label')).toBe('Move step 3, Support the gearbox, up');
  });

  it('plays from a step’s moment', () => {
    const onSeek = vi.fn();
    renderList(onSeek);
    fireEvent.click(screen.getByRole('button', { name: 'Play from 0:04.2' }));
    expect(onSeek).toHaveBeenCalledWith(4_200);
  });

  it('asks before deleting a step', async () => {
    const { requests } = renderList();
    fireEvent.click(screen.getByRole('button', { name: 'Delete step 2, Slide the coupler on' }));
    const dialog = await screen.findByRole('dialog', { name: 'Delete step 2?' });
    expect(requests.some((request) => request.method === 'DELETE')).toBe(false);
    await act(async () => {
      fireEvent.click(within(dialog).getByRole('button', { name: 'Delete step' }));
    });
    await waitFor(() => expect(requests.some((request) => request.method === 'DELETE' && request.url.pathname.endsWith('/steps/s2'))).toBe(true));
  });
});

describe('StepList of a long guide', () => {
  // Invented: forty steps of a three-hour session, each with words and a moment.
  const LONG = Array.from({ length: 40 }, (_, index) =>
    aStep({
      id: `l${index + 1}`,
      position: index + 1,
      title: `Check pass ${index + 1}`,
      body: `<p>Measure the bore, pass ${index + 1}.</p>`,
      footageId: 'f1',
      startMs: index * 270_000 + 500,
    }),
  );

  function renderLong() {
    const guide = aGuide({ footageId: 'f1', steps: LONG });
    stubApi([{ path: /^\/workshops\/w1\/guides\/g1$/, body: guide }]);
    return renderWithProviders(<StepList workshopId="w1" guideId="g1" steps={LONG} mainFootageId="f1" onSeek={() => {}} onEdit={() => {}} />);
  }

  it('lists every step folded to its title line and time, with a few elements each', () => {
    renderLong();
    const cards = screen.getAllByTestId('step-card');
    expect(cards).toHaveLength(40);
    expect(within(cards[39]).getByRole('heading').textContent).toBe('Check pass 40');
    expect(within(cards[39]).getByTestId('step-time').textContent).toBe('2:55:30.5');
    // Whole, a step carried its words and a row of four controls; folded, its title line only.
    expect(screen.queryByText('Measure the bore, pass 1.')).toBeNull();
    expect(screen.queryAllByRole('button', { name: /^Edit step/ })).toHaveLength(0);
    const elements = document.querySelectorAll('[data-testid="step-card"] *').length;
    expect(elements / 40).toBeLessThanOrEqual(10);
  });

  it('opens one step at a time by its title, with its words and controls', () => {
    renderLong();
    const title = screen.getByRole('button', { name: 'Check pass 5' });
    expect(title.getAttribute('aria-expanded')).toBe('false');
    fireEvent.click(title);
    expect(title.getAttribute('aria-expanded')).toBe('true');
    expect(screen.getByText('Measure the bore, pass 5.')).toBeTruthy();
    expect(screen.getAllByRole('button', { name: /^Edit step/ }).map((button) => button.getAttribute('aria-label'))).toEqual(['Edit step 5, Check pass 5']);
    fireEvent.click(screen.getByRole('button', { name: 'Check pass 6' }));
    expect(screen.queryByText('Measure the bore, pass 5.')).toBeNull();
    expect(screen.getByText('Measure the bore, pass 6.')).toBeTruthy();
    // The open step folds again by its title.
    fireEvent.click(screen.getByRole('button', { name: 'Check pass 6' }));
    expect(screen.queryAllByRole('button', { name: /^Edit step/ })).toHaveLength(0);
  });

  it('a guide of up to eight steps shows every step whole, as before', () => {
    renderList();
    expect(screen.getAllByRole('button', { name: /^Edit step/ })).toHaveLength(3);
    expect(screen.queryAllByRole('button', { expanded: false })).toHaveLength(0);
  });
});
