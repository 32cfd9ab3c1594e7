import { Alert, Anchor, Badge, Breadcrumbs, Card, Group, List, NativeSelect, Skeleton, Stack, Table, Text, Title } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { CheckStateBadge } from '@/components/check-state';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { formatDate } from '@/lib/dates';
import { guideRevisionQueries, type RevisionCompare } from '../api/queries';
import { TextPieces } from './text-pieces';

const STEP_FIELD_WORDS: Record<RevisionCompare['changed'][number]['changes'][number]['field'], string> = {
  title: 'Title',
  body: 'Instructions',
  caution: 'Caution',
  moment: 'Starts in the video at',
  time: 'Time estimate',
};
const GUIDE_FIELD_WORDS: Record<RevisionCompare['guideChanges'][number]['field'], string> = {
  title: 'Guide title',
  summary: 'Summary',
  tools: 'Tools',
  consumables: 'Consumables',
};

/** Two published revisions side by side in one list of differences; the reader picks which two. */
export function RevisionCompareView({
  workshopSlug,
  guideSlug,
  from,
  to,
  onPick,
}: {
  workshopSlug: string;
  guideSlug: string;
  from: number;
  to: number;
  onPick: (from: number, to: number) => void;
}) {
  const list = useQuery(guideRevisionQueries.list(workshopSlug, guideSlug));
  const valid = from >= 1 && to >= 1;
  const diff = useQuery({ ...guideRevisionQueries.compare(workshopSlug, guideSlug, from, to), enabled: valid });
  const options = (list.data?.revisions ?? []).map((revision) => ({
    value: String(revision.number),
    label: `Revision ${revision.number} · ${formatDate(revision.publishedAt)}${revision.current ? ' (current)' : ''}`,
  }));

  return (
    <Stack gap="lg" maw={900}>
      <Breadcrumbs>
        <Anchor component={Link} to={paths.publicGuide.to(workshopSlug, guideSlug)}>
          {list.data?.guide.title ?? 'Guide'}
        </Anchor>
        <Anchor component={Link} to={paths.guideRevisions.to(workshopSlug, guideSlug)}>
          Revisions
        </Anchor>
        <Text size="sm">Compare</Text>
      </Breadcrumbs>
      <Title order={1}>What changed between two revisions</Title>
      <Group align="flex-end">
        <NativeSelect label="Older revision" data={options} value={String(from)} onChange={(event) => onPick(Number(event.currentTarget.value), to)} />
        <NativeSelect label="Newer revision" data={options} value={String(to)} onChange={(event) => onPick(from, Number(event.currentTarget.value))} />
      </Group>
      {!valid && <Text>Pick two revisions to compare.</Text>}
      {diff.isPending && valid && <Skeleton height={200} />}
      {diff.error && (
        <Alert color="red" title="These revisions cannot be compared">
          {diff.error instanceof ApiError && diff.error.status === 404 ? 'This guide is not published, or it has no such revision.' : diff.error.message}
        </Alert>
      )}
      {diff.data && <DifferenceList diff={diff.data} workshopSlug={workshopSlug} guideSlug={guideSlug} />}
    </Stack>
  );
}

export function DifferenceList({ diff, workshopSlug, guideSlug }: { diff: RevisionCompare; workshopSlug: string; guideSlug: string }) {
  const nothing = diff.guideChanges.length + diff.added.length + diff.removed.length + diff.moved.length + diff.changed.length === 0;
  const revisionLink = (number: number) => (
    <Anchor component={Link} to={paths.guideRevision.to(workshopSlug, guideSlug, number)}>
      revision {number}
    </Anchor>
  );
  return (
    <Stack gap="lg" data-testid="revision-differences">
      <Text>
        From {revisionLink(diff.from.number)} ({formatDate(diff.from.publishedAt)}) to {revisionLink(diff.to.number)} ({formatDate(diff.to.publishedAt)}).{' '}
        {diff.unchangedCount} {diff.unchangedCount === 1 ? 'step is' : 'steps are'} unchanged.
      </Text>
      {nothing && <Text>The guide’s words and steps are the same in both revisions.</Text>}

      <DifferenceSection id="guide-changes" title="About the guide" shown={diff.guideChanges.length > 0}>
        {diff.guideChanges.map((change) => (
          <Text key={change.field}>
            <strong>{GUIDE_FIELD_WORDS[change.field]}: </strong>
            <TextPieces pieces={change.pieces} />
          </Text>
        ))}
      </DifferenceSection>

      <DifferenceSection id="added-steps" title={`Steps added (${diff.added.length})`} shown={diff.added.length > 0}>
        <List>
          {diff.added.map((step) => (
            <List.Item key={step.id}>
              <Badge variant="light" color="green" mr="xs">
                New
              </Badge>
              Step {step.number}: {step.title}
            </List.Item>
          ))}
        </List>
      </DifferenceSection>

      <DifferenceSection id="removed-steps" title={`Steps removed (${diff.removed.length})`} shown={diff.removed.length > 0}>
        <List>
          {diff.removed.map((step) => (
            <List.Item key={step.id}>
              <Badge variant="light" color="red" mr="xs">
                Gone
              </Badge>
              Was step {step.number}: {step.title}
            </List.Item>
          ))}
        </List>
      </DifferenceSection>

      <DifferenceSection id="moved-steps" title={`Steps moved (${diff.moved.length})`} shown={diff.moved.length > 0}>
        <List>
          {diff.moved.map((step) => (
            <List.Item key={step.id}>
              {step.title}: step {step.fromNumber} → step {step.toNumber}
            </List.Item>
          ))}
        </List>
      </DifferenceSection>

      <DifferenceSection id="changed-steps" title={`Steps reworded (${diff.changed.length})`} shown={diff.changed.length > 0}>
        <Stack gap="sm">
          {diff.changed.map((step) => (
            <Card key={step.id} withBorder data-testid="changed-step">
              <Text fw={600}>
                Step {step.toNumber}: {step.title}
                {step.fromNumber !== step.toNumber ? ` (was step ${step.fromNumber})` : ''}
              </Text>
              {step.changes.map((change) => (
                <Text key={change.field} size="sm" mt={4}>
                  <strong>{STEP_FIELD_WORDS[change.field]}: </strong>
                  <TextPieces pieces={change.pieces} />
                </Text>
              ))}
            </Card>
          ))}
        </Stack>
      </DifferenceSection>

      <DifferenceSection id="checklist-changes" title="Verified-fit checklist at each revision" shown>
        {diff.checklist.length === 0 ? (
          <Text c="dimmed">This guide showed no checklist in either revision.</Text>
        ) : (
          <Table>
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Check</Table.Th>
                <Table.Th>At revision {diff.from.number}</Table.Th>
                <Table.Th>At revision {diff.to.number}</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {diff.checklist.map((check) => (
                <Table.Tr key={check.id} data-changed={check.changed ? '' : undefined}>
                  <Table.Td>
                    {check.title}
                    {check.changed && (
                      <Text span size="xs" fw={700} ml="xs">
                        (changed)
                      </Text>
                    )}
                  </Table.Td>
                  <Table.Td>{check.before ? <CheckStateBadge state={check.before} /> : <Text span c="dimmed">not on the list</Text>}</Table.Td>
                  <Table.Td>{check.after ? <CheckStateBadge state={check.after} /> : <Text span c="dimmed">not on the list</Text>}</Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        )}
      </DifferenceSection>
    </Stack>
  );
}

/** One kind of difference under its heading; kinds with nothing to say are left out. */
function DifferenceSection({ id, title, shown, children }: { id: string; title: string; shown: boolean; children: ReactNode }) {
  if (!shown) return null;
  return (
    <section aria-labelledby={id}>
      <Title order={2} size="h3" id={id}>
        {title}
      </Title>
      {children}
    </section>
  );
}
