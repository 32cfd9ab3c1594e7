import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import { FollowingSection } from './following-section';
import { testFollow } from './test-follows';

vi.mock('@/lib/notify', () => ({ notifyError: vi.fn(), notifyDone: vi.fn() }));

describe('FollowingSection', () => {
  afterEach(() => vi.restoreAllMocks());

  it('lists my follows with their kind in words and workshop, and unfollows one', async () => {
    const mine = [
      testFollow({ id: 'f-ws', targetKind: 'workshop', targetId: 'w1', label: 'Harrow Lane Garage' }),
      testFollow({ id: 'f-asm', targetKind: 'assembly', targetId: 'a1', label: '21-tooth coupler stack' }),
    ];
    const requests = stubApi([
      { path: /^\/follows$/, body: () => mine },
      {
        method: 'DELETE',
        path: /^\/follows\/f-asm$/,
        reply: () => {
          mine.pop();
          return { status: 204, body: null };
        },
      },
    ]);
    renderWithProviders(<FollowingSection />);
    const table = await screen.findByRole('table', { name: 'What you follow' });
    expect(within(table).getAllByTestId('follow-row').map((row) => row.textContent)).toEqual([
      'Harrow Lane GarageWorkshopHarrow Lane GarageUnfollow',
      '21-tooth coupler stackAssemblyHarrow Lane GarageUnfollow',
    ]);
    fireEvent.click(screen.getByRole('button', { name: 'Unfollow 21-tooth coupler stack' }));
    await waitFor(() => expect(screen.getAllByTestId('follow-row')).toHaveLength(1));
    expect(requests.filter((request) => request.method === 'DELETE').map((request) => request.url.pathname)).toEqual(['/api/follows/f-asm']);
  });

  it('says how to start when I follow nothing', async () => {
    stubApi([{ path: /^\/follows$/, body: [] }]);
    renderWithProviders(<FollowingSection />);
    expect((await screen.findByTestId('following-empty')).textContent).toMatch(/You follow nothing yet/);
    expect(screen.getByRole('link', { name: 'published guide' }).getAttribute('href')).toBe('/guides');
  });
});
