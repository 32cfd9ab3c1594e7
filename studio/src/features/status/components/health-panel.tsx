import { Alert, Badge, Group, Paper, SimpleGrid, Skeleton, Stack, Text, Title } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { statusQueries, type CheckState, type HealthReport } from '../api/queries';

const CHECK_LABELS: Record<keyof HealthReport['checks'], { title: string; detail: string }> = {
  database: { title: 'Database', detail: 'MariaDB answers a query' },
  storage: { title: 'Storage', detail: 'the media bucket is reachable' },
  mail: { title: 'Mail', detail: 'the SMTP server greets us' },
  queue: { title: 'Job queue', detail: 'Redis answers PING' },
};

function CheckCard({ name, state }: { name: keyof HealthReport['checks']; state: CheckState }) {
  const label = CHECK_LABELS[name];
  return (
    <Paper withBorder p="md" data-testid={`check-${name}`} data-state={state}>
      <Group justify="space-between" align="flex-start">
        <div>
          <Text fw={600}>{label.title}</Text>
          <Text size="sm" c="dimmed">
            {label.detail}
          </Text>
        </div>
        <Badge color={state === 'up' ? 'patina' : 'red'} variant={state === 'up' ? 'light' : 'filled'}>
          {state === 'up' ? 'up' : 'down'}
        </Badge>
      </Group>
    </Paper>
  );
}

export function HealthPanel() {
  const health = useQuery(statusQueries.health());

  return (
    <Stack>
      <Title order={2}>System status</Title>
      {health.isPending && <Skeleton height={160} />}
      {health.isError && (
        <Alert color="red" title="Status unavailable">
          {health.error.message}
        </Alert>
      )}
      {health.data && (
        <>
          <Text c={health.data.status === 'ok' ? undefined : 'red'}>
            {health.data.status === 'ok' ? 'Every service is up.' : 'Some services are down; uploads, mail or jobs may wait.'}
          </Text>
          <SimpleGrid cols={{ base: 1, sm: 2 }}>
            {(Object.keys(CHECK_LABELS) as (keyof HealthReport['checks'])[]).map((name) => (
              <CheckCard key={name} name={name} state={health.data.checks[name]} />
            ))}
          </SimpleGrid>
        </>
      )}
    </Stack>
  );
}
