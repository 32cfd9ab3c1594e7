import type { FollowTargetKind } from '../api/queries';

/** What following does, in one line, wherever a person can choose to follow. */
export const FOLLOW_EXPLANATION = 'We e-mail you when a fit check here is confirmed or fails.';

export const KIND_IN_WORDS: Record<FollowTargetKind, string> = {
  assembly: 'Assembly',
  build: 'Build',
  workshop: 'Workshop',
};

/** "a", "a and b", "a, b and c". */
export function listInWords(items: readonly string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}
