import { Anchor, Button, Paper, Skeleton, Stack, Table, Text, Title, VisuallyHidden } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { notifyDone, notifyError } from '@/lib/notify';
import { useUnfollow } from '../api/mutations';
import { followQueries, type Follow } from '../api/queries';
import { KIND_IN_WORDS } from './follow-words';
import { RetryNotice } from '@/components/retry-notice';

/** The account page's list of what I follow, each with a way to stop. */
export function FollowingSection() {
  const follows = useQuery(followQueries.mine());
  return (
    <Paper withBorder p="lg" radius="md" component="section" aria-labelledby="following-title">
      <Stack gap="sm">
        <Title order={3} size="h4" id="following-title">
          Following
        </Title>
        <Text size="sm" c="dimmed">
          We e-mail you when a fit check of something you follow is confirmed or fails; each e-mail has a link to stop.
        </Text>
        {follows.isPending ? (
          <Skeleton height={80} aria-label="Loading what you follow" />
        ) : follows.isError ? (
          <RetryNotice message={follows.error.message} onRetry={() => void follows.refetch()} />
        ) : follows.data.length === 0 ? (
          <Text size="sm" data-testid="following-empty">
            You follow nothing yet. Open a{' '}
            <Anchor component={Link} to={paths.guideIndex} size="sm">
              published guide
            </Anchor>{' '}
            and choose Follow to hear when its fits are confirmed or fail.
          </Text>
        ) : (
          <FollowsTable follows={follows.data} />
        )}
      </Stack>
    </Paper>
  );
}

function FollowsTable({ follows }: { follows: Follow[] }) {
  const unfollow = useUnfollow();
  const handleUnfollow = (follow: Follow) =>
    unfollow.mutate(follow.id, {
      onSuccess: () => notifyDone(`You no longer follow ${follow.label}`),
      onError: (error) => notifyError(`Could not unfollow ${follow.label}`, error),
    });
  return (
    <Table.ScrollContainer minWidth={420}>
      <Table verticalSpacing="xs" aria-label="What you follow">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Following</Table.Th>
            <Table.Th>Kind</Table.Th>
            <Table.Th>Workshop</Table.Th>
            <Table.Th>
              <VisuallyHidden>Actions</VisuallyHidden>
            </Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {follows.map((follow) => (
            <Table.Tr key={follow.id} data-testid="follow-row">
              <Table.Td>{follow.label}</Table.Td>
              <Table.Td>{KIND_IN_WORDS[follow.targetKind]}</Table.Td>
              <Table.Td>{follow.workshop.name}</Table.Td>
              <Table.Td ta="right">
                <Button
                  size="xs"
                  variant="default"
                  aria-label={`Unfollow ${follow.label}`}
                  loading={unfollow.isPending && unfollow.variables === follow.id}
                  onClick={() => handleUnfollow(follow)}
                >
                  Unfollow
                </Button>
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
