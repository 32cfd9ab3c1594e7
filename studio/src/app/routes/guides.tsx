import { useParams, useSearchParams } from 'react-router-dom';
import { ReportFitButton } from '@/features/fit-reports/components/report-fit-button';
import { FollowControl } from '@/features/follows/components/follow-control';
import { FollowAlongView, type FollowSlot, type ReportSlot } from '@/features/guide-view/components/follow-along-view';
import { GuideIndex } from '@/features/guide-view/components/guide-index';
import { UpdatedSinceReadNotice } from '@/features/guide-revisions/components/read-notice';

/** Published guides, for anyone: the index with its search. */
export function GuideIndexRoute() {
  return <GuideIndex />;
}

/** Beside the guide's title: follow its assembly, build or workshop for fit news. */
const followSlot: FollowSlot = (targets) => <FollowControl targets={targets} />;

/** Under it: tell the workshop whether a combination of parts fit. */
const reportSlot: ReportSlot = (guide) => <ReportFitButton {...guide} />;

/** One published guide to follow beside its video. */
export function PublicGuideRoute() {
  const { workshopSlug = '', guideSlug = '' } = useParams();
  // ?t= seconds: start the video there (the fit finder links to a check's evidence moment this way).
  const [search] = useSearchParams();
  const seconds = Number(search.get('t'));
  const startAtMs = Number.isFinite(seconds) && seconds > 0 ? Math.round(seconds * 1000) : undefined;
  return (
    <>
      {/* "Updated since you last read", from the reader’s own record, never the shared answer. */}
      <UpdatedSinceReadNotice key={`${workshopSlug}/${guideSlug}`} workshopSlug={workshopSlug} guideSlug={guideSlug} />
      <FollowAlongView
        key={`${workshopSlug}/${guideSlug}@${startAtMs ?? 0}`}
        workshopSlug={workshopSlug}
        guideSlug={guideSlug}
        startAtMs={startAtMs}
        followSlot={followSlot}
        reportSlot={reportSlot}
      />
    </>
  );
}
