import { Alert, Button, Loader, Stack, Text } from '@mantine/core';
import type { UseMutationResult } from '@tanstack/react-query';
import { useEffect, useRef } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useSession, type MeResponse } from '@/lib/session';
import { useConfirmEmail, useVerifyEmail } from '../api/mutations';

/**
 * Follows an e-mailed link once, as soon as the page opens (a ref keeps React's development
 * double-render from spending the single-use token twice).
 */
function useFollowLinkOnce(token: string | null, mutation: UseMutationResult<MeResponse, Error, string>) {
  const followed = useRef(false);
  const { mutate } = mutation;
  useEffect(() => {
    if (!token || followed.current) return;
    followed.current = true;
    mutate(token);
  }, [token, mutate]);
}

function LinkOutcome({
  token,
  mutation,
  working,
  done,
}: {
  token: string | null;
  mutation: UseMutationResult<MeResponse, Error, string>;
  working: string;
  done: string;
}) {
  const session = useSession();
  if (!token) {
    return <Alert color="red">This link is incomplete. Open it again from the e-mail, or copy the whole address.</Alert>;
  }
  if (mutation.isError) {
    return (
      <Stack gap="sm">
        <Alert color="red" role="alert">
          {mutation.error.message}
        </Alert>
        <Button component={Link} to={paths.account} variant="light">
          Ask for a new link in your account
        </Button>
      </Stack>
    );
  }
  if (mutation.isSuccess) {
    const signedIn = session.user !== null;
    return (
      <Stack gap="sm">
        <Alert color="patina" title={done}>
          {mutation.data.user?.email && <Text size="sm">{mutation.data.user.email}</Text>}
        </Alert>
        <Button component={Link} to={signedIn ? paths.workshops : paths.signIn}>
          {signedIn ? 'Continue' : 'Sign in'}
        </Button>
      </Stack>
    );
  }
  return (
    <Stack align="center" gap="xs">
      <Loader />
      <Text c="dimmed">{working}</Text>
    </Stack>
  );
}

export function VerifyEmailView({ token }: { token: string | null }) {
  const verify = useVerifyEmail();
  useFollowLinkOnce(token, verify);
  return <LinkOutcome token={token} mutation={verify} working="Confirming your e-mail address…" done="Your e-mail address is confirmed" />;
}

export function ConfirmEmailChangeView({ token }: { token: string | null }) {
  const confirm = useConfirmEmail();
  useFollowLinkOnce(token, confirm);
  return <LinkOutcome token={token} mutation={confirm} working="Switching your e-mail address…" done="Your account now uses this e-mail address" />;
}
