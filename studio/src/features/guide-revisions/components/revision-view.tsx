import { Alert, Anchor, Breadcrumbs, Button, Card, Group, List, Skeleton, Stack, Text, Title, Typography } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { CheckStateBadge } from '@/components/check-state';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/dates';
import { guideRevisionQueries } from '../api/queries';

/** An earlier published revision, read-only and labelled as such, with a way back to the live guide. */
export function RevisionView({ workshopSlug, guideSlug, number }: { workshopSlug: string; guideSlug: string; number: number }) {
  const revision = useQuery(guideRevisionQueries.revision(workshopSlug, guideSlug, number));
  if (revision.isPending) return <Skeleton height={300} />;
  if (revision.error) {
    return (
      <Alert color="red" title="This revision cannot be shown">
        The guide is not published, or it has no revision {number}.{' '}
        <Anchor component={Link} to={paths.guideRevisions.to(workshopSlug, guideSlug)}>
          See its revisions
        </Anchor>
      </Alert>
    );
  }
  const data = revision.data;
  const isCurrent = data.number === data.currentRevision;
  return (
    <Stack gap="lg" maw={900}>
      <Breadcrumbs>
        <Anchor component={Link} to={paths.publicGuide.to(workshopSlug, guideSlug)}>
          {data.guide.title}
        </Anchor>
        <Anchor component={Link} to={paths.guideRevisions.to(workshopSlug, guideSlug)}>
          Revisions
        </Anchor>
        <Text size="sm">Revision {data.number}</Text>
      </Breadcrumbs>
      <Alert color={isCurrent ? 'blue' : 'yellow'} title={`Revision ${data.number} of ${data.currentRevision}, published ${formatDate(data.publishedAt)}`} data-testid="revision-label">
        <Stack gap={6}>
          <Text size="sm">
            {isCurrent ? 'This is the revision readers see today.' : 'An earlier revision, kept as it was published. The checklist shows the states of that day.'}
            {data.note ? ` Note: ${data.note}` : ''}
          </Text>
          <Group gap="xs">
            <Button component={Link} to={paths.publicGuide.to(workshopSlug, guideSlug)} size="xs">
              Open the live guide
            </Button>
            {!isCurrent && (
              <Button component={Link} to={paths.guideCompare.to(workshopSlug, guideSlug, data.number, data.currentRevision)} size="xs" variant="default">
                Compare with the current revision
              </Button>
            )}
          </Group>
        </Stack>
      </Alert>
      <Title order={1}>{data.title}</Title>
      {data.summary && <Typography dangerouslySetInnerHTML={{ __html: data.summary }} />}
      <section aria-labelledby="revision-steps">
        <Title order={2} size="h3" id="revision-steps">
          Steps
        </Title>
        <Stack gap="sm">
          {data.steps.map((step) => (
            <Card key={step.id} withBorder>
              <Text fw={600}>
                Step {step.number}: {step.title}
              </Text>
              {step.caution && (
                <Text size="sm" fw={700}>
                  {step.caution.level}: {step.caution.text}
                </Text>
              )}
              {/* Sanitized by the API when the step was saved, as in the live guide. */}
              <Typography dangerouslySetInnerHTML={{ __html: step.body }} />
            </Card>
          ))}
        </Stack>
      </section>
      {data.checklist.length > 0 && (
        <section aria-labelledby="revision-checklist">
          <Title order={2} size="h3" id="revision-checklist">
            Verified-fit checklist on {formatDate(data.publishedAt)}
          </Title>
          <List listStyleType="none" spacing={4}>
            {data.checklist.map((check) => (
              <List.Item key={check.id}>
                <Group gap="xs">
                  <CheckStateBadge state={check.state} />
                  <Text size="sm">
                    {check.title}
                    {check.required ? '' : ' (optional)'}
                  </Text>
                </Group>
              </List.Item>
            ))}
          </List>
        </section>
      )}
    </Stack>
  );
}
