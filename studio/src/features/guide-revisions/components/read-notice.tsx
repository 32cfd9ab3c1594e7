import { Alert, Anchor, Text } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useEffect, useRef } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useSession } from '@/lib/session';
import { guideRevisionQueries, useRecordReading } from '../api/queries';

/**
 * Above a published guide, for a signed-in reader who opened an older revision before: "Updated since you last
 * read" with a comparison from that revision to this one (the revision history is linked from the guide's
 * revision line). The visit is recorded after the first answer, so the notice keeps saying what it said while the
 * page is open.
 */
export function UpdatedSinceReadNotice({ workshopSlug, guideSlug }: { workshopSlug: string; guideSlug: string }) {
  const { user } = useSession();
  const reading = useQuery({ ...guideRevisionQueries.reading(workshopSlug, guideSlug), enabled: !!user });
  const record = useRecordReading(workshopSlug, guideSlug);
  const recorded = useRef(false);
  const { mutate } = record;
  useEffect(() => {
    if (reading.data && !recorded.current) {
      recorded.current = true;
      mutate();
    }
  }, [reading.data, mutate]);

  const data = reading.data;
  const updated = data && data.lastReadRevision !== null && data.lastReadRevision < data.currentRevision;
  if (!updated || data.lastReadRevision === null) return null;
  return (
    <Alert color="blue" title="Updated since you last read" mb="sm" className="no-print" data-testid="updated-since-read">
      <Text size="sm">
        You last opened revision {data.lastReadRevision}; this is revision {data.currentRevision}.{' '}
        <Anchor component={Link} to={paths.guideCompare.to(workshopSlug, guideSlug, data.lastReadRevision, data.currentRevision)}>
          Compare what changed
        </Anchor>
      </Text>
    </Alert>
  );
}
