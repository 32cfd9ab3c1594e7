import { useParams } from 'react-router-dom';
import { WorkshopFitReports } from '@/features/fit-reports/components/workshop-fit-reports';
import { WorkshopGate } from '@/features/workshops/components/workshop-gate';
import { WorkshopHeader } from '@/features/workshops/components/workshop-header';

/** The workshop's fit reports, to review; a site admin (not a member) or a disabled workshop reads them only. */
export function WorkshopFitReportsRoute() {
  const { workshopId = '' } = useParams();
  return (
    <WorkshopGate workshopId={workshopId}>
      {(workshop) => (
        <>
          <WorkshopHeader workshop={workshop} />
          <WorkshopFitReports key={workshopId} workshopId={workshopId} readOnly={workshop.role === 'admin' || workshop.disabled} />
        </>
      )}
    </WorkshopGate>
  );
}
