import type { ReactNode } from 'react';
import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useSession } from '@/lib/session';
import { ErrorView } from './error-view';
import { PageLoader } from './page-loader';

/** The sign-in address that brings the person back to where they were. */
export function signInPathFor(location: { pathname: string; search: string }): string {
  return `${paths.signIn}?next=${encodeURIComponent(`${location.pathname}${location.search}`)}`;
}

/** Creator pages: a signed-out visitor is sent to sign in, then back (`?next=`). */
export function RequireSignIn({ children }: { children?: ReactNode }) {
  const { user, isPending } = useSession();
  const location = useLocation();
  if (isPending) return <PageLoader />;
  if (!user) return <Navigate to={signInPathFor(location)} replace />;
  return children ?? <Outlet />;
}

/** Site administration: signed-out visitors sign in first; other users are told it is not for them. */
export function RequireAdmin({ children }: { children?: ReactNode }) {
  const { user, isPending } = useSession();
  const location = useLocation();
  if (isPending) return <PageLoader />;
  if (!user) return <Navigate to={signInPathFor(location)} replace />;
  if (!user.isAdmin) {
    return <ErrorView title="Not available" message="This page is for the site administrators." />;
  }
  return children ?? <Outlet />;
}
