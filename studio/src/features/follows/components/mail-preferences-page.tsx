import { Alert, Anchor, Paper, Skeleton, Stack, Text, Title } from '@mantine/core';
import { useQuery, type UseQueryResult } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { RetryNotice } from '@/components/retry-notice';
import { useSaveMailPreferences } from '../api/mutations';
import { followQueries, type MailPreferences } from '../api/queries';
import { MailPreferencesForm } from './mail-preferences-form';

/** The loaded preferences with the form, what saving did, and the errors of both in words. */
function PreferencesPanel({ preferences, token }: { preferences: UseQueryResult<MailPreferences>; token?: string }) {
  const save = useSaveMailPreferences(token);
  if (preferences.isPending) return <Skeleton height={160} aria-label="Loading your mail preferences" />;
  if (preferences.isError) {
    // 404: no such token; 400: not even shaped like one (a link cut short). Either way the link is at fault.
    const unknown = preferences.error instanceof ApiError && (preferences.error.status === 404 || preferences.error.status === 400);
    if (unknown && token) {
      return (
        <Alert color="red" role="alert" title="We do not know this link">
          It may have been cut short by your mail program: open it again from the e-mail, or copy the whole address. Signed in, you
          can change the same settings on your{' '}
          <Anchor component={Link} to={paths.account}>
            account page
          </Anchor>
          .
        </Alert>
      );
    }
    return <RetryNotice title="Could not load your mail preferences" message={preferences.error.message} onRetry={() => void preferences.refetch()} />;
  }
  return (
    <Stack gap="sm">
      <Text size="sm" c="dimmed">
        Mail goes to <strong>{preferences.data.email}</strong>.
      </Text>
      <MailPreferencesForm
        key={preferences.dataUpdatedAt}
        preferences={preferences.data}
        saving={save.isPending}
        onSave={(change) => save.mutate(change)}
      />
      {save.isSuccess && (
        <Alert color="patina" role="status" data-testid="preferences-saved">
          Saved. Your mail follows these settings from now on.
        </Alert>
      )}
      {save.isError && (
        <Alert color="red" role="alert" title="Not saved">
          {save.error.message}
        </Alert>
      )}
    </Stack>
  );
}

/** The page behind every mail's preferences link (?token=): no sign-in, the link's token is the key. */
export function MailPreferencesPage({ token }: { token: string | null }) {
  const preferences = useQuery({ ...followQueries.preferencesByLink(token ?? ''), enabled: Boolean(token) });
  return (
    <Paper withBorder radius="md" p="xl" maw={720} mx="auto" mt="xl">
      <Stack gap="md">
        <Title order={2}>Mail preferences</Title>
        {token ? (
          <PreferencesPanel preferences={preferences} token={token} />
        ) : (
          <Alert color="red" role="alert" title="This link is incomplete">
            Open it again from the e-mail, or copy the whole address.
          </Alert>
        )}
      </Stack>
    </Paper>
  );
}

/** The account page's section: the same settings, signed in. */
export function MailPreferencesSection() {
  const preferences = useQuery(followQueries.preferences());
  return (
    <Paper withBorder p="lg" radius="md" component="section" aria-labelledby="mail-preferences-title">
      <Stack gap="sm">
        <Title order={3} size="h4" id="mail-preferences-title">
          Mail preferences
        </Title>
        <PreferencesPanel preferences={preferences} />
      </Stack>
    </Paper>
  );
}
