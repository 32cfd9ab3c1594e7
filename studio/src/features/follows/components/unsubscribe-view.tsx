import { Alert, Anchor, Button, Group, Loader, Paper, Stack, Text, Title } from '@mantine/core';
import { useEffect, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { useSession } from '@/lib/session';
import { useUnsubscribe } from '../api/mutations';
import type { UnsubscribeResult, UnsubscribeScope } from '../api/queries';
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

/** A wider stop's outcome, claiming no more than the answer says. */
function widerWords({ stopped, status, label }: UnsubscribeResult): string {
  if (status === 'already') return `Nothing more to stop: ${label} was already stopped.`;
  return stopped === 'workshop'
    ? `We stopped ${label}: its follows and the news of your fit reports there.`
    : 'We stopped all fit news: every follow and the news of your fit reports.';
}

/** The API's reason as a sentence, whatever punctuation it came with. */
function asSentence(message: string): string {
  const trimmed = message.trim();
  return /[.!?]$/.test(trimmed) ? trimmed : `${trimmed}.`;
}

/**
 * Wider one-click stops with the same link, offered only where the link allows them: a followed
 * item's or a fit report's mail may stop everything from its workshop; every link may stop all fit
 * news (a digest or the new-fit-report mail spans workshops, so the API refuses "workshop" for them).
 * Each stop's outcome stays on the page, so a later failure never hides what already stopped.
 */
function WiderStops({
  token,
  first,
  done,
  onStopped,
}: {
  token: string;
  first: UnsubscribeResult;
  done: UnsubscribeResult[];
  onStopped: (result: UnsubscribeResult) => void;
}) {
  const wider = useUnsubscribe();
  const [asked, setAsked] = useState<UnsubscribeScope | null>(null);
  const stoppedEverything = done.some((result) => result.stopped === 'everything');
  const offerWorkshop = (first.stopped === 'follow' || first.stopped === 'report') && done.length === 0;
  const offerEverything = !stoppedEverything;
  // The first answer names no workshop itself; the follows it lists are all in the mail's workshop.
  const workshopName = first.stillFollowing.find((follow) => follow.workshop.name)?.workshop.name ?? 'this workshop';
  const stop = (scope: UnsubscribeScope) => {
    setAsked(scope);
    wider.mutate({ token, scope }, { onSuccess: onStopped });
  };

  return (
    <Stack gap="xs" w="100%" data-testid="wider-stops">
      {done.map((result) => (
        <Alert key={result.stopped} color="patina" role="status" data-testid={`wider-outcome-${result.stopped}`}>
          {widerWords(result)}
        </Alert>
      ))}
      {(offerWorkshop || offerEverything) && (
        <>
          <Text size="sm">Or stop more at once:</Text>
          <Group gap="xs">
            {offerWorkshop && (
              <Button size="xs" variant="default" loading={wider.isPending && asked === 'workshop'} disabled={wider.isPending} onClick={() => stop('workshop')}>
                Stop all fit news from {workshopName}
              </Button>
            )}
            <Button size="xs" variant="default" loading={wider.isPending && asked === 'everything'} disabled={wider.isPending} onClick={() => stop('everything')}>
              Stop all fit news
            </Button>
          </Group>
        </>
      )}
      {wider.isError && (
        <Alert color="red" role="alert" title="Nothing more was stopped">
          {asSentence(wider.error.message)}
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
  const [widerDone, setWiderDone] = useState<UnsubscribeResult[]>([]);
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
        {/* A wider stop took every follow the list named with it. */}
        {unsubscribe.data.stopped !== 'fit_report_mail' && widerDone.length === 0 && <StillFollowing token={token} first={unsubscribe.data} />}
        <WiderStops token={token} first={unsubscribe.data} done={widerDone} onStopped={(result) => setWiderDone((before) => [...before, result])} />
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
