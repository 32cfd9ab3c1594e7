import { useParams } from 'react-router-dom';
import { MembersPage } from '@/features/workshops/components/members-page';
import { WorkshopOverviewPage } from '@/features/workshops/components/workshop-overview';
import { WorkshopSettingsPage } from '@/features/workshops/components/workshop-settings';
import { WorkshopsPage } from '@/features/workshops/components/workshops-page';

export const WorkshopsRoute = WorkshopsPage;

function useWorkshopId(): string {
  return useParams().workshopId ?? '';
}

// Keyed by workshop, so switching workshops starts every form afresh.
export function WorkshopOverviewRoute() {
  const workshopId = useWorkshopId();
  return <WorkshopOverviewPage key={workshopId} workshopId={workshopId} />;
}

export function WorkshopSettingsRoute() {
  const workshopId = useWorkshopId();
  return <WorkshopSettingsPage key={workshopId} workshopId={workshopId} />;
}

export function WorkshopMembersRoute() {
  const workshopId = useWorkshopId();
  return <MembersPage key={workshopId} workshopId={workshopId} />;
}
