import { Alert, Button, Group, Stack, Text, Title, Paper, Skeleton } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Link, useLocation, useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useSession } from '@/lib/session';
import { useAcceptInvitation } from '../api/mutations';
import { workshopQueries } from '../api/queries';
import { formatDate } from '@/lib/dates';


/**
 * The invitation link's page: says who invited whom to what; a signed-out visitor signs in or signs up
 * with the invited address and comes back here (`?next=`) to accept.
 */
export function AcceptInvitationPage({ token }: { token: string | null }) {
  const location = useLocation();
  const navigate = useNavigate();
  const { user, isPending: sessionPending } = useSession();
  const preview = useQuery({ ...workshopQueries.invitationPreview(token ?? ''), enabled: token !== null });
  const accept = useAcceptInvitation();

  let body: ReactNode;
  if (!token) {
    body = <Alert color="red">This invitation link is incomplete. Open it again from the e-mail.</Alert>;
  } else if (preview.isPending || sessionPending) {
    body = <Skeleton height={120} />;
  } else if (preview.isError) {
    body = <Alert color="red">{preview.error.message}</Alert>;
  } else {
    const invitation = preview.data;
    const here = `${location.pathname}${location.search}`;
    const roleWords = invitation.role === 'owner' ? 'an owner' : 'an editor';
    body = (
      <Stack gap="md">
        <Text>
          {invitation.invitedBy ?? 'The owner'} invited <strong>{invitation.email}</strong> to join{' '}
          <strong>{invitation.workshop.name}</strong> as {roleWords}.
        </Text>
        {invitation.status === 'accepted' && <Alert color="gray">This invitation has already been accepted.</Alert>}
        {invitation.status === 'expired' && (
          <Alert color="yellow">This invitation expired on {formatDate(invitation.expiresAt)}. Ask for a new one.</Alert>
        )}
        {invitation.status === 'pending' && !user && (
          <Stack gap="xs">
            <Text size="sm" c="dimmed">
              Sign in with {invitation.email} to accept, or create an account with that address first.
            </Text>
            <Group>
              <Button component={Link} to={`${paths.signIn}?next=${encodeURIComponent(here)}`}>
                Sign in to accept
              </Button>
              <Button
                component={Link}
                variant="light"
                to={`${paths.signUp}?next=${encodeURIComponent(here)}&email=${encodeURIComponent(invitation.email)}`}
              >
                Create an account
              </Button>
            </Group>
          </Stack>
        )}
        {invitation.status === 'pending' && user && (
          <Stack gap="xs">
            {user.email !== invitation.email && (
              <Alert color="yellow">
                You are signed in as {user.email}, but this invitation is for {invitation.email}. Sign out and sign in with
                that address to accept.
              </Alert>
            )}
            {accept.isError && (
              <Alert color="red" role="alert">
                {accept.error.message}
              </Alert>
            )}
            <Group>
              <Button
                loading={accept.isPending}
                disabled={user.email !== invitation.email}
                onClick={() => accept.mutate(token, { onSuccess: ({ workshopId }) => navigate(paths.workshop.to(workshopId)) })}
              >
                Accept and open the workshop
              </Button>
            </Group>
          </Stack>
        )}
      </Stack>
    );
  }

  return (
    <Paper withBorder radius="md" p="xl" maw={560} mx="auto" mt="xl">
      <Stack gap="md">
        <Title order={2}>Workshop invitation</Title>
        {body}
      </Stack>
    </Paper>
  );
}
