import { Anchor, Button, Divider, Group, Paper, Select, SimpleGrid, Stack, Text, Textarea } from '@mantine/core';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { CheckStateBadge } from '@/components/check-state';
import { notifyDone, notifyError } from '@/lib/notify';
import { useUpdateFitReport } from '../api/mutations';
import { FIT_REPORT_LIMITS, FIT_REPORT_STATUSES, type FitReport, type FitReportChanges, type FitReportStatus } from '../api/queries';
import { ReportPhotos } from './report-photos';
import { OutcomeLabel, STATUS_WORDS } from './report-words';
import { TieCheckForm } from './tie-check-form';
import { formatDate } from '@/lib/dates';

function Detail({ label, children }: { label: string; children: string }) {
  return (
    <div>
      <Text size="xs" c="dimmed" fw={600} tt="uppercase">
        {label}
      </Text>
      <Text size="sm" style={{ whiteSpace: 'pre-wrap' }}>
        {children}
      </Text>
    </div>
  );
}

/** One report as a workshop editor reviews it: the claim, its photos, and status, note and fit-check actions. */
export function ReportReviewCard({ workshopId, report, readOnly }: { workshopId: string; report: FitReport; readOnly: boolean }) {
  const update = useUpdateFitReport(workshopId);
  const [note, setNote] = useState(report.creatorNote);
  const [tying, setTying] = useState(false);
  const pendingChange = update.isPending ? update.variables.changes : null;

  const save = (changes: FitReportChanges, done: (updated: FitReport) => string, failure: string) =>
    update.mutate(
      { reportId: report.id, changes },
      {
        onSuccess: (updated) => notifyDone(done(updated)),
        onError: (error) => notifyError(failure, error),
      },
    );

  const movedTo = (updated: FitReport) => (updated.status === report.status ? '' : ` It is now under ${STATUS_WORDS[updated.status]}.`);
  const handleStatus = (value: string | null) => {
    if (!value || value === report.status) return;
    save({ status: value as FitReportStatus }, (updated) => `Report marked ${STATUS_WORDS[updated.status]}.`, 'The status was not changed');
  };
  const handleNote = () =>
    save({ creatorNote: note.trim() }, () => 'Note saved. The reporter sees it in their account.', 'The note was not saved');
  const handleTie = (fitCheckId: string) =>
    update.mutate(
      { reportId: report.id, changes: { fitCheckId } },
      {
        onSuccess: (updated) => {
          setTying(false);
          notifyDone(`Tied to “${updated.fitCheck?.title ?? 'the check'}”.${movedTo(updated)}`);
        },
        onError: (error) => notifyError('The report was not tied to the check', error),
      },
    );
  const handleUntie = () => save({ fitCheckId: null }, () => 'Untied from the fit check.', 'The report was not untied');

  const noteChanged = note.trim() !== report.creatorNote;
  const reporter = report.reporter.displayName;

  return (
    <Paper component="li" withBorder p="md" radius="md" data-testid="fit-report" data-status={report.status} aria-label={`Fit report from ${reporter}`}>
      <Stack gap="sm">
        <Group justify="space-between" align="flex-start" gap="xs">
          <Stack gap={2}>
            <OutcomeLabel outcome={report.outcome} />
            <Text size="sm" data-testid="report-origin">
              From <strong>{reporter}</strong> · {formatDate(report.createdAt)} ·{' '}
              {report.guide ? (
                <Anchor component={Link} to={report.guide.path} size="sm">
                  {report.guide.title}
                </Anchor>
              ) : (
                'guide no longer published'
              )}{' '}
              · build {report.build.title}
            </Text>
          </Stack>
          {readOnly ? (
            <Text size="sm" fw={600}>
              {STATUS_WORDS[report.status]}
            </Text>
          ) : (
            <Select
              label="Status"
              size="xs"
              w={160}
              data={FIT_REPORT_STATUSES.map((value) => ({ value, label: STATUS_WORDS[value] }))}
              value={pendingChange?.status ?? report.status}
              onChange={handleStatus}
              allowDeselect={false}
              disabled={update.isPending}
            />
          )}
        </Group>

        <SimpleGrid cols={{ base: 1, sm: report.vehicle ? 2 : 1 }} spacing="sm">
          <Detail label="What they combined">{report.parts}</Detail>
          {report.vehicle && <Detail label="Vehicle">{report.vehicle}</Detail>}
        </SimpleGrid>
        {report.notes && <Detail label="Notes">{report.notes}</Detail>}
        <ReportPhotos photos={report.photos} reporter={reporter} />

        <Divider />
        <Stack gap="xs" data-testid="report-check">
          {report.fitCheck ? (
            <Group gap="xs" justify="space-between">
              <Group gap="xs">
                <Text size="sm">
                  Tied to <strong>{report.fitCheck.title}</strong> ({report.fitCheck.assemblyName})
                </Text>
                <CheckStateBadge state={report.fitCheck.state} />
              </Group>
              {!readOnly && (
                <Button size="xs" variant="default" onClick={handleUntie} loading={pendingChange?.fitCheckId === null}>
                  Untie
                </Button>
              )}
            </Group>
          ) : tying ? (
            <TieCheckForm
              workshopId={workshopId}
              defaultBuildId={report.build.id}
              pending={update.isPending}
              onTie={handleTie}
              onCancel={() => setTying(false)}
            />
          ) : (
            <Group gap="xs" justify="space-between">
              <Text size="sm" c="dimmed">
                Not tied to a fit check. The reporter is e-mailed when the tied check is confirmed or does not fit.
              </Text>
              {!readOnly && (
                <Button size="xs" variant="light" onClick={() => setTying(true)}>
                  Tie to a fit check
                </Button>
              )}
            </Group>
          )}
        </Stack>

        {readOnly ? (
          report.creatorNote && <Detail label="Note to the reporter">{report.creatorNote}</Detail>
        ) : (
          <Stack gap={6}>
            <Textarea
              label="Note to the reporter"
              description="Shown in their account beside the report"
              autosize
              minRows={2}
              maxLength={FIT_REPORT_LIMITS.creatorNoteMax}
              value={note}
              onChange={(event) => setNote(event.currentTarget.value)}
            />
            <Group gap="xs">
              <Button size="xs" onClick={handleNote} disabled={!noteChanged} loading={pendingChange?.creatorNote !== undefined}>
                Save note
              </Button>
              {noteChanged && (
                <Button size="xs" variant="subtle" onClick={() => setNote(report.creatorNote)}>
                  Undo changes
                </Button>
              )}
            </Group>
          </Stack>
        )}
      </Stack>
    </Paper>
  );
}
