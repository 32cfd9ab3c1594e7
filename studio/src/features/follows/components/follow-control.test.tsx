import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { notifyError } from '@/lib/notify';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import type { Follow } from '../api/queries';
import { FollowControl } from './follow-control';
import { signedInUser, testFollow, testTargets } from './test-follows';

// The app shows failures as notifications; here it is enough to see what would be said.
vi.mock('@/lib/notify', () => ({ notifyError: vi.fn(), notifyDone: vi.fn() }));

const GUIDE = '/guides/harrow-lane-garage/motor-to-gearbox-coupler';
const explanation = 'We e-mail you when a fit check here is confirmed or fails.';

/** A signed-in person whose follows live in `mine`, changed by POST and DELETE as the server would. */
function serveFollows(mine: Follow[]) {
  return stubApi([
    { path: /^\/auth\/me$/, body: { user: signedInUser } },
    { path: /^\/follows$/, body: () => mine },
    {
      method: 'POST',
      path: /^\/follows$/,
      reply: ({ body }) => {
        const { targetKind, targetId } = body as Pick<Follow, 'targetKind' | 'targetId'>;
        const created = testFollow({ id: `f-${targetKind}`, targetKind, targetId, label: targetId });
        mine.unshift(created);
        return { status: 201, body: created };
      },
    },
    {
      method: 'DELETE',
      path: /^\/follows\/[\w-]+$/,
      reply: ({ url }) => {
        const id = url.pathname.split('/').pop();
        mine.splice(
          mine.findIndex((follow) => follow.id === id),
          1,
        );
        return { status: 204, body: null };
      },
    },
  ]);
}

async function openChoices(buttonName: string) {
  fireEvent.click(await screen.findByRole('button', { name: buttonName }));
  // jsdom lays nothing out, so the dropdown's floating position counts as detached and hidden: query with hidden.
  return within(await screen.findByRole('group', { name: 'What to follow', hidden: true }));
}

describe('FollowControl', () => {
  afterEach(() => {
    vi.restoreAllMocks();
    vi.mocked(notifyError).mockClear();
  });

  it('signed out: offers to sign in and come back to the guide, and says what following does', async () => {
    const requests = stubApi([{ path: /^\/auth\/me$/, body: { user: null } }]);
    renderWithProviders(<FollowControl targets={testTargets} />, { route: `${GUIDE}?t=4` });
    const link = await screen.findByRole('link', { name: 'Sign in to follow' });
    expect(link.getAttribute('href')).toBe(`/sign-in?next=${encodeURIComponent(`${GUIDE}?t=4`)}`);
    expect(screen.getByText(explanation)).toBeTruthy();
    expect(screen.queryByRole('button', { name: /Follow/ })).toBeNull();
    // Nobody to ask about: the follows list (401 signed out) is never requested.
    expect(requests.map((request) => request.url.pathname)).toEqual(['/api/auth/me']);
  });

  it('not following: follows the checklist’s assembly and then says so', async () => {
    const requests = serveFollows([]);
    renderWithProviders(<FollowControl targets={testTargets} />, { route: GUIDE });
    expect((await screen.findByTestId('follow-summary')).textContent).toBe(explanation);
    const choices = await openChoices('Follow');
    const assembly = choices.getByRole('checkbox', { name: 'Assembly: 21-tooth coupler stack', hidden: true }) as HTMLInputElement;
    await waitFor(() => expect(assembly.disabled).toBe(false));
    expect(choices.getAllByRole('checkbox', { hidden: true }).map((box) => (box as HTMLInputElement).checked)).toEqual([false, false, false]);
    expect(choices.getByRole('checkbox', { name: 'Build: Motor-to-gearbox coupler', hidden: true })).toBeTruthy();
    expect(choices.getByRole('checkbox', { name: 'Workshop: Harrow Lane Garage', hidden: true })).toBeTruthy();

    fireEvent.click(assembly);
    await waitFor(() => expect(assembly.checked).toBe(true));
    await waitFor(() => expect(screen.getByTestId('follow-summary').textContent).toBe(`You follow this assembly. ${explanation}`));
    expect(assembly.checked).toBe(true);
    expect(requests.find((request) => request.method === 'POST')?.body).toEqual({ targetKind: 'assembly', targetId: 'a1' });
    expect(screen.getByRole('button', { name: 'Following (1)' })).toBeTruthy();
  });

  it('following: shows what is followed (matched by kind and id) and unfollows it', async () => {
    // A follow of a workshop whose id happens to equal the build's must not tick the build.
    const mine = [
      testFollow({ id: 'f-build', targetKind: 'build', targetId: 'b1', label: 'Motor-to-gearbox coupler' }),
      testFollow({ id: 'f-other', targetKind: 'workshop', targetId: 'a1', label: 'Another workshop' }),
    ];
    const requests = serveFollows(mine);
    renderWithProviders(<FollowControl targets={testTargets} />, { route: GUIDE });
    await waitFor(() => expect(screen.getByTestId('follow-summary').textContent).toBe(`You follow this build. ${explanation}`));
    const choices = await openChoices('Following (1)');
    const build = choices.getByRole('checkbox', { name: 'Build: Motor-to-gearbox coupler', hidden: true }) as HTMLInputElement;
    expect(build.checked).toBe(true);
    expect((choices.getByRole('checkbox', { name: 'Assembly: 21-tooth coupler stack', hidden: true }) as HTMLInputElement).checked).toBe(false);
    expect((choices.getByRole('checkbox', { name: 'Workshop: Harrow Lane Garage', hidden: true }) as HTMLInputElement).checked).toBe(false);

    fireEvent.click(build);
    await waitFor(() => expect(build.checked).toBe(false));
    await waitFor(() => expect(screen.getByTestId('follow-summary').textContent).toBe(explanation));
    expect(build.checked).toBe(false);
    expect(requests.filter((request) => request.method === 'DELETE').map((request) => request.url.pathname)).toEqual(['/api/follows/f-build']);
    expect(screen.getByRole('button', { name: 'Follow' })).toBeTruthy();
  });

  it('a guide that follows no assembly offers its build and workshop only', async () => {
    serveFollows([]);
    renderWithProviders(<FollowControl targets={{ ...testTargets, assembly: null }} />, { route: GUIDE });
    const choices = await openChoices('Follow');
    expect(choices.getAllByRole('checkbox', { hidden: true })).toHaveLength(2);
    expect(choices.queryByRole('checkbox', { name: /^Assembly/ })).toBeNull();
  });

  it('tells in words when following fails', async () => {
    stubApi([
      { path: /^\/auth\/me$/, body: { user: signedInUser } },
      { path: /^\/follows$/, body: [] },
      { method: 'POST', path: /^\/follows$/, status: 404, body: { statusCode: 404, message: 'Nothing to follow here' } },
    ]);
    renderWithProviders(<FollowControl targets={testTargets} />, { route: GUIDE });
    const choices = await openChoices('Follow');
    const workshop = choices.getByRole('checkbox', { name: 'Workshop: Harrow Lane Garage', hidden: true }) as HTMLInputElement;
    await waitFor(() => expect(workshop.disabled).toBe(false));
    fireEvent.click(workshop);
    await waitFor(() => expect(workshop.disabled).toBe(false));
    expect(workshop.checked).toBe(false);
    expect(notifyError).toHaveBeenCalledWith('Could not follow Harrow Lane Garage', expect.objectContaining({ message: 'Nothing to follow here' }));
  });
});
