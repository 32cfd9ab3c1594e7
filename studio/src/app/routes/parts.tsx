import { useParams } from 'react-router-dom';
import { PartsTable } from '@/features/parts/components/parts-table';
import { WorkshopGate } from '@/features/workshops/components/workshop-gate';
import { WorkshopHeader } from '@/features/workshops/components/workshop-header';

export function PartsRoute() {
  const { workshopId = '' } = useParams();
  return (
    <WorkshopGate workshopId={workshopId}>
      {(workshop) => (
        <>
          <WorkshopHeader workshop={workshop} />
          <PartsTable workshopId={workshopId} />
        </>
      )}
    </WorkshopGate>
  );
}
