import { useParams } from 'react-router-dom';
import { GuideEditor } from '@/features/guides/components/guide-editor';
import { WorkshopGate } from '@/features/workshops/components/workshop-gate';

/** The creator's editor of one guide (its build page lists the build's guides). */
export function GuideRoute() {
  const { workshopId = '', guideId = '' } = useParams();
  return <WorkshopGate workshopId={workshopId}>{() => <GuideEditor key={guideId} workshopId={workshopId} guideId={guideId} />}</WorkshopGate>;
}
