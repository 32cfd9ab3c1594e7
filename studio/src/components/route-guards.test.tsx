import { MantineProvider } from '@mantine/core';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createMemoryRouter, RouterProvider, useLocation } from 'react-router-dom';
import { paths } from '@/config/paths';
import { theme } from '@/theme/theme';
import { RequireAdmin, RequireSignIn } from './route-guards';

function answerMe(user: unknown) {
  vi.spyOn(globalThis, 'fetch').mockResolvedValue(
    new Response(JSON.stringify({ user }), { status: 200, headers: { 'Content-Type': 'application/json' } }),
  );
}

function SignInProbe() {
  const location = useLocation();
  return <p>sign-in page, next={new URLSearchParams(location.search).get('next')}</p>;
}

function renderAt(url: string) {
  const router = createMemoryRouter(
    [
      { path: paths.signIn, element: <SignInProbe /> },
      { element: <RequireSignIn />, children: [{ path: '/workshops/:workshopId/members', element: <p>members page</p> }] },
      { element: <RequireAdmin />, children: [{ path: paths.adminUsers, element: <p>admin page</p> }] },
    ],
    { initialEntries: [url] },
  );
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <MantineProvider theme={theme}>
      <QueryClientProvider client={queryClient}>
        <RouterProvider router={router} />
      </QueryClientProvider>
    </MantineProvider>,
  );
}

const user = { id: 'u1', email: 'sam@harrow-lane.example', displayName: 'Sam Okafor', isAdmin: false, preferredUnits: 'metric', emailVerified: true };

describe('route guards', () => {
  afterEach(() => vi.restoreAllMocks());

  it('sends a signed-out visitor to sign in, remembering where they were going', async () => {
    answerMe(null);
    renderAt('/workshops/w1/members?tab=pending');
    expect(await screen.findByText('sign-in page, next=/workshops/w1/members?tab=pending')).toBeTruthy();
  });

  it('shows the page to a signed-in user', async () => {
    answerMe(user);
    renderAt('/workshops/w1/members');
    expect(await screen.findByText('members page')).toBeTruthy();
  });

  it('keeps administration for site admins', async () => {
    answerMe(user);
    renderAt(paths.adminUsers);
    expect(await screen.findByText('This page is for the site administrators.')).toBeTruthy();
    expect(screen.queryByText('admin page')).toBeNull();
  });

  it('lets a site admin in', async () => {
    answerMe({ ...user, isAdmin: true });
    renderAt(paths.adminUsers);
    expect(await screen.findByText('admin page')).toBeTruthy();
  });
});
