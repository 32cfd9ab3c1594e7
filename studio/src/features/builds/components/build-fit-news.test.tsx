import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import type { BuildFitNewsRecord, CheckFitNewsSummary } from '../api/fit-news';
import { BuildFitNews } from './build-fit-news';

function check(overrides: Partial<CheckFitNewsSummary> = {}): CheckFitNewsSummary {
  return {
    checkId: 'c1',
    checkTitle: 'Pilot bearing bore',
    assemblyId: 'a1',
    assemblyName: 'Bellhousing stack',
    changes: 2,
    lastChangeTo: 'confirmed',
    lastChangedAt: '2026-12-02T09:00:00.000Z',
    told: 40,
    pending: 0,
    failed: 2,
    inDigests: 5,
    uncertain: 0,
    firstSentAt: '2026-12-02T09:00:05.000Z',
    lastSentAt: '2026-12-02T09:01:00.000Z',
    ...overrides,
  };
}

function record(overrides: Partial<BuildFitNewsRecord> = {}): BuildFitNewsRecord {
  const checks = overrides.checks ?? [check(), check({ checkId: 'c2', checkTitle: 'Shaft turns by hand', changes: 1, lastChangeTo: 'no_fit', told: 20, failed: 1, inDigests: 0 })];
  return {
    buildId: 'b1',
    followersTold: 35,
    told: 60,
    pending: 1,
    failed: 3,
    inDigests: 5,
    uncertain: 1,
    firstSentAt: '2026-12-02T09:00:05.000Z',
    lastSentAt: '2026-12-03T10:00:00.000Z',
    ...overrides,
    checks,
  };
}

describe('BuildFitNews: the build page’s delivery record', () => {
  afterEach(() => vi.restoreAllMocks());

  it('shows followers told, pending, failed and uncertain counts and a line per check; an owner retries the failed', async () => {
    let current = record();
    const requests = stubApi([
      { path: /^\/workshops\/w1\/builds\/b1\/fit-news$/, body: () => current },
      {
        method: 'POST',
        path: /^\/workshops\/w1\/builds\/b1\/fit-news\/retry$/,
        body: () => {
          current = record({ failed: 0, pending: 4, checks: [check({ failed: 0, pending: 2 }), check({ checkId: 'c2', checkTitle: 'Shaft turns by hand', failed: 0, pending: 1 })] });
          return current;
        },
      },
    ]);
    renderWithProviders(<BuildFitNews workshopId="w1" buildId="b1" canRetry />);
    const line = await screen.findByTestId('build-fit-news-summary');
    expect(line.textContent).toMatch(/^35 followers told about changes of 2 checks \(60 mails\) · 1 pending · 3 failed · 5 in digests · 1 possibly sent twice · sent .+ – .+$/);
    const table = screen.getByRole('table', { name: 'Fit news per check' });
    const rows = within(table).getAllByRole('row');
    expect(rows).toHaveLength(3);
    expect(rows[1].textContent).toContain('Pilot bearing bore');
    expect(rows[1].textContent).toContain('(2 news changes)');
    expect(rows[2].textContent).toContain('No fit');

    const failed = screen.getByTestId('build-fit-news-failed');
    expect(within(failed).getByText('3 fit-news mails of this build failed')).toBeTruthy();
    fireEvent.click(within(failed).getByRole('button', { name: 'Retry failed' }));
    await waitFor(() => expect(screen.queryByTestId('build-fit-news-failed')).toBeNull());
    expect(screen.getByTestId('build-fit-news-summary').textContent).toContain('4 pending');
    expect(requests.filter((request) => request.method === 'POST').map((request) => request.url.pathname)).toEqual(['/api/workshops/w1/builds/b1/fit-news/retry']);
  }, 30_000);

  it('tells an editor that an owner can send failed mail again, without the button', async () => {
    stubApi([{ path: /^\/workshops\/w1\/builds\/b1\/fit-news$/, body: record({ pending: 0 }) }]);
    renderWithProviders(<BuildFitNews workshopId="w1" buildId="b1" canRetry={false} />);
    const failed = await screen.findByTestId('build-fit-news-failed');
    expect(failed.textContent).toContain('A workshop owner can send them again.');
    expect(within(failed).queryByRole('button')).toBeNull();
  });

  it('shows the API’s reason when a retry is refused', async () => {
    stubApi([
      { path: /^\/workshops\/w1\/builds\/b1\/fit-news$/, body: record({ pending: 0 }) },
      { method: 'POST', path: /retry$/, status: 403, body: { statusCode: 403, message: 'Only workshop owners can do this', code: 'forbidden' } },
    ]);
    renderWithProviders(<BuildFitNews workshopId="w1" buildId="b1" canRetry />);
    fireEvent.click(await screen.findByRole('button', { name: 'Retry failed' }));
    expect((await screen.findByRole('alert')).textContent).toContain('Only workshop owners can do this');
  });

  it('says no fit news has gone out for a build none of whose checks changed', async () => {
    stubApi([{ path: /^\/workshops\/w1\/builds\/b1\/fit-news$/, body: record({ checks: [], followersTold: 0, told: 0, pending: 0, failed: 0, inDigests: 0, uncertain: 0 }) }]);
    renderWithProviders(<BuildFitNews workshopId="w1" buildId="b1" canRetry />);
    expect(await screen.findByText(/no fit news has gone out/)).toBeTruthy();
    expect(screen.queryByRole('table')).toBeNull();
  });
});
