import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { followQueries, type Follow, type FollowTargetKind, type MailPreferences, type MailPreferencesChange, type UnsubscribeResult, type UnsubscribeScope } from './queries';

/** Waits for my follows to be read again, so a checkbox or a list never shows the old state in between. */
function useRefreshFollows() {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: followQueries.all() });
}

export function useFollow() {
  const refresh = useRefreshFollows();
  return useMutation({
    mutationFn: (target: { targetKind: FollowTargetKind; targetId: string }) =>
      apiRequest<Follow>('/follows', { method: 'POST', body: target }),
    onSuccess: refresh,
  });
}

export function useUnfollow() {
  const refresh = useRefreshFollows();
  return useMutation({
    mutationFn: (followId: string) => apiRequest<null>(`/follows/${encodeURIComponent(followId)}`, { method: 'DELETE' }),
    onSuccess: refresh,
  });
}

/** The e-mailed "stop" link: works signed out, with nothing but the link's token. */
export function useUnsubscribe() {
  const refresh = useRefreshFollows();
  return useMutation({
    // With a followId: stop one of the other follows the first answer listed, with the same link.
    // With a scope: stop every follow in the mail's workshop, or all fit news, with the same link.
    mutationFn: ({ token, followId, scope }: { token: string; followId?: string; scope?: UnsubscribeScope }) =>
      apiRequest<UnsubscribeResult>('/follows/unsubscribe', {
        method: 'POST',
        body: { token, ...(followId ? { followId } : {}), ...(scope ? { scope } : {}) },
      }),
    // The person may be signed in in this browser: their list of follows changed too.
    onSuccess: () => void refresh(),
  });
}

/**
 * Saves mail preferences, signed in or (with a token) through a mail's link. The answer is the whole new
 * state: it replaces what the page shows at once, then my follows are read again.
 */
export function useSaveMailPreferences(token?: string) {
  const queryClient = useQueryClient();
  const refresh = useRefreshFollows();
  return useMutation({
    mutationFn: (change: MailPreferencesChange) =>
      token
        ? apiRequest<MailPreferences>('/follows/preferences/link', { method: 'PUT', query: { token }, body: change })
        : apiRequest<MailPreferences>('/follows/preferences', { method: 'PUT', body: change }),
    onSuccess: (saved) => {
      queryClient.setQueryData((token ? followQueries.preferencesByLink(token) : followQueries.preferences()).queryKey, saved);
      void refresh();
    },
  });
}
