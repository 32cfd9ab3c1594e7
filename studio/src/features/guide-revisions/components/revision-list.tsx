import { Alert, Anchor, Breadcrumbs, Button, Group, Skeleton, Stack, Table, Text, Title } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/dates';
import { guideRevisionQueries } from '../api/queries';

/** Every published revision of a guide, newest first, each to open or to compare with the one before. */
export function RevisionList({ workshopSlug, guideSlug }: { workshopSlug: string; guideSlug: string }) {
  const list = useQuery(guideRevisionQueries.list(workshopSlug, guideSlug));
  if (list.isPending) return <Skeleton height={200} />;
  if (list.error) return <Alert color="red" title="No revisions to show">This guide is not published.</Alert>;
  const { guide, revisions, currentRevision } = list.data;
  return (
    <Stack gap="md" maw={900}>
      <Breadcrumbs>
        <Anchor component={Link} to={paths.publicGuide.to(workshopSlug, guideSlug)}>
          {guide.title}
        </Anchor>
        <Text size="sm">Revisions</Text>
      </Breadcrumbs>
      <Title order={1}>Revisions of “{guide.title}”</Title>
      <Text c="dimmed">
        {guide.workshopName} has published {currentRevision} {currentRevision === 1 ? 'revision' : 'revisions'}. Open one to read it as it was, or compare it with the one before.
      </Text>
      {currentRevision > 1 && (
        <Group>
          <Button component={Link} to={paths.guideCompare.to(workshopSlug, guideSlug, 1, currentRevision)} variant="light">
            Compare the first and the current revision
          </Button>
        </Group>
      )}
      <Table>
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Revision</Table.Th>
            <Table.Th>Published</Table.Th>
            <Table.Th>Note</Table.Th>
            <Table.Th>Changes</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {revisions.map((revision) => (
            <Table.Tr key={revision.number}>
              <Table.Td>
                {revision.current ? (
                  <Anchor component={Link} to={paths.publicGuide.to(workshopSlug, guideSlug)}>
                    Revision {revision.number} (current)
                  </Anchor>
                ) : (
                  <Anchor component={Link} to={paths.guideRevision.to(workshopSlug, guideSlug, revision.number)}>
                    Revision {revision.number}
                  </Anchor>
                )}
              </Table.Td>
              <Table.Td>{formatDate(revision.publishedAt)}</Table.Td>
              <Table.Td>{revision.note || '—'}</Table.Td>
              <Table.Td>
                {revision.number > 1 ? (
                  <Anchor component={Link} to={paths.guideCompare.to(workshopSlug, guideSlug, revision.number - 1, revision.number)}>
                    Compare with revision {revision.number - 1}
                  </Anchor>
                ) : (
                  'First publication'
                )}
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Stack>
  );
}
