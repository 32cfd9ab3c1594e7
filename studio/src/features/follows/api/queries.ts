import { queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { ApiSchema } from '@/lib/api-types';

export type Follow = ApiSchema<'FollowResponseDto'>;
export type FollowTargetKind = Follow['targetKind'];

export type FollowTarget = ApiSchema<'FollowTargetRefDto'>;

/** What a published guide offers to follow (its `followTargets`): a guide that follows no assembly has none to offer. */
export type FollowTargets = ApiSchema<'GuideFollowTargetsDto'>;

/** POST /follows/unsubscribe: the e-mailed link, for anyone. */
export interface UnsubscribeResult {
  status: 'unfollowed' | 'already';
  /** What stopped: the follow or fit report the mail came through, a digest, the new-fit-report mail, or wider. */
  stopped: ApiSchema<'UnsubscribeResultDto'>['stopped'];
  label: string;
  /** The person's other follows that would still bring news of the same assembly, closest first. */
  stillFollowing: Follow[];
}

/** How far an unsubscribe link reaches: what sent the mail (default), its workshop, or all fit news. */
export type UnsubscribeScope = NonNullable<ApiSchema<'UnsubscribeBodyDto'>['scope']>;

/** A person's mail settings and each follow's delivery (GET /follows/preferences, or …/preferences/link?token= signed out). */
export type MailPreferences = ApiSchema<'MailPreferencesDto'>;
export type MailPreferencesChange = ApiSchema<'UpdateMailPreferencesDto'>;
export type FollowDelivery = MailPreferences['follows'][number]['delivery'];

export const followQueries = {
  all: () => ['follows'] as const,
  /** Mine, newest first (401 when signed out, so only asked for a signed-in person). */
  mine: () =>
    queryOptions({
      queryKey: [...followQueries.all(), 'mine'] as const,
      queryFn: ({ signal }) => apiRequest<Follow[]>('/follows', { signal }),
    }),
  /** My mail preferences, signed in. */
  preferences: () =>
    queryOptions({
      queryKey: [...followQueries.all(), 'preferences'] as const,
      queryFn: ({ signal }) => apiRequest<MailPreferences>('/follows/preferences', { signal }),
    }),
  /** The same, signed out, with the token of a mail's preferences link. */
  preferencesByLink: (token: string) =>
    queryOptions({
      queryKey: [...followQueries.all(), 'preferences', 'link', token] as const,
      queryFn: ({ signal }) => apiRequest<MailPreferences>('/follows/preferences/link', { signal, query: { token } }),
      // A link that is not known stays unknown: asking again would only repeat the 404.
      retry: false,
    }),
};

/** My follow of this target, if any. */
export function findFollow(follows: readonly Follow[] | undefined, targetKind: FollowTargetKind, targetId: string): Follow | undefined {
  return follows?.find((follow) => follow.targetKind === targetKind && follow.targetId === targetId);
}
