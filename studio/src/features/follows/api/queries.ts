import { queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';

/** Shapes of the follows routes (api/src/follows; OpenAPI at /api/docs). */
export type FollowTargetKind = 'workshop' | 'build' | 'assembly';

export interface Follow {
  id: string;
  targetKind: FollowTargetKind;
  targetId: string;
  /** The workshop's, build's or assembly's name as the follower sees it. */
  label: string;
  workshop: { name: string; slug: string };
  createdAt: string;
}

export interface FollowTarget {
  id: string;
  label: string;
}

/** What a published guide offers to follow (its `followTargets`): a guide that follows no assembly has none to offer. */
export interface FollowTargets {
  workshop: FollowTarget;
  build: FollowTarget;
  assembly: FollowTarget | null;
}

/** POST /follows/unsubscribe: the e-mailed link, for anyone. */
export interface UnsubscribeResult {
  status: 'unfollowed' | 'already';
  /** What the e-mail came through: a follow, or the person's own fit report. */
  stopped: 'follow' | 'report';
  label: string;
  /** The person's other follows that would still bring news of the same assembly, closest first. */
  stillFollowing: Follow[];
}

export const followQueries = {
  all: () => ['follows'] as const,
  /** Mine, newest first (401 when signed out, so only asked for a signed-in person). */
  mine: () =>
    queryOptions({
      queryKey: [...followQueries.all(), 'mine'] as const,
      queryFn: ({ signal }) => apiRequest<Follow[]>('/follows', { signal }),
    }),
};

/** My follow of this target, if any. */
export function findFollow(follows: readonly Follow[] | undefined, targetKind: FollowTargetKind, targetId: string): Follow | undefined {
  return follows?.find((follow) => follow.targetKind === targetKind && follow.targetId === targetId);
}
