import { screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import type { FitCheck, FitCheckEvent } from '../api/queries';
import { HistoryDrawer } from './history-drawer';

describe('HistoryDrawer', () => {
  afterEach(() => vi.restoreAllMocks());

  it('names the member who moved the check, and says when the fit engine did', async () => {
    stubApi([
      {
        path: /^\/workshops\/w1\/checks\/c1\/history$/,
        body: ([
          { id: 'e1', from: null, to: 'bench_pass', reason: 'clearance 0.019 mm measured', actorId: null, actorName: null, at: '2026-12-01T09:00:00.000Z' },
          { id: 'e2', from: 'bench_pass', to: 'confirmed', reason: 'test-fitted on the rig', actorId: 'u1', actorName: 'Quinn Marsh', at: '2026-12-02T09:00:00.000Z' },
          { id: 'e3', from: 'confirmed', to: 'open', reason: 're-opened: bore changed', actorId: 'u2', actorName: null, at: '2026-12-03T09:00:00.000Z' },
        ] satisfies FitCheckEvent[]),
      },
    ]);
    const check = { id: 'c1', title: 'Pilot bearing bore' } as FitCheck;
    renderWithProviders(<HistoryDrawer workshopId="w1" check={check} onClose={() => undefined} />);
    expect(await screen.findByText(/by Quinn Marsh/)).toBeTruthy();
    expect(screen.getByText(/by the fit engine/)).toBeTruthy();
    expect(screen.getByText(/by a former member/)).toBeTruthy();
    expect(screen.queryByText(/by a member\b/)).toBeNull();
  });
});
