import { Alert, Anchor, Breadcrumbs, Group, Select, Skeleton, Stack, Text, Title } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { Link, useNavigate } from 'react-router-dom';
import { DeleteWithImpact } from '@/components/delete-with-impact';
import { RenameButton } from '@/components/rename-button';
import { paths } from '@/config/paths';
import { useWorkshopReadOnly } from '@/lib/workshop-access';
import { useDeleteBuild, useUpdateBuild } from '../api/mutations';
import { BUILD_STATUSES, buildQueries, type BuildStatus } from '../api/queries';
import { BUILD_STATUS_LABELS } from './build-labels';

/** The top of a build page: where it sits, what it is for, and its status. */
export function BuildHeader({ workshopId, buildId }: { workshopId: string; buildId: string }) {
  const build = useQuery(buildQueries.detail(workshopId, buildId));
  const updateBuild = useUpdateBuild(workshopId, buildId);
  const deleteBuild = useDeleteBuild(workshopId);
  const readOnly = useWorkshopReadOnly();
  const navigate = useNavigate();

  if (build.isPending) return <Skeleton height={90} />;
  if (build.isError) return <Alert color="red" title="Build not found">{build.error.message}</Alert>;
  return (
    <Stack gap="xs">
      <Breadcrumbs>
        <Anchor component={Link} to={paths.builds.to(workshopId)}>
          Builds
        </Anchor>
        <Text>{build.data.title}</Text>
      </Breadcrumbs>
      <Group justify="space-between" align="flex-start">
        <div>
          <Title order={2}>{build.data.title}</Title>
          {build.data.vehicle && <Text c="dimmed">{build.data.vehicle}</Text>}
          {!readOnly && (
            <Group gap={4} mt={4}>
              <RenameButton
                size="compact-sm"
                what="build"
                label="Title"
                current={build.data.title}
                maxLength={200}
                onRename={(title) => updateBuild.mutateAsync({ title })}
              />
              <DeleteWithImpact
                size="compact-sm"
                what="build"
                name={build.data.title}
                impactPath={`/workshops/${workshopId}/builds/${buildId}/deletion-impact`}
                onDelete={async () => {
                  await deleteBuild.mutateAsync(buildId);
                  navigate(paths.builds.to(workshopId));
                }}
              />
            </Group>
          )}
        </div>
        <Select
          label="Status"
          w={180}
          data={BUILD_STATUSES.map((status) => ({ value: status, label: BUILD_STATUS_LABELS[status] }))}
          value={build.data.status}
          allowDeselect={false}
          onChange={(value) => value && updateBuild.mutate({ status: value as BuildStatus })}
        />
      </Group>
      {build.data.goal && <Text maw={760}>{build.data.goal}</Text>}
    </Stack>
  );
}
