import { useParams } from 'react-router-dom';
import { ReportFitButton } from '@/features/fit-reports/components/report-fit-button';
import { FollowControl } from '@/features/follows/components/follow-control';
import { FollowAlongView, type FollowSlot, type ReportSlot } from '@/features/guide-view/components/follow-along-view';
import { GuideIndex } from '@/features/guide-view/components/guide-index';

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
  return (
    <FollowAlongView
      key={`${workshopSlug}/${guideSlug}`}
      workshopSlug={workshopSlug}
      guideSlug={guideSlug}
      followSlot={followSlot}
      reportSlot={reportSlot}
    />
  );
}
