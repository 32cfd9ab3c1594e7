import { Group, Image, List, Modal, Paper, Stack, Text, Title, UnstyledButton } from '@mantine/core';
import { useState } from 'react';
import type { CheckEvidence, ChecklistVerdict, PublishedChecklist } from '../api/types';
import { CheckStateBadge } from '@/components/check-state';
import classes from './guide-view.module.css';
import { formatClock } from '@/lib/clock';
import { formatDate } from '@/lib/dates';

const VERDICT_WORDS: Record<ChecklistVerdict, { label: string; explanation: string }> = {
  open: { label: 'Not proven yet', explanation: 'Some required checks are still open.' },
  bench_pass: { label: 'Passes on the bench', explanation: 'Every required check passes by the numbers; not all are test-fitted yet.' },
  confirmed: { label: 'Verified fit', explanation: 'Every required check is confirmed on the vehicle, with evidence.' },
  no_fit: { label: 'Does not fit', explanation: 'At least one required check does not fit.' },
};

const EVIDENCE_WORDS: Record<CheckEvidence['kind'], string> = { mark: 'Video', measurement: 'Measurement', photo: 'Photo' };


/** A photo of the test fit: a thumbnail that opens the photo full size. */
function EvidencePhoto({ url, label }: { url: string; label: string }) {
  const [open, setOpen] = useState(false);
  return (
    <>
      <UnstyledButton onClick={() => setOpen(true)} aria-label={`Open the photo full size: ${label}`} className={classes.photoThumb}>
        <img src={url} alt="" loading="lazy" width={96} height={72} />
        <Text span size="sm">
          Photo: {label}
        </Text>
      </UnstyledButton>
      <Modal opened={open} onClose={() => setOpen(false)} title={label} size="auto" centered>
        <Image src={url} alt={label} className={classes.photoFull} />
      </Modal>
    </>
  );
}

export interface ChecklistPanelProps {
  checklist: PublishedChecklist;
  /** Set when there is a video to move; evidence with a time then becomes a link into it. */
  onSeek?: (ms: number) => void;
}

/** The verified-fit checklist as it stands now (it is live: a check may be confirmed after the guide was published). */
export function ChecklistPanel({ checklist, onSeek }: ChecklistPanelProps) {
  const verdict = VERDICT_WORDS[checklist.verdict];
  return (
    <Paper withBorder p="md" component="section" aria-labelledby="guide-checklist-heading" data-testid="guide-checklist">
      <Stack gap="sm">
        <div>
          <Title order={2} size="h4" id="guide-checklist-heading">
            Verified-fit checklist
          </Title>
          <Text size="sm" c="dimmed">
            {checklist.assemblyName} · live: states may have changed since this revision was published
          </Text>
        </div>
        <Group gap="xs" data-testid="checklist-verdict" data-verdict={checklist.verdict}>
          <Text fw={600}>{verdict.label}</Text>
          <Text size="sm" c="dimmed">
            {verdict.explanation}
          </Text>
        </Group>
        {checklist.checks.length === 0 && (
          <Text size="sm" c="dimmed">
            No checks recorded for this assembly yet.
          </Text>
        )}
        <Stack gap={0} component="ul" className={classes.plainList}>
          {checklist.checks.map((check) => (
            <li key={check.id} className={classes.checkRow} data-testid="guide-check" data-state={check.state}>
              <Group justify="space-between" align="flex-start" gap="xs">
                <div style={{ flex: '1 1 16rem' }}>
                  <Text fw={500}>{check.title}</Text>
                  {!check.required && (
                    <Text size="xs" c="dimmed">
                      Optional: does not decide the verdict
                    </Text>
                  )}
                  {check.detail && (
                    <Text size="sm" c="dimmed">
                      {check.detail}
                    </Text>
                  )}
                  {check.confirmedAt && (
                    <Text size="xs" c="dimmed">
                      Confirmed {formatDate(check.confirmedAt)}
                      {check.confirmedBy ? ` by ${check.confirmedBy}` : ''}
                    </Text>
                  )}
                </div>
                <CheckStateBadge state={check.state} />
              </Group>
              {check.evidence.length > 0 && (
                <List size="sm" mt={4} spacing={2} aria-label={`Evidence for ${check.title}`}>
                  {check.evidence.map((evidence, index) => (
                    <List.Item key={`${evidence.kind}-${index}`}>
                      {evidence.photoUrl ? (
                        <EvidencePhoto url={evidence.photoUrl} label={evidence.label} />
                      ) : evidence.startMs !== null && onSeek ? (
                        <UnstyledButton
                          className={classes.evidenceLink}
                          onClick={() => evidence.startMs !== null && onSeek(evidence.startMs)}
                          aria-label={`Watch the evidence at ${formatClock(evidence.startMs)}: ${evidence.label}`}
                        >
                          {EVIDENCE_WORDS[evidence.kind]} at <span className={classes.timeText}>{formatClock(evidence.startMs)}</span>: {evidence.label}
                        </UnstyledButton>
                      ) : (
                        <Text span size="sm">
                          {EVIDENCE_WORDS[evidence.kind]}
                          {evidence.startMs !== null ? ` at ${formatClock(evidence.startMs)}` : ''}: {evidence.label}
                        </Text>
                      )}
                    </List.Item>
                  ))}
                </List>
              )}
            </li>
          ))}
        </Stack>
      </Stack>
    </Paper>
  );
}
