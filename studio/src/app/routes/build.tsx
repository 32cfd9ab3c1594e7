import { Stack } from '@mantine/core';
import { useParams } from 'react-router-dom';
import { AssembliesList } from '@/features/assemblies/components/assemblies-list';
import { BuildFitNews } from '@/features/builds/components/build-fit-news';
import { BuildHeader } from '@/features/builds/components/build-header';
import { BuildFootage } from '@/features/footage/components/build-footage';
import { BuildGuides } from '@/features/guides/components/build-guides';
import { WorkshopGate } from '@/features/workshops/components/workshop-gate';

export function BuildRoute() {
  const { workshopId = '', buildId = '' } = useParams();
  return (
    <WorkshopGate workshopId={workshopId}>
      {(workshop) => (
        <Stack gap="xl">
          <BuildHeader workshopId={workshopId} buildId={buildId} />
          <AssembliesList workshopId={workshopId} buildId={buildId} />
          <BuildFootage workshopId={workshopId} buildId={buildId} />
          <BuildGuides workshopId={workshopId} buildId={buildId} />
          <BuildFitNews workshopId={workshopId} buildId={buildId} canRetry={workshop.role === 'owner' && !workshop.disabled} />
        </Stack>
      )}
    </WorkshopGate>
  );
}
