import { Alert, Anchor, Button, Group, Loader, Paper, Stack, Text, Title } from '@mantine/core';
import { useEffect, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { useSession } from '@/lib/session';
import { useUnsubscribe } from '../api/mutations';
import type { UnsubscribeResult } from '../api/queries';
import { KIND_IN_WORDS } from './follow-words';

/**
 * The page behind every fit-news e-mail's "stop" link: it sends the link's token once, as soon as it
 * opens, says what stopped and lists what would still bring the same news (a ref keeps React's development double-render from sending it twice), signed in or not.
 */
export function UnsubscribeView({ token }: { token: string | null }) {
  const unsubscribe = useUnsubscribe();
  const sent = useRef(false);
  const { mutate } = unsubscribe;
  useEffect(() => {
    if (!token || sent.current) return;
    sent.current = true;
    mutate({ token });
  }, [token, mutate]);

  return (
    <Paper withBorder radius="md" p="xl" maw={480} mx="auto" mt="xl">
      <Stack gap="md">
        <Title order={2}>Stop fit news</Title>
        <Outcome token={token} unsubscribe={unsubscribe} />
      </Stack>
    </Paper>
  );
}

/**
 * The person's other follows that would still bring news of the same assembly (its build, its
 * workshop), each with a one-click stop that uses the same link: the page never claims more than it stopped.
 */
function StillFollowing({ token, first }: { token: string; first: UnsubscribeResult }) {
  const alsoStop = useUnsubscribe();
  const [stopping, setStopping] = useState<string | null>(null);
  const { stillFollowing } = alsoStop.data ?? first;
  const stoppedSome = alsoStop.isSuccess;

  if (stillFollowing.length === 0) {
    return (
      <Text size="sm" data-testid="still-following-none">
        {stoppedSome ? 'Those are stopped too. ' : ''}Nothing else you follow brings news of this.
      </Text>
    );
  }
  return (
    <Stack gap="xs" w="100%" data-testid="still-following">
      <Text size="sm">You still follow these, and they bring news of the same thing. Stop them too?</Text>
      {stillFollowing.map((follow) => (
        <Group key={follow.id} justify="space-between" wrap="nowrap">
          <Text size="sm">
            {KIND_IN_WORDS[follow.targetKind]}: {follow.label}
            {follow.targetKind !== 'workshop' && follow.workshop.name ? ` (${follow.workshop.name})` : ''}
          </Text>
          <Button
            size="xs"
            variant="default"
            loading={alsoStop.isPending && stopping === follow.id}
            disabled={alsoStop.isPending}
            onClick={() => {
              setStopping(follow.id);
              alsoStop.mutate({ token, followId: follow.id });
            }}
          >
            Stop {follow.label}
          </Button>
        </Group>
      ))}
      {alsoStop.isError && (
        <Alert color="red" role="alert">
          {alsoStop.error.message}
        </Alert>
      )}
    </Stack>
  );
}

/** What the link stopped, in words that claim no more than that. */
function outcomeWords(stopped: UnsubscribeResult['stopped'], status: UnsubscribeResult['status'], label: string): string {
  if (stopped === 'fit_report_mail') {
    return status === 'already' ? 'Mail about new fit reports was already off.' : 'You will no longer get mail about new fit reports to your workshops.';
  }
  if (stopped === 'digest') {
    return status === 'already' ? `You had already stopped ${label}.` : `We stopped ${label}: its follows are paused.`;
  }
  return status === 'already'
    ? `You had already stopped fit news about ${label}. We will not send you more through it.`
    : `You will no longer get fit news about ${label}.`;
}

function Outcome({ token, unsubscribe }: { token: string | null; unsubscribe: ReturnType<typeof useUnsubscribe> }) {
  const { user } = useSession();
  const manage = user ? (
    <Anchor component={Link} to={paths.account} size="sm">
      See everything you follow in your account
    </Anchor>
  ) : null;

  if (!token) {
    return (
      <Alert color="red" role="alert" title="This link is incomplete">
        Open it again from the e-mail, or copy the whole address.
      </Alert>
    );
  }
  if (unsubscribe.isError) {
    // 404: no such token; 400: not even shaped like one (a link cut short). Either way the link is at fault.
    const unknown = unsubscribe.error instanceof ApiError && (unsubscribe.error.status === 404 || unsubscribe.error.status === 400);
    return (
      <Stack gap="sm" align="flex-start">
        <Alert color="red" role="alert" title={unknown ? 'We do not know this link' : 'We could not stop the e-mails'} w="100%">
          {unknown
            ? 'It may have been cut short by your mail program: open it again from the e-mail, or copy the whole address.'
            : unsubscribe.error.message}
        </Alert>
        {!unknown && (
          <Button variant="default" onClick={() => unsubscribe.mutate({ token })}>
            Try again
          </Button>
        )}
        {manage}
      </Stack>
    );
  }
  if (unsubscribe.isSuccess) {
    const { status, label } = unsubscribe.data;
    return (
      <Stack gap="sm" align="flex-start">
        <Alert color="patina" role="status" title={status === 'already' ? 'Already stopped' : 'Stopped'} w="100%" data-testid="unsubscribe-outcome">
          {outcomeWords(unsubscribe.data.stopped, status, label)}
        </Alert>
        {unsubscribe.data.stopped !== 'fit_report_mail' && <StillFollowing token={token} first={unsubscribe.data} />}
        {manage}
        <Anchor component={Link} to={`${paths.mailPreferences}?token=${encodeURIComponent(token)}`} size="sm">
          Rather get a daily or weekly digest? Choose per follow in your mail preferences
        </Anchor>
        <Anchor component={Link} to={paths.guideIndex} size="sm">
          Browse published guides
        </Anchor>
      </Stack>
    );
  }
  return (
    <Stack align="center" gap="xs" role="status">
      <Loader aria-hidden />
      <Text c="dimmed">Stopping the e-mails…</Text>
    </Stack>
  );
}
