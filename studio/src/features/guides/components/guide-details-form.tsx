import { Badge, Button, Checkbox, Group, NumberInput, Paper, Select, Stack, TagsInput, Text, TextInput, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { splitApiErrors } from '@/lib/form-errors';
import { notifyDone, notifyError } from '@/lib/notify';
import { useUpdateGuide } from '../api/mutations';
import { guideQueries } from '../api/queries';
import { SAFETY_TOPICS, type Guide, type GuideInput, type SafetyTopic } from '../api/types';
import { SAFETY_TOPIC_LABELS } from './guide-labels';
import { RichTextField } from './rich-text-field';
import { FormProblems } from '@/components/form-problems';
import { formatMinutes, GUIDE_MINUTES_MAX, SKILL_LEVELS, SKILL_LEVEL_WORDS } from '@/lib/guide-effort';
import { checkMinutes, minutesFrom } from './effort-fields';
import { useWorkshopReadOnly } from '@/lib/workshop-access';

const FIELD_LABELS: Record<keyof GuideInput, string> = {
  title: 'Title',
  summary: 'Summary',
  footageId: 'Main footage',
  assemblyId: 'Assembly',
  safetyTopics: 'Safety topics',
  tools: 'Tools',
  consumables: 'Consumables',
  skillLevel: 'Skill level',
  estimatedMinutes: 'Estimated time',
};

const ITEM_MAX = 120;
const ITEMS_MAX = 50;

function valuesOf(guide: Guide): GuideInput {
  return {
    title: guide.title,
    summary: guide.summary,
    footageId: guide.footageId,
    assemblyId: guide.assemblyId,
    safetyTopics: guide.safetyTopics,
    tools: guide.tools,
    consumables: guide.consumables,
    skillLevel: guide.skillLevel,
    estimatedMinutes: guide.estimatedMinutes,
  };
}

const sameList = (a: readonly string[], b: readonly string[]) => a.length === b.length && a.every((item, index) => item === b[index]);

/** Only the fields that differ from the saved guide, so a save never overwrites what it did not touch. */
function changedFields(values: GuideInput, guide: Guide): Partial<GuideInput> {
  const saved = valuesOf(guide);
  const changes: Partial<GuideInput> = {};
  if (values.title.trim() !== saved.title) changes.title = values.title.trim();
  if (values.summary !== saved.summary) changes.summary = values.summary;
  if (values.footageId !== saved.footageId) changes.footageId = values.footageId;
  if (values.assemblyId !== saved.assemblyId) changes.assemblyId = values.assemblyId;
  if (!sameList([...values.safetyTopics].sort(), [...saved.safetyTopics].sort())) changes.safetyTopics = values.safetyTopics;
  if (!sameList(values.tools, saved.tools)) changes.tools = values.tools;
  if (!sameList(values.consumables, saved.consumables)) changes.consumables = values.consumables;
  if (values.skillLevel !== saved.skillLevel) changes.skillLevel = values.skillLevel;
  if (values.estimatedMinutes !== saved.estimatedMinutes) changes.estimatedMinutes = values.estimatedMinutes;
  return changes;
}

const checkItems = (what: string) => (items: string[]) => {
  if (items.length > ITEMS_MAX) return `Up to ${ITEMS_MAX} ${what}`;
  const long = items.find((item) => item.length > ITEM_MAX);
  return long ? `“${long.slice(0, 30)}…” is longer than ${ITEM_MAX} characters` : null;
};

/** The guide's details: title, summary, its main footage and assembly, safety topics, tools and consumables. */
export function GuideDetailsForm({ workshopId, guide }: { workshopId: string; guide: Guide }) {
  const update = useUpdateGuide(workshopId, guide.id);
  // Site admins (not members) and disabled workshops read the guide without the controls the API would refuse.
  const readOnly = useWorkshopReadOnly();
  const footage = useQuery(guideQueries.footageChoices(workshopId, guide.buildId));
  const assemblies = useQuery(guideQueries.assemblyChoices(workshopId, guide.buildId));
  const [general, setGeneral] = useState<string[]>([]);
  const form = useForm<GuideInput>({
    initialValues: valuesOf(guide),
    validate: {
      title: (value) => (value.trim() ? (value.trim().length > 200 ? 'Keep the title under 200 characters' : null) : 'The guide needs a title'),
      tools: checkItems('tools'),
      consumables: checkItems('consumables'),
      estimatedMinutes: checkMinutes(GUIDE_MINUTES_MAX),
    },
  });
  const changes = changedFields(form.values, guide);
  const unsaved = Object.keys(changes).length > 0;

  const handleError = (error: unknown) => {
    const split = splitApiErrors(error, FIELD_LABELS);
    form.setErrors(split.fields);
    setGeneral(split.general);
  };

  const handleSubmit = (values: GuideInput) => {
    setGeneral([]);
    const patch = changedFields(values, guide);
    if (Object.keys(patch).length === 0) return;
    update.mutate(patch, {
      onSuccess: (saved) => {
        // Show the server's copy (its sanitised summary, its slug) as the new starting point.
        form.setValues(valuesOf(saved));
        form.resetDirty(valuesOf(saved));
        notifyDone('Guide saved.');
      },
      onError: handleError,
    });
  };

  // One click takes a topic the server found in the text; it is saved at once, other edits stay as they are.
  const handleAddDetected = (topic: SafetyTopic) => {
    const safetyTopics = [...new Set([...guide.safetyTopics, topic])];
    update.mutate(
      { safetyTopics },
      {
        onSuccess: () => {
          if (!form.values.safetyTopics.includes(topic)) form.setFieldValue('safetyTopics', [...form.values.safetyTopics, topic]);
          notifyDone(`“${SAFETY_TOPIC_LABELS[topic].name}” added to the safety topics.`);
        },
        onError: (error) => notifyError('The safety topic was not added', error),
      },
    );
  };

  const footageOptions = (footage.data ?? []).map((item) => ({
    value: item.id,
    label: item.state === 'ready' ? item.title : `${item.title} (${item.state})`,
    disabled: item.state === 'failed',
  }));

  return (
    <Paper withBorder p="md">
      <form onSubmit={form.onSubmit(handleSubmit)} aria-label="Guide details" noValidate>
        {/* Read-only: the fields show the guide as it is, disabled, with no Save. */}
        <fieldset disabled={readOnly} style={{ border: 0, padding: 0, margin: 0, minWidth: 0 }}>
        <Stack gap="md">
          <Group justify="space-between">
            <Title order={3} fz="lg">
              Details
            </Title>
            {unsaved && (
              <Text size="sm" c="dimmed" data-testid="details-unsaved">
                Unsaved changes
              </Text>
            )}
          </Group>
          <FormProblems messages={general} />
          <TextInput label="Title" withAsterisk {...form.getInputProps('title')} />
          <RichTextField
            label="Summary"
            description="What the guide achieves and for which vehicle; readers see it first."
            value={form.values.summary}
            onChange={(html) => form.setFieldValue('summary', html)}
            error={typeof form.errors.summary === 'string' ? form.errors.summary : null}
            data-testid="guide-summary"
          />
          <Group grow align="flex-start">
            <Select
              label="Main footage"
              description="The video readers follow; steps are anchored in it."
              placeholder={footage.isPending ? 'Loading…' : footage.data?.length === 0 ? 'This build has no footage yet' : 'Choose footage'}
              data={footageOptions}
              clearable
              {...form.getInputProps('footageId')}
            />
            <Select
              label="Assembly"
              description="Its verified-fit checklist and parts list go in the guide."
              placeholder={assemblies.isPending ? 'Loading…' : assemblies.data?.length === 0 ? 'This build has no assemblies yet' : 'Choose an assembly'}
              data={(assemblies.data ?? []).map((item) => ({ value: item.id, label: item.name }))}
              clearable
              {...form.getInputProps('assemblyId')}
            />
          </Group>
          <Group grow align="flex-start">
            <Select
              label="Skill level"
              description={form.values.skillLevel ? SKILL_LEVEL_WORDS[form.values.skillLevel].description : 'What a reader should already be able to do.'}
              placeholder="Not said"
              clearable
              data={SKILL_LEVELS.map((level, index) => ({ value: level, label: `${SKILL_LEVEL_WORDS[level].label} (${index + 1} of ${SKILL_LEVELS.length})` }))}
              {...form.getInputProps('skillLevel')}
            />
            <NumberInput
              label="Estimated time, minutes"
              description={
                form.values.estimatedMinutes && Number.isInteger(form.values.estimatedMinutes) && form.values.estimatedMinutes >= 1
                  ? `The whole job: ${formatMinutes(form.values.estimatedMinutes)}`
                  : 'The whole job, from first step to clean-up.'
              }
              placeholder="e.g. 180"
              min={1}
              max={GUIDE_MINUTES_MAX}
              allowDecimal={false}
              allowNegative={false}
              {...form.getInputProps('estimatedMinutes')}
              value={form.values.estimatedMinutes ?? ''}
              onChange={(value) => form.setFieldValue('estimatedMinutes', minutesFrom(value))}
            />
          </Group>
          <Checkbox.Group
            label="Safety topics"
            description="Readers see the usual cautions for each topic, and that the guide does not replace the manufacturer’s service information."
            {...form.getInputProps('safetyTopics')}
          >
            <Stack gap={6} mt={6}>
              {SAFETY_TOPICS.map((topic) => {
                const detected = guide.detectedSafetyTopics.includes(topic);
                const chosen = form.values.safetyTopics.includes(topic);
                return (
                  <Group key={topic} gap="xs" wrap="nowrap" data-testid={`safety-${topic}`}>
                    <Checkbox value={topic} label={SAFETY_TOPIC_LABELS[topic].name} description={SAFETY_TOPIC_LABELS[topic].hint} />
                    {detected && (
                      <Badge variant="outline" color="orange" size="sm" style={{ flex: 'none' }}>
                        found in your text
                      </Badge>
                    )}
                    {detected && !guide.safetyTopics.includes(topic) && !chosen && (
                      <Button size="compact-xs" variant="light" onClick={() => handleAddDetected(topic)} loading={update.isPending}>
                        Add {SAFETY_TOPIC_LABELS[topic].name.toLowerCase()}
                      </Button>
                    )}
                  </Group>
                );
              })}
            </Stack>
          </Checkbox.Group>
          <TagsInput
            label="Tools"
            description="Press Enter after each one."
            placeholder="Torque wrench, 10–60 N·m"
            maxTags={ITEMS_MAX}
            splitChars={[]}
            clearable
            {...form.getInputProps('tools')}
          />
          <TagsInput
            label="Consumables"
            description="Press Enter after each one."
            placeholder="Medium-strength thread locker"
            maxTags={ITEMS_MAX}
            splitChars={[]}
            clearable
            {...form.getInputProps('consumables')}
          />
          {!readOnly && (
          <Group justify="flex-end" gap="xs">
            <Button variant="default" disabled={!unsaved} onClick={() => form.setValues(valuesOf(guide))}>
              Undo changes
            </Button>
            <Button type="submit" loading={update.isPending} disabled={!unsaved}>
              Save details
            </Button>
          </Group>
          )}
        </Stack>
        </fieldset>
      </form>
    </Paper>
  );
}
