import { Alert, Button, Paper, Skeleton, Stack, Text, Title } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { RetryNotice } from '@/components/retry-notice';
import { ApiError } from '@/lib/api-client';
import { formatDate } from '@/lib/dates';
import { useSetInvitationOptOut } from '../api/mutations';
import { workshopQueries } from '../api/queries';

/** Loaded: what the address's invitations do now, and the one button that changes it. */
function OptOutPanel({ token }: { token: string }) {
  const state = useQuery(workshopQueries.invitationOptOut(token));
  const change = useSetInvitationOptOut(token);
  if (state.isPending) return <Skeleton height={120} aria-label="Loading" />;
  if (state.isError) {
    // 404: no such link; 400: not even shaped like one (cut short). Either way the link is at fault.
    if (state.error instanceof ApiError && (state.error.status === 404 || state.error.status === 400)) {
      return (
        <Alert color="red" role="alert" title="We do not know this link">
          It may have been cut short by your mail program: open it again from the invitation e-mail, or copy the whole address.
        </Alert>
      );
    }
    return <RetryNotice title="Could not load this link" message={state.error.message} onRetry={() => void state.refetch()} />;
  }
  const { email, stopped, stoppedSince } = state.data;
  return (
    <Stack gap="sm">
      {stopped ? (
        <Alert color="patina" role="status" title="Invitations are stopped" data-testid="invitations-stopped">
          Nobody on Fitwright can invite <strong>{email}</strong> to a workshop
          {stoppedSince ? ` (since ${formatDate(stoppedSince)})` : ''}. Whoever tries is told that this address asked not to receive
          invitations, and nothing is sent.
        </Alert>
      ) : (
        <Text data-testid="invitations-allowed">
          Workshop members on Fitwright can invite <strong>{email}</strong>. Each invitation is one e-mail; if you do not answer, it
          lapses after 7 days.
        </Text>
      )}
      <Button
        variant={stopped ? 'default' : 'filled'}
        color={stopped ? undefined : 'red'}
        loading={change.isPending}
        onClick={() => change.mutate(!stopped)}
        style={{ alignSelf: 'flex-start' }}
      >
        {stopped ? 'Allow invitations again' : 'Stop all invitations to this address'}
      </Button>
      {change.isError && (
        <Alert color="red" role="alert" title="Not changed">
          {change.error.message}
        </Alert>
      )}
    </Stack>
  );
}

/**
 * The page behind the "stop invitations" link in every invitation mail (?token=): no sign-in, the link's
 * token is the key. Opening it changes nothing (mail scanners open links); the button does, and undoes.
 */
export function InvitationOptOutPage({ token }: { token: string | null }) {
  return (
    <Paper withBorder radius="md" p="xl" maw={560} mx="auto" mt="xl">
      <Stack gap="md">
        <Title order={2}>Workshop invitations</Title>
        {token ? (
          <OptOutPanel token={token} />
        ) : (
          <Alert color="red" role="alert" title="This link is incomplete">
            Open it again from the invitation e-mail, or copy the whole address.
          </Alert>
        )}
      </Stack>
    </Paper>
  );
}
