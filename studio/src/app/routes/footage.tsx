import { useParams, useSearchParams } from 'react-router-dom';
import { FootagePlayerPage } from '@/features/footage/components/footage-player-page';
import { MarksWorkspace } from '@/features/marks/components/marks-workspace';
import { WorkshopGate } from '@/features/workshops/components/workshop-gate';

/**
 * The player of one footage (its build page lists and uploads footage); `?t=` seconds to start at.
 * The marking workspace sits under the video: composed here so neither feature imports the other.
 */
export function FootagePlayerRoute() {
  const { workshopId = '', footageId = '' } = useParams();
  const [search] = useSearchParams();
  const seconds = Number(search.get('t'));
  const startAtMs = Number.isFinite(seconds) && seconds > 0 ? Math.round(seconds * 1000) : undefined;
  return (
    <WorkshopGate workshopId={workshopId}>
      {() => (
        <FootagePlayerPage
          key={`${footageId}@${startAtMs ?? 0}`}
          workshopId={workshopId}
          footageId={footageId}
          startAtMs={startAtMs}
          workspace={MarksWorkspace}
        />
      )}
    </WorkshopGate>
  );
}
