import { useParams, useSearchParams } from 'react-router-dom';
import { RevisionCompareView } from '@/features/guide-revisions/components/revision-compare';
import { RevisionList } from '@/features/guide-revisions/components/revision-list';
import { RevisionView } from '@/features/guide-revisions/components/revision-view';

/** A published guide's revisions, newest first. */
export function GuideRevisionsRoute() {
  const { workshopSlug = '', guideSlug = '' } = useParams();
  return <RevisionList workshopSlug={workshopSlug} guideSlug={guideSlug} />;
}

/** One earlier revision, read-only. */
export function GuideRevisionRoute() {
  const { workshopSlug = '', guideSlug = '', number = '' } = useParams();
  return <RevisionView key={number} workshopSlug={workshopSlug} guideSlug={guideSlug} number={Number(number) || 0} />;
}

/** Two revisions compared; the pair lives in the address (?from=&to=) so a comparison can be shared. */
export function GuideCompareRoute() {
  const { workshopSlug = '', guideSlug = '' } = useParams();
  const [search, setSearch] = useSearchParams();
  const from = Number(search.get('from')) || 0;
  const to = Number(search.get('to')) || 0;
  return (
    <RevisionCompareView
      workshopSlug={workshopSlug}
      guideSlug={guideSlug}
      from={from}
      to={to}
      onPick={(nextFrom, nextTo) => setSearch({ from: String(nextFrom), to: String(nextTo) }, { replace: true })}
    />
  );
}
