import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import type { ChangeDeliveryRecord } from '../api/fit-news-record';
import type { FitCheck } from '../api/queries';
import { HistoryDrawer } from './history-drawer';

const check = { id: 'c1', title: 'Pilot bearing bore' } as FitCheck;

const history = [
  { id: 'e1', from: null, to: 'bench_pass', reason: 'clearance 0.019 mm measured', actorId: null, actorName: null, at: '2026-12-01T09:00:00.000Z' },
  { id: 'e2', from: 'bench_pass', to: 'confirmed', reason: 'test-fitted on the rig', actorId: 'u1', actorName: 'Quinn Marsh', at: '2026-12-02T09:00:00.000Z' },
];

function change(overrides: Partial<ChangeDeliveryRecord> = {}): ChangeDeliveryRecord {
  return {
    changeId: 'e2',
    to: 'confirmed',
    changedAt: '2026-12-02T09:00:00.000Z',
    told: 3,
    pending: 1,
    failed: 2,
    inDigests: 4,
    firstSentAt: '2026-12-02T09:00:05.000Z',
    lastSentAt: '2026-12-02T09:01:00.000Z',
    refusals: ['550 5.1.1 mailbox unavailable'],
    ...overrides,
  };
}

describe('HistoryDrawer’s fit-news delivery record', () => {
  afterEach(() => vi.restoreAllMocks());

  it('shows told, pending, failed and in-digest counts under the change that was news, and an owner retries the failed', async () => {
    let record = [change()];
    const requests = stubApi([
      { path: /^\/workshops\/w1\/checks\/c1\/history$/, body: history },
      { path: /^\/workshops\/w1\/checks\/c1\/fit-news$/, body: () => record },
      {
        method: 'POST',
        path: /^\/workshops\/w1\/checks\/c1\/fit-news\/retry$/,
        body: () => {
          record = [change({ failed: 0, pending: 3, refusals: [] })];
          return record;
        },
      },
    ]);
    renderWithProviders(<HistoryDrawer workshopId="w1" check={check} onClose={() => undefined} canRetryFitNews />);
    const line = await screen.findByTestId('fit-news-delivery');
    expect(line.textContent).toMatch(/^Fit news: 3 followers told \(.+ – .+\) · 1 pending · 2 failed · 4 in digests/);
    expect(line.textContent).toContain('Mail servers answered: 550 5.1.1 mailbox unavailable');
    // Only the change that was news carries a line.
    expect(screen.getAllByTestId('fit-news-delivery')).toHaveLength(1);

    const failed = screen.getByTestId('fit-news-failed');
    expect(within(failed).getByText('2 fit-news mails of this check failed')).toBeTruthy();
    fireEvent.click(within(failed).getByRole('button', { name: 'Retry failed' }));
    await waitFor(() => expect(screen.queryByTestId('fit-news-failed')).toBeNull());
    expect(screen.getByTestId('fit-news-delivery').textContent).toMatch(/3 followers told .* · 3 pending · 4 in digests$/);
    expect(requests.filter((request) => request.method === 'POST').map((request) => request.url.pathname)).toEqual([
      '/api/workshops/w1/checks/c1/fit-news/retry',
    ]);
  }, 30_000);

  it('tells an editor that an owner can send failed mail again, without the button', async () => {
    stubApi([
      { path: /^\/workshops\/w1\/checks\/c1\/history$/, body: history },
      { path: /^\/workshops\/w1\/checks\/c1\/fit-news$/, body: [change({ pending: 0, failed: 1 })] },
    ]);
    renderWithProviders(<HistoryDrawer workshopId="w1" check={check} onClose={() => undefined} />);
    const failed = await screen.findByTestId('fit-news-failed');
    expect(failed.textContent).toContain('1 fit-news mail of this check failed');
    expect(failed.textContent).toContain('A workshop owner can send them again.');
    expect(within(failed).queryByRole('button')).toBeNull();
  });

  it('says a change nobody follows told nobody, and shows the history when the record cannot be read', async () => {
    stubApi([
      { path: /^\/workshops\/w1\/checks\/c1\/history$/, body: history },
      { path: /^\/workshops\/w1\/checks\/c1\/fit-news$/, body: [change({ told: 0, pending: 0, failed: 0, inDigests: 0, firstSentAt: null, lastSentAt: null, refusals: [] })] },
    ]);
    const { unmount } = renderWithProviders(<HistoryDrawer workshopId="w1" check={check} onClose={() => undefined} canRetryFitNews />);
    expect((await screen.findByTestId('fit-news-delivery')).textContent).toBe('Fit news: 0 followers told');
    expect(screen.queryByTestId('fit-news-failed')).toBeNull();
    unmount();

    stubApi([
      { path: /^\/workshops\/w1\/checks\/c1\/history$/, body: history },
      { path: /^\/workshops\/w1\/checks\/c1\/fit-news$/, status: 503, body: { statusCode: 503, message: 'Database unavailable' } },
    ]);
    renderWithProviders(<HistoryDrawer workshopId="w1" check={check} onClose={() => undefined} />);
    expect(await screen.findByText(/by Quinn Marsh/)).toBeTruthy();
    expect(screen.queryByTestId('fit-news-delivery')).toBeNull();
  });
});
