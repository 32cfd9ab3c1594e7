import { Alert, Anchor, Button, Loader, Paper, Stack, Text, Title } from '@mantine/core';
import { useEffect, useRef } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { useSession } from '@/lib/session';
import { useUnsubscribe } from '../api/mutations';

/**
 * The page behind every fit-news e-mail's "stop" link: it sends the link's token once, as soon as it
 * opens (a ref keeps React's development double-render from sending it twice), signed in or not.
 */
export function UnsubscribeView({ token }: { token: string | null }) {
  const unsubscribe = useUnsubscribe();
  const sent = useRef(false);
  const { mutate } = unsubscribe;
  useEffect(() => {
    if (!token || sent.current) return;
    sent.current = true;
    mutate(token);
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
          <Button variant="default" onClick={() => unsubscribe.mutate(token)}>
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
          {status === 'already'
            ? `You had already stopped fit news about ${label}. We will not send you more.`
            : `You will no longer get fit news about ${label}.`}
        </Alert>
        {manage}
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
