import { Anchor, Blockquote, Group, Paper, Skeleton, Stack, Text, Title } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { CheckStateBadge } from '@/components/check-state';
import { paths } from '@/config/paths';
import { fitReportQueries, type FitReport } from '../api/queries';
import { OutcomeLabel, STATUS_FOR_REPORTER } from './report-words';
import { formatDate } from '@/lib/dates';
import { RetryNotice } from '@/components/retry-notice';

/** The account page's list of the fit reports I sent, with how each workshop answered. */
export function MyFitReports() {
  const reports = useQuery(fitReportQueries.mine());
  return (
    <Paper withBorder p="lg" radius="md" component="section" aria-labelledby="my-fit-reports-title">
      <Stack gap="sm">
        <Title order={3} size="h4" id="my-fit-reports-title">
          My fit reports
        </Title>
        <Text size="sm" c="dimmed">
          What you told workshops about parts you combined. We e-mail you when a workshop confirms or rules out the fit.
        </Text>
        {reports.isPending ? (
          <Skeleton height={80} aria-label="Loading your fit reports" />
        ) : reports.isError ? (
          <RetryNotice message={reports.error.message} onRetry={() => void reports.refetch()} />
        ) : reports.data.length === 0 ? (
          <Text size="sm" data-testid="my-fit-reports-empty">
            You have sent no fit reports. Open a{' '}
            <Anchor component={Link} to={paths.guideIndex} size="sm">
              published guide
            </Anchor>{' '}
            and choose Report a fit after trying its parts.
          </Text>
        ) : (
          <Stack gap="sm" component="ul" aria-label="My fit reports" style={{ listStyle: 'none', margin: 0, padding: 0 }}>
            {reports.data.map((report) => (
              <MyReport key={report.id} report={report} />
            ))}
          </Stack>
        )}
      </Stack>
    </Paper>
  );
}

function MyReport({ report }: { report: FitReport }) {
  return (
    <Paper component="li" withBorder p="sm" data-testid="my-fit-report" data-status={report.status}>
      <Stack gap={6}>
        <Group justify="space-between" gap="xs" align="flex-start">
          <OutcomeLabel outcome={report.outcome} />
          <Text size="sm" fw={600} data-testid="report-status">
            {STATUS_FOR_REPORTER[report.status]}
          </Text>
        </Group>
        <Text size="sm" style={{ whiteSpace: 'pre-wrap' }} data-testid="report-parts">
          {report.parts}
        </Text>
        <Text size="xs" c="dimmed">
          {report.workshop.name}
          {' · '}
          {report.guide ? (
            <Anchor component={Link} to={report.guide.path} size="xs">
              {report.guide.title}
            </Anchor>
          ) : (
            report.build.title
          )}
          {' · sent '}
          {formatDate(report.createdAt)}
          {report.photos.length > 0 && ` · ${report.photos.length} ${report.photos.length === 1 ? 'photo' : 'photos'}`}
        </Text>
        {report.fitCheck && (
          <Group gap="xs" data-testid="report-check">
            <Text size="sm">
              Checked as “{report.fitCheck.title}” ({report.fitCheck.assemblyName}):
            </Text>
            <CheckStateBadge state={report.fitCheck.state} />
          </Group>
        )}
        {report.creatorNote && (
          <Blockquote p="xs" data-testid="creator-note" cite={`— ${report.workshop.name}`}>
            <Text size="sm" style={{ whiteSpace: 'pre-wrap' }}>
              {report.creatorNote}
            </Text>
          </Blockquote>
        )}
      </Stack>
    </Paper>
  );
}
