import { Button, Group, NumberInput, Paper, Select, Stack, Text, TextInput, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { splitApiErrors } from '@/lib/form-errors';
import { useSaveStep } from '../api/mutations';
import { CAUTION_LEVELS, type CautionLevel, type FootageChoice, type GuideStep } from '../api/types';
import { CAUTION_LOOK } from './guide-labels';
import { RichTextField } from './rich-text-field';
import { formatClock } from '@/lib/clock';
import { parseStepTime } from './step-time';
import { FormProblems } from '@/components/form-problems';
import { formatMinutes, STEP_MINUTES_MAX } from '@/lib/guide-effort';
import { checkMinutes, minutesFrom } from './effort-fields';

const FIELD_LABELS = {
  title: 'Title',
  body: 'What to do',
  startMs: 'At',
  endMs: 'Until',
  footageId: 'At',
  'caution.level': 'Caution',
  'caution.text': 'Caution text',
  caution: 'Caution',
  estimatedMinutes: 'Time for this step',
} as const;

const TIME_HINT = 'Write the time as m:ss or m:ss.s, e.g. 1:15.3';

interface StepValues {
  title: string;
  body: string;
  footageId: string | null;
  start: string;
  end: string;
  cautionLevel: CautionLevel | null;
  cautionText: string;
  estimatedMinutes: number | null;
}

function valuesOf(step: GuideStep | null, mainFootageId: string | null): StepValues {
  return {
    title: step?.title ?? '',
    body: step?.body ?? '',
    footageId: step?.footageId ?? mainFootageId,
    start: step?.startMs != null ? formatClock(step.startMs, { tenths: true }) : '',
    end: step?.endMs != null ? formatClock(step.endMs, { tenths: true }) : '',
    cautionLevel: step?.caution?.level ?? null,
    cautionText: step?.caution?.text ?? '',
    estimatedMinutes: step?.estimatedMinutes ?? null,
  };
}

export interface StepFormProps {
  workshopId: string;
  guideId: string;
  /** The step to change, or null for a new one (appended last). */
  step: GuideStep | null;
  /** The guide's main footage, which new moments are taken in (null: the guide has none yet). */
  mainFootage: FootageChoice | null;
  /** Where the player is now, read at the moment the button is pressed. */
  readPositionMs: (() => number) | null;
  onDone: () => void;
}

/** Adds or changes one step: title, rich text, its moment in the main footage and an optional caution. */
export function StepForm({ workshopId, guideId, step, mainFootage, readPositionMs, onDone }: StepFormProps) {
  const save = useSaveStep(workshopId, guideId);
  const [general, setGeneral] = useState<string[]>([]);
  const durationMs = mainFootage?.durationMs ?? null;

  const checkTime = (text: string) => {
    const ms = parseStepTime(text);
    if (ms === undefined) return TIME_HINT;
    if (ms !== null && durationMs !== null && ms > durationMs) return `The footage is ${formatClock(durationMs, { tenths: true })} long`;
    return null;
  };

  const form = useForm<StepValues>({
    initialValues: valuesOf(step, mainFootage?.id ?? null),
    validate: {
      title: (value) => (value.trim() ? (value.trim().length > 200 ? 'Keep the title under 200 characters' : null) : 'Give the step a title, e.g. "Press the pilot bearing in"'),
      start: checkTime,
      end: (value, values) => {
        const problem = checkTime(value);
        if (problem) return problem;
        const end = parseStepTime(value);
        const start = parseStepTime(values.start);
        if (end == null) return null;
        if (start == null) return 'Set where the step starts first';
        return end > start ? null : 'The end comes after the start';
      },
      cautionText: (value, values) => {
        if (!values.cautionLevel) return null;
        if (!value.trim()) return 'Say what the danger is and how to avoid it';
        return value.trim().length > 1000 ? 'Keep the caution under 1,000 characters' : null;
      },
      estimatedMinutes: checkMinutes(STEP_MINUTES_MAX),
    },
  });

  const takeCurrentTime = (field: 'start' | 'end') => {
    if (!readPositionMs || !mainFootage) return;
    form.setFieldValue(field, formatClock(readPositionMs(), { tenths: true }));
    form.setFieldValue('footageId', mainFootage.id);
  };

  const handleSubmit = (values: StepValues) => {
    setGeneral([]);
    const startMs = parseStepTime(values.start) ?? null;
    const endMs = parseStepTime(values.end) ?? null;
    save.mutate(
      {
        id: step?.id,
        title: values.title.trim(),
        body: values.body,
        footageId: startMs === null ? null : (values.footageId ?? mainFootage?.id ?? null),
        startMs,
        endMs: startMs === null ? null : endMs,
        caution: values.cautionLevel ? { level: values.cautionLevel, text: values.cautionText.trim() } : null,
        estimatedMinutes: values.estimatedMinutes,
      },
      {
        onSuccess: onDone,
        onError: (error) => {
          const split = splitApiErrors(error, FIELD_LABELS);
          const { startMs: startError, footageId: footageError, endMs: endError, body, title } = split.fields;
          form.setErrors({
            title,
            body,
            start: startError ?? footageError,
            end: endError,
            cautionLevel: split.fields['caution.level'] ?? split.fields.caution,
            cautionText: split.fields['caution.text'],
            estimatedMinutes: split.fields.estimatedMinutes,
          });
          setGeneral(split.general);
        },
      },
    );
  };

  const otherFootage = form.values.footageId !== null && mainFootage !== null && form.values.footageId !== mainFootage.id && form.values.start !== '';
  const formLabel = step ? `Edit step ${step.position}` : 'New step';

  return (
    <Paper withBorder p="md" data-testid="step-form">
      <form onSubmit={form.onSubmit(handleSubmit)} aria-label={formLabel} noValidate>
        <Stack gap="sm">
          <Text fw={600}>{formLabel}</Text>
          <FormProblems messages={general} />
          <TextInput label="Title" withAsterisk placeholder="Press the pilot bearing into the flywheel" {...form.getInputProps('title')} />
          <RichTextField
            label="What to do"
            value={form.values.body}
            onChange={(html) => form.setFieldValue('body', html)}
            error={typeof form.errors.body === 'string' ? form.errors.body : null}
            minHeight={100}
            data-testid="step-body"
          />
          {mainFootage ? (
            <Stack gap={4}>
              <Text size="xs" c="dimmed">
                The step’s moment in the main footage, as m:ss or m:ss.s; or play the video beside and take its time.
              </Text>
              <Group align="flex-start" gap="lg" wrap="wrap">
                <Group align="flex-end" gap="xs" wrap="nowrap">
                  <TextInput label="At" placeholder="1:15.3" w={120} {...form.getInputProps('start')} />
                  <Button variant="default" onClick={() => takeCurrentTime('start')} disabled={!readPositionMs}>
                    Use current time
                  </Button>
                </Group>
                <Group align="flex-end" gap="xs" wrap="nowrap">
                  <TextInput label="Until (optional)" placeholder="1:42.0" w={120} {...form.getInputProps('end')} />
                  <Button
                    variant="subtle"
                    onClick={() => takeCurrentTime('end')}
                    disabled={!readPositionMs}
                    aria-label="Use current time as the end"
                  >
                    Use current time
                  </Button>
                </Group>
              </Group>
              {otherFootage && (
                <Text size="xs" c="dimmed">
                  This step is anchored in other footage than the main one; “Use current time” moves it to the main footage.
                </Text>
              )}
            </Stack>
          ) : (
            <Text size="sm" c="dimmed">
              Choose the guide’s main footage above to anchor steps to a moment in the video.
            </Text>
          )}
          <NumberInput
            label="Time for this step, minutes (optional)"
            description={
              form.values.estimatedMinutes && Number.isInteger(form.values.estimatedMinutes) && form.values.estimatedMinutes >= 1
                ? `About ${formatMinutes(form.values.estimatedMinutes)}`
                : 'Readers see it beside the step.'
            }
            placeholder="e.g. 20"
            w={260}
            min={1}
            max={STEP_MINUTES_MAX}
            allowDecimal={false}
            allowNegative={false}
            {...form.getInputProps('estimatedMinutes')}
            value={form.values.estimatedMinutes ?? ''}
            onChange={(value) => form.setFieldValue('estimatedMinutes', minutesFrom(value))}
          />
          <Group align="flex-start" gap="xs" wrap="wrap">
            <Select
              label="Caution"
              w={180}
              placeholder="None"
              clearable
              data={CAUTION_LEVELS.map((level) => ({ value: level, label: level }))}
              {...form.getInputProps('cautionLevel')}
            />
            {form.values.cautionLevel && (
              <Textarea
                label="Caution text"
                description={`${form.values.cautionLevel}: ${CAUTION_LOOK[form.values.cautionLevel].meaning}`}
                withAsterisk
                autosize
                minRows={1}
                style={{ flex: 1, minWidth: 240 }}
                placeholder="Support the gearbox on a transmission jack before removing the last bolt."
                {...form.getInputProps('cautionText')}
              />
            )}
          </Group>
          <Group justify="flex-end">
            <Button variant="default" onClick={onDone}>
              Cancel
            </Button>
            <Button type="submit" loading={save.isPending}>
              {step ? 'Save step' : 'Add step'}
            </Button>
          </Group>
        </Stack>
      </form>
    </Paper>
  );
}
