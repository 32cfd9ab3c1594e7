import { useParams } from 'react-router-dom';
import { SubjectReadings } from '@/features/measurements/components/subject-readings';
import { PartDetail } from '@/features/parts/components/part-detail';
import { WorkshopGate } from '@/features/workshops/components/workshop-gate';

/** A part with its features; each feature's readings come from the measurements part of the studio. */
export function PartRoute() {
  const { workshopId = '', partId = '' } = useParams();
  return (
    <WorkshopGate workshopId={workshopId}>
      {() => (
        <PartDetail
          workshopId={workshopId}
          partId={partId}
          renderReadings={(feature) => (
            <SubjectReadings
              workshopId={workshopId}
              subject={{ featureId: feature.id }}
              defaultUnit={feature.unit}
              defaultQuantity={feature.kind === 'length' ? 'length' : 'diameter'}
              label={feature.name}
            />
          )}
        />
      )}
    </WorkshopGate>
  );
}
