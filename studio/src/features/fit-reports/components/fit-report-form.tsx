import { Alert, Anchor, Button, Group, Paper, Progress, Radio, Stack, Text, TextInput, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { splitApiErrors } from '@/lib/form-errors';
import { useSendFitReport } from '../api/mutations';
import { FIT_REPORT_LIMITS, type FitReport, type FitReportOutcome } from '../api/queries';
import { usePhotoSending, type PhotoSending } from '../hooks/use-photo-sending';
import { PhotoPicker } from './photo-picker';
import { RetryNotice } from '@/components/retry-notice';
import { FormProblems } from '@/components/form-problems';

export interface FitReportFormProps {
  workshopSlug: string;
  guideSlug: string;
  /** False when the person has not confirmed their e-mail address yet: the verdict mail cannot reach them. */
  emailVerified: boolean;
  onClose: () => void;
}

interface Values {
  outcome: FitReportOutcome | '';
  parts: string;
  vehicle: string;
  notes: string;
}

const LABELS = { outcome: 'Outcome', parts: 'What you combined', vehicle: 'Vehicle', notes: 'Notes' } as const;

const tooLong = (value: string, max: number) => (value.trim().length > max ? `At most ${max} characters (now ${value.trim().length})` : null);

/** A subscriber's claim about a combination of parts, sent from a published guide, with photos. */
export function FitReportForm({ workshopSlug, guideSlug, emailVerified, onClose }: FitReportFormProps) {
  const send = useSendFitReport(workshopSlug, guideSlug);
  const photoSending = usePhotoSending();
  const [photos, setPhotos] = useState<File[]>([]);
  const [general, setGeneral] = useState<string[]>([]);
  const [sent, setSent] = useState<FitReport | null>(null);
  const form = useForm<Values>({
    initialValues: { outcome: '', parts: '', vehicle: '', notes: '' },
    validate: {
      outcome: (value) => (value ? null : 'Choose whether it fit'),
      parts: (value) => (value.trim() ? tooLong(value, FIT_REPORT_LIMITS.partsMax) : 'Say which parts you combined: part numbers and makers'),
      vehicle: (value) => tooLong(value, FIT_REPORT_LIMITS.vehicleMax),
      notes: (value) => tooLong(value, FIT_REPORT_LIMITS.notesMax),
    },
  });

  const handleSubmit = (values: Values) => {
    if (!values.outcome) return;
    setGeneral([]);
    send.mutate(
      { outcome: values.outcome, parts: values.parts.trim(), vehicle: values.vehicle.trim() || undefined, notes: values.notes.trim() || undefined },
      {
        onSuccess: (report) => {
          setSent(report);
          void photoSending.sendAll(report.id, photos);
        },
        onError: (error) => {
          const split = splitApiErrors(error, LABELS);
          form.setErrors(split.fields);
          setGeneral(split.general);
        },
      },
    );
  };

  if (sent) {
    return (
      <Stack gap="md" data-testid="fit-report-sent">
        <Alert color="patina" title="Report sent" role="status">
          <Text size="sm">
            Thanks — {sent.workshop.name} will review it. You’ll be e-mailed if it is verified.
          </Text>
          {!emailVerified && (
            <Text size="sm" mt={4}>
              Confirm your e-mail address first (follow the link we e-mailed you), or that message cannot reach you.
            </Text>
          )}
        </Alert>
        {photoSending.items.length > 0 && (
          <Stack gap="xs" component="ul" aria-label="Photos being sent" style={{ listStyle: 'none', margin: 0, padding: 0 }}>
            {photoSending.items.map((item) => (
              <PhotoProgress key={item.key} item={item} onRetry={() => void photoSending.retry(sent.id, item.key)} />
            ))}
          </Stack>
        )}
        <Group justify="space-between">
          <Anchor component={Link} to={paths.account} size="sm">
            Your fit reports, in your account
          </Anchor>
          <Button onClick={onClose}>Close</Button>
        </Group>
      </Stack>
    );
  }

  return (
    <form onSubmit={form.onSubmit(handleSubmit)} aria-label="Report a fit" noValidate>
      <Stack gap="md">
        <FormProblems messages={general} />
        <Radio.Group label={LABELS.outcome} withAsterisk {...form.getInputProps('outcome')}>
          <Group mt={6} gap="lg">
            <Radio value="fit" label="It fit" />
            <Radio value="no_fit" label="It did not fit" />
          </Group>
        </Radio.Group>
        <Textarea
          label={LABELS.parts}
          description="Part numbers and makers of each part, as you fitted them"
          placeholder="HL-2107 coupler (Brackwater Drive) on the original gearbox input shaft"
          withAsterisk
          autosize
          minRows={3}
          maxLength={FIT_REPORT_LIMITS.partsMax}
          {...form.getInputProps('parts')}
        />
        <TextInput
          label={LABELS.vehicle}
          description="Year, model and anything changed that matters"
          placeholder="1984 compact pickup, 4x2, electric conversion"
          maxLength={FIT_REPORT_LIMITS.vehicleMax}
          {...form.getInputProps('vehicle')}
        />
        <Textarea
          label={LABELS.notes}
          description="What you measured, what you had to change, anything the workshop should know"
          autosize
          minRows={2}
          maxLength={FIT_REPORT_LIMITS.notesMax}
          {...form.getInputProps('notes')}
        />
        <PhotoPicker photos={photos} onChange={setPhotos} />
        <Text size="xs" c="dimmed">
          The workshop sees your display name, never your e-mail address.
        </Text>
        <Group justify="flex-end">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" loading={send.isPending}>
            Send report
          </Button>
        </Group>
      </Stack>
    </form>
  );
}

const PHASE_WORDS: Record<PhotoSending['phase'], string> = { waiting: 'Waiting', sending: 'Sending', sent: 'Sent', failed: 'Not sent' };

function PhotoProgress({ item, onRetry }: { item: PhotoSending; onRetry: () => void }) {
  const percent = Math.round(item.fraction * 100);
  return (
    <Paper component="li" withBorder p="xs" data-testid="photo-progress" data-phase={item.phase}>
      <Stack gap={4}>
        <Group justify="space-between" wrap="nowrap" gap="xs">
          <Text size="sm" truncate>
            {item.file.name}
          </Text>
          <Text size="sm" fw={600} data-testid="photo-phase">
            {PHASE_WORDS[item.phase]}
            {item.phase === 'sending' ? ` · ${percent} %` : ''}
          </Text>
        </Group>
        {(item.phase === 'sending' || item.phase === 'waiting') && (
          <Progress value={percent} size="sm" aria-label={`Sending ${item.file.name}`} aria-valuenow={percent} animated={item.phase === 'sending'} />
        )}
        {item.phase === 'failed' && (
          <RetryNotice message={item.error ?? 'The photo could not be sent.'} onRetry={onRetry} />
        )}
      </Stack>
    </Paper>
  );
}
