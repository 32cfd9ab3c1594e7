import { screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { HealthPanel } from './health-panel';

function answer(status: number, body: unknown) {
  vi.spyOn(globalThis, 'fetch').mockResolvedValue(
    new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } }),
  );
}

describe('HealthPanel', () => {
  afterEach(() => vi.restoreAllMocks());

  it('shows every check as up when the API says ok', async () => {
    answer(200, { status: 'ok', checks: { database: 'up', storage: 'up', mail: 'up', queue: 'up' } });
    renderWithProviders(<HealthPanel />);
    expect(await screen.findByText('Every service is up.')).toBeTruthy();
    for (const name of ['database', 'storage', 'mail', 'queue']) {
      expect(screen.getByTestId(`check-${name}`).getAttribute('data-state')).toBe('up');
    }
  });

  it('reads a 503 report and marks the service that is down', async () => {
    answer(503, {
      statusCode: 503,
      message: 'Down: mail',
      status: 'down',
      checks: { database: 'up', storage: 'up', mail: 'down', queue: 'up' },
    });
    renderWithProviders(<HealthPanel />);
    expect(await screen.findByText(/Some services are down/)).toBeTruthy();
    expect(screen.getByTestId('check-mail').getAttribute('data-state')).toBe('down');
    expect(screen.getByTestId('check-database').getAttribute('data-state')).toBe('up');
  });

  it('says so in words when the server cannot be reached', async () => {
    vi.spyOn(globalThis, 'fetch').mockRejectedValue(new TypeError('Failed to fetch'));
    renderWithProviders(<HealthPanel />);
    expect(await screen.findByText(/Could not reach the server/)).toBeTruthy();
  });
});
