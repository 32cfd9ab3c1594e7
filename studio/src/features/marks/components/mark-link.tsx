import { Anchor, Text } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { markQueries, type Mark } from '../api/queries';
import { describeLink } from './link-labels';
import { LINK_OF_KIND } from './mark-kinds';

export interface MarkLinkProps {
  workshopId: string;
  footageId: string;
  mark: Mark;
}

/** What a mark links to, by name, opening that record's page where the studio has one. */
export function MarkLink({ workshopId, footageId, mark }: MarkLinkProps) {
  const field = LINK_OF_KIND[mark.kind];
  const linked = field !== undefined && mark[field] !== null;
  // Each list loads only when a mark needs it; rows share the cached lists.
  const parts = useQuery({ ...markQueries.parts(workshopId), enabled: linked && (field === 'partId' || field === 'measurementId') });
  const measurements = useQuery({ ...markQueries.measurements(workshopId), enabled: linked && field === 'measurementId' });
  const assemblies = useQuery({
    ...markQueries.assemblies(workshopId),
    enabled: linked && (field === 'fitCheckId' || field === 'measurementId'),
  });
  const guideSteps = useQuery({ ...markQueries.guideSteps(workshopId, footageId), enabled: linked && field === 'guideStepId' });
  const described = describeLink(
    mark,
    { parts: parts.data, measurements: measurements.data, assemblies: assemblies.data, guideSteps: guideSteps.data },
    workshopId,
  );

  if (described === null) return null;
  if (described === undefined) {
    return (
      <Text size="sm" c="dimmed">
        …
      </Text>
    );
  }
  if (!described.to) {
    return (
      <Text size="sm" c={described.name === 'not found' ? 'dimmed' : undefined} lineClamp={1} data-testid="mark-link">
        → {described.name}
      </Text>
    );
  }
  return (
    <Anchor component={Link} to={described.to} size="sm" lineClamp={1} data-testid="mark-link">
      → {described.name}
    </Anchor>
  );
}
