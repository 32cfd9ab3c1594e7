import { queryOptions, useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { apiRequest, onUnauthorized } from './api-client';

/** The signed-in user as `GET /api/auth/me` describes them. */
export interface SessionUser {
  id: string;
  email: string;
  displayName: string;
  isAdmin: boolean;
  preferredUnits: 'metric' | 'inch';
  emailVerified: boolean;
}

export interface MeResponse {
  user: SessionUser | null;
}

/** One query for "who is signed in", shared by the header, the route guards and every feature. */
export const sessionQuery = () =>
  queryOptions({
    queryKey: ['session'] as const,
    queryFn: ({ signal }) => apiRequest<MeResponse>('/auth/me', { signal }),
    staleTime: 60_000,
  });

export interface Session {
  user: SessionUser | null;
  /** True until the first answer arrives. */
  isPending: boolean;
}

export function useSession(): Session {
  const session = useQuery(sessionQuery());
  return { user: session.data?.user ?? null, isPending: session.isPending };
}

/**
 * Mount once (the app provider does): when any request answers 401, the session is forgotten at once,
 * so the route guard sends the person to sign in, and back here afterwards.
 */
export function useForgetSessionOnUnauthorized(): void {
  const queryClient = useQueryClient();
  useEffect(
    () =>
      onUnauthorized(() => {
        if (queryClient.getQueryData(sessionQuery().queryKey)?.user) {
          queryClient.setQueryData(sessionQuery().queryKey, { user: null });
        }
      }),
    [queryClient],
  );
}

/** Only same-site paths may follow `?next=` (never another origin, never `//host`). */
export function safeNextPath(next: string | null | undefined, fallback: string): string {
  return next && next.startsWith('/') && !next.startsWith('//') && !next.startsWith('/\\') ? next : fallback;
}
