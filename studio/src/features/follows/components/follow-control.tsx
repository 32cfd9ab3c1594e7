import { Alert, Anchor, Button, Checkbox, Group, Loader, Popover, Stack, Text } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useId, useState } from 'react';
import { Link, useLocation } from 'react-router-dom';
import { signInPathFor } from '@/components/route-guards';
import { paths } from '@/config/paths';
import { notifyError } from '@/lib/notify';
import { useSession, type SessionUser } from '@/lib/session';
import { useFollow, useUnfollow } from '../api/mutations';
import { findFollow, followQueries, type FollowTarget, type FollowTargetKind, type FollowTargets } from '../api/queries';
import { FOLLOW_EXPLANATION, KIND_IN_WORDS, listInWords } from './follow-words';
import { RetryNotice } from '@/components/retry-notice';

interface Choice {
  kind: FollowTargetKind;
  target: FollowTarget;
  /** How the summary line names it ("You follow this assembly"). */
  phrase: string;
  /** What following it covers. */
  reach: string;
}

/** Narrowest first: the checklist's own assembly, then the build it belongs to, then the whole workshop. */
function choicesOf(targets: FollowTargets): Choice[] {
  return [
    ...(targets.assembly
      ? [{ kind: 'assembly' as const, target: targets.assembly, phrase: 'this assembly', reach: 'The checks in this guide’s checklist' }]
      : []),
    { kind: 'build', target: targets.build, phrase: 'this build', reach: 'Every assembly of this build' },
    { kind: 'workshop', target: targets.workshop, phrase: 'the workshop', reach: 'Everything this workshop checks' },
  ];
}

/**
 * Following a published guide's assembly, build or workshop, beside its title. Signed-out readers
 * are offered to sign in and come back here (`?next=`).
 */
export function FollowControl({ targets }: { targets: FollowTargets }) {
  const { user, isPending } = useSession();
  const location = useLocation();
  if (isPending) return null;
  if (!user) {
    return (
      <Group gap="sm" data-testid="follow-control">
        <Button component={Link} to={signInPathFor(location)} variant="light" size="xs">
          Sign in to follow
        </Button>
        <Text size="sm" c="dimmed">
          {FOLLOW_EXPLANATION}
        </Text>
      </Group>
    );
  }
  return <SignedInFollowControl user={user} targets={targets} />;
}

function SignedInFollowControl({ user, targets }: { user: SessionUser; targets: FollowTargets }) {
  const follows = useQuery(followQueries.mine());
  const groupLabelId = useId();
  const follow = useFollow();
  const unfollow = useUnfollow();
  const choices = choicesOf(targets);
  const followed = choices.filter((choice) => findFollow(follows.data, choice.kind, choice.target.id));

  // The person's latest choice per target, set in the click itself so the box never flips back for a frame while
  // the request starts. It holds until the list of follows is read again (after the change) or the change fails.
  const [wantedNow, setWantedNow] = useState<Record<string, { wanted: boolean; listAt: number }>>({});
  const keyOf = (choice: Choice) => `${choice.kind}:${choice.target.id}`;
  const want = (choice: Choice, wanted: boolean) =>
    setWantedNow((current) => ({ ...current, [keyOf(choice)]: { wanted, listAt: follows.dataUpdatedAt } }));
  const forget = (choice: Choice) =>
    setWantedNow((current) => {
      const next = { ...current };
      delete next[keyOf(choice)];
      return next;
    });

  const handleToggle = (choice: Choice, wanted: boolean) => {
    const existing = findFollow(follows.data, choice.kind, choice.target.id);
    if (wanted && !existing) {
      want(choice, true);
      follow.mutate(
        { targetKind: choice.kind, targetId: choice.target.id },
        {
          onError: (error) => {
            forget(choice);
            notifyError(`Could not follow ${choice.target.label}`, error);
          },
        },
      );
    } else if (!wanted && existing) {
      want(choice, false);
      unfollow.mutate(existing.id, {
        onError: (error) => {
          forget(choice);
          notifyError(`Could not unfollow ${choice.target.label}`, error);
        },
      });
    }
  };

  const isFollowing = (choice: Choice) =>
    follow.isPending && follow.variables?.targetId === choice.target.id && follow.variables.targetKind === choice.kind;
  const isUnfollowing = (choice: Choice) =>
    unfollow.isPending && unfollow.variables === findFollow(follows.data, choice.kind, choice.target.id)?.id;
  /** A checkbox shows the person's choice at once and waits while it is on its way (and the list is read again). */
  const isBusy = (choice: Choice) => isFollowing(choice) || isUnfollowing(choice);
  const isChecked = (choice: Choice) => {
    const choiceNow = wantedNow[keyOf(choice)];
    if (choiceNow && choiceNow.listAt === follows.dataUpdatedAt) return choiceNow.wanted;
    return isFollowing(choice) || (!isUnfollowing(choice) && Boolean(findFollow(follows.data, choice.kind, choice.target.id)));
  };

  return (
    <Group gap="sm" data-testid="follow-control">
      <Popover position="bottom-start" width={340} shadow="md" withArrow trapFocus>
        <Popover.Target>
          <Button size="xs" variant={followed.length ? 'light' : 'filled'}>
            {followed.length ? `Following (${followed.length})` : 'Follow'}
          </Button>
        </Popover.Target>
        <Popover.Dropdown>
          <Stack gap="sm">
            <Text size="sm" fw={600} id={groupLabelId}>
              What to follow
            </Text>
            {!user.emailVerified && (
              <Alert color="yellow" p="xs">
                <Text size="xs">We send fit news only to confirmed addresses: follow the link we e-mailed you first.</Text>
              </Alert>
            )}
            {follows.isError ? (
              <RetryNotice message={follows.error.message} onRetry={() => void follows.refetch()} />
            ) : (
              <Stack gap="xs" role="group" aria-labelledby={groupLabelId}>
                {choices.map((choice) => (
                  <Group key={choice.kind} gap="xs" wrap="nowrap" align="flex-start">
                    <Checkbox
                      checked={isChecked(choice)}
                      disabled={follows.isPending || isBusy(choice)}
                      onChange={(event) => handleToggle(choice, event.currentTarget.checked)}
                      label={`${KIND_IN_WORDS[choice.kind]}: ${choice.target.label}`}
                      description={choice.reach}
                    />
                    {isBusy(choice) && <Loader size="xs" aria-label="Saving" />}
                  </Group>
                ))}
              </Stack>
            )}
            <Anchor component={Link} to={paths.account} size="sm">
              Everything you follow, in your account
            </Anchor>
          </Stack>
        </Popover.Dropdown>
      </Popover>
      <Text size="sm" c="dimmed" aria-live="polite" data-testid="follow-summary">
        {followed.length ? `You follow ${listInWords(followed.map((choice) => choice.phrase))}. ` : ''}
        {FOLLOW_EXPLANATION}
      </Text>
    </Group>
  );
}
