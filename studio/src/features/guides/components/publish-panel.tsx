import { Alert, Anchor, Button, Group, Paper, Skeleton, Stack, Text, Textarea, Title } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { ConfirmButton } from '@/components/confirm-button';
import { splitApiErrors } from '@/lib/form-errors';
import { notifyDone, notifyError } from '@/lib/notify';
import { usePublishRevision, useWithdrawGuide } from '../api/mutations';
import { guideQueries } from '../api/queries';
import type { Guide } from '../api/types';
import { describeStatus, GuideStatusBadges } from './guide-status';
import { formatDateTime } from '@/lib/dates';
import { useWorkshopReadOnly } from '@/lib/workshop-access';

const NOTE_MAX = 500;

/**
 * Publishing: where the guide stands, a revision with an optional note, withdrawing it from public
 * view, the link to the public page and the revisions so far.
 */
export function PublishPanel({ workshopId, guide }: { workshopId: string; guide: Guide }) {
  const revisions = useQuery(guideQueries.revisions(workshopId, guide.id));
  const publish = usePublishRevision(workshopId, guide.id);
  const withdraw = useWithdrawGuide(workshopId, guide.id);
  const [note, setNote] = useState('');
  // Site admins (not members) and disabled workshops read the publication state and revisions; no publish or withdraw.
  const readOnly = useWorkshopReadOnly();
  const [problem, setProblem] = useState<{ note?: string; general: string[] } | null>(null);

  // After a withdrawal the guide may no longer carry its last revision; the revisions list still does.
  const lastRevision = guide.publishedRevision ?? revisions.data?.[0] ?? null;
  const statusLine = describeStatus({ status: guide.status, publishedRevision: lastRevision });
  const published = guide.status === 'published';
  const nothingNew = published && !guide.hasUnpublishedChanges;
  const nextNumber = (revisions.data?.[0]?.number ?? lastRevision?.number ?? 0) + 1;

  const handlePublish = () => {
    setProblem(null);
    publish.mutate(note.trim(), {
      onSuccess: (revision) => {
        setNote('');
        notifyDone(`Revision ${revision.number} is published.`);
      },
      onError: (error) => {
        const split = splitApiErrors(error, { note: 'Note' });
        setProblem({ note: split.fields.note, general: split.general });
      },
    });
  };

  const handleWithdraw = () =>
    withdraw.mutate(undefined, {
      onSuccess: () => notifyDone('The guide is withdrawn from public view.'),
      onError: (error) => notifyError('The guide was not withdrawn', error),
    });

  return (
    <Paper withBorder p="md" data-testid="publish-panel">
      <Stack gap="sm">
        <Group justify="space-between" wrap="nowrap" align="flex-start">
          <Title order={3} fz="lg">
            Publishing
          </Title>
          <GuideStatusBadges status={guide.status} hasUnpublishedChanges={guide.hasUnpublishedChanges} />
        </Group>
        <div>
          <Text fw={600} data-testid="guide-status">
            {statusLine}
          </Text>
          {lastRevision && (
            <Text size="sm" c="dimmed">
              Revision {lastRevision.number} published {formatDateTime(lastRevision.publishedAt)}
            </Text>
          )}
          {published && guide.hasUnpublishedChanges && (
            <Text size="sm" data-testid="unpublished-note">
              You have changed the guide since revision {lastRevision?.number}. Readers see revision {lastRevision?.number} until you publish again.
            </Text>
          )}
        </div>
        {published && guide.publicPath && (
          <Anchor component={Link} to={guide.publicPath} data-testid="public-link">
            Open the public page
          </Anchor>
        )}
        {!readOnly && (
          <>

        {problem && problem.general.length > 0 && (
          <Alert color="red" title="Not published" data-testid="publish-error">
            {problem.general.join(' ')}
          </Alert>
        )}
        {guide.steps.length === 0 && (
          <Text size="sm" c="dimmed">
            Add at least one step before publishing.
          </Text>
        )}
        <Textarea
          label="Note for this revision (optional)"
          description={`What changed, shown to readers with revision ${nextNumber}.`}
          placeholder="Added the driveshaft length check."
          autosize
          minRows={2}
          maxLength={NOTE_MAX}
          value={note}
          onChange={(event) => setNote(event.currentTarget.value)}
          error={problem?.note}
          disabled={nothingNew}
        />
        {note.length > NOTE_MAX - 50 && (
          <Text size="xs" c="dimmed">
            {NOTE_MAX - note.length} characters left
          </Text>
        )}
        <Group justify="space-between">
          <Button onClick={handlePublish} loading={publish.isPending} disabled={nothingNew}>
            Publish revision
          </Button>
          {published && (
            <ConfirmButton
              variant="default"
              color="red"
              question="Withdraw this guide from public view?"
              detail="The public page stops showing it. Its revisions are kept, and you can publish again at any time."
              confirmLabel="Withdraw"
              loading={withdraw.isPending}
              onConfirm={handleWithdraw}
            >
              Withdraw
            </ConfirmButton>
          )}
        </Group>
        {nothingNew && (
          <Text size="xs" c="dimmed">
            Nothing has changed since revision {lastRevision?.number}.
          </Text>
        )}
          </>
        )}

        <Stack gap={4} mt="xs">
          <Text fw={600} size="sm">
            Revisions
          </Text>
          {revisions.isPending && <Skeleton height={40} />}
          {revisions.isError && <Alert color="red">{revisions.error.message}</Alert>}
          {revisions.data?.length === 0 && (
            <Text size="sm" c="dimmed">
              None yet. Each time you publish, the guide as it stands becomes a numbered revision.
            </Text>
          )}
          {revisions.data && revisions.data.length > 0 && (
            <Stack component="ul" gap={6} p={0} m={0} style={{ listStyle: 'none' }} aria-label="Revisions" data-testid="revisions">
              {revisions.data.map((revision) => (
                <li key={revision.number}>
                  <Text size="sm">
                    <Text span fw={600} size="sm">
                      Revision {revision.number}
                    </Text>{' '}
                    · {formatDateTime(revision.publishedAt)}
                    {revision.publishedBy && ` · ${revision.publishedBy.displayName}`}
                  </Text>
                  {revision.note && (
                    <Text size="sm" c="dimmed">
                      {revision.note}
                    </Text>
                  )}
                </li>
              ))}
            </Stack>
          )}
        </Stack>
      </Stack>
    </Paper>
  );
}
