import { Alert, Anchor, Breadcrumbs, Grid, Group, Skeleton, Stack, Text, Title } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { Link, useNavigate } from 'react-router-dom';
import { ConfirmButton } from '@/components/confirm-button';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { notifyDone, notifyError } from '@/lib/notify';
import { useDeleteGuide } from '../api/mutations';
import { guideQueries } from '../api/queries';
import { GuideDetailsForm } from './guide-details-form';
import { GuideStatusBadges } from './guide-status';
import { PublishPanel } from './publish-panel';
import { StepsSection } from './steps-section';
import { useWorkshopReadOnly } from '@/lib/workshop-access';

/** The creator's guide editor: details, steps anchored in the main footage, and publishing. */
export function GuideEditor({ workshopId, guideId }: { workshopId: string; guideId: string }) {
  const guide = useQuery(guideQueries.detail(workshopId, guideId));
  const remove = useDeleteGuide(workshopId, guideId);
  const navigate = useNavigate();
  // Site admins (not members) and disabled workshops read the guide without the controls the API would refuse.
  const readOnly = useWorkshopReadOnly();

  if (guide.isPending) return <Skeleton height={420} />;
  if (guide.isError) {
    const missing = guide.error instanceof ApiError && guide.error.status === 404;
    return (
      <Alert color="red" title={missing ? 'Guide not found' : 'The guide could not be loaded'}>
        {missing ? 'There is no guide here in this workshop.' : guide.error.message}
      </Alert>
    );
  }
  const item = guide.data;

  const handleDelete = () =>
    remove.mutate(undefined, {
      onSuccess: () => {
        notifyDone(`“${item.title}” is deleted.`);
        navigate(paths.build.to(workshopId, item.buildId));
      },
      onError: (error) => notifyError('The guide was not deleted', error),
    });

  return (
    <Stack gap="lg">
      <Stack gap="xs">
        <Breadcrumbs>
          <Anchor component={Link} to={paths.builds.to(workshopId)}>
            Builds
          </Anchor>
          <Anchor component={Link} to={paths.build.to(workshopId, item.buildId)}>
            Build
          </Anchor>
          <Text>Guide</Text>
        </Breadcrumbs>
        <Group justify="space-between" align="flex-start">
          <div>
            <Title order={2}>{item.title}</Title>
            <Text size="sm" c="dimmed">
              Guide · {item.steps.length === 1 ? '1 step' : `${item.steps.length} steps`}
            </Text>
          </div>
          <Group gap="sm">
            <GuideStatusBadges status={item.status} hasUnpublishedChanges={item.hasUnpublishedChanges} />
            {!readOnly && (
            <ConfirmButton
              variant="subtle"
              color="red"
              size="compact-sm"
              question="Delete this guide?"
              detail={`“${item.title}”, its steps and its revisions go, and its public page with them. Footage and marks stay.`}
              confirmLabel="Delete guide"
              onConfirm={handleDelete}
            >
              Delete guide
            </ConfirmButton>
            )}
          </Group>
        </Group>
      </Stack>
      <Grid gap="lg">
        <Grid.Col span={{ base: 12, md: 8 }}>
          <GuideDetailsForm key={item.id} workshopId={workshopId} guide={item} />
        </Grid.Col>
        <Grid.Col span={{ base: 12, md: 4 }}>
          <PublishPanel workshopId={workshopId} guide={item} />
        </Grid.Col>
      </Grid>
      <StepsSection workshopId={workshopId} guide={item} />
    </Stack>
  );
}
