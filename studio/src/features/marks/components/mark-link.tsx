import { Anchor, Text } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { markQueries, type Mark } from '../api/queries';
import { describeLink } from './link-labels';
import { LINK_OF_KIND, type MarkLinkField } from './mark-kinds';

export interface MarkLinkProps {
  workshopId: string;
  footageId: string;
  mark: Mark;
}

/**
 * What a mark links to, by name, opening that record's page where the studio has one. A mark without a link draws
 * nothing and watches no query: in a list of hundreds, each row drawn while scrolling stays cheap.
 */
export function MarkLink(props: MarkLinkProps) {
  const field = LINK_OF_KIND[props.mark.kind];
  if (field === undefined || !props.mark[field]) return null;
  return <LinkedMarkLink {...props} field={field} />;
}

function LinkedMarkLink({ workshopId, footageId, mark, field }: MarkLinkProps & { field: MarkLinkField }) {
  // Each list loads only when a mark needs it; rows share the cached lists.
  const parts = useQuery({ ...markQueries.parts(workshopId), enabled: field === 'partId' || field === 'measurementId' });
  const measurements = useQuery({ ...markQueries.measurements(workshopId), enabled: field === 'measurementId' });
  const assemblies = useQuery({ ...markQueries.assemblies(workshopId), enabled: field === 'fitCheckId' || field === 'measurementId' });
  const guideSteps = useQuery({ ...markQueries.guideSteps(workshopId, footageId), enabled: field === 'guideStepId' });
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
