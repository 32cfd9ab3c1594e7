import { useParams } from 'react-router-dom';
import { FollowAlongView } from '@/features/guide-view/components/follow-along-view';
import { GuideIndex } from '@/features/guide-view/components/guide-index';

/** Published guides, for anyone: the index with its search. */
export function GuideIndexRoute() {
  return <GuideIndex />;
}

/** One published guide to follow beside its video. */
export function PublicGuideRoute() {
  const { workshopSlug = '', guideSlug = '' } = useParams();
  return <FollowAlongView key={`${workshopSlug}/${guideSlug}`} workshopSlug={workshopSlug} guideSlug={guideSlug} />;
}
