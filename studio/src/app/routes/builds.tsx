import { useParams } from 'react-router-dom';
import { BuildsList } from '@/features/builds/components/builds-list';
import { WorkshopGate } from '@/features/workshops/components/workshop-gate';
import { WorkshopHeader } from '@/features/workshops/components/workshop-header';

export function BuildsRoute() {
  const { workshopId = '' } = useParams();
  return (
    <WorkshopGate workshopId={workshopId}>
      {(workshop) => (
        <>
          <WorkshopHeader workshop={workshop} />
          <BuildsList workshopId={workshopId} />
        </>
      )}
    </WorkshopGate>
  );
}
