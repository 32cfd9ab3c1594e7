import { Select, Stack, Text } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { markQueries } from '../api/queries';
import { fitCheckChoices, guideStepChoices, readingChoices } from './link-labels';

interface PickerProps {
  workshopId: string;
  footageId: string;
  value: string | null;
  onChange: (id: string | null) => void;
}

export function PartPicker({ workshopId, value, onChange }: PickerProps) {
  const parts = useQuery(markQueries.parts(workshopId));
  return (
    <Select
      label="Part shown"
      placeholder={parts.isPending ? 'Loading parts…' : 'Choose a part'}
      searchable
      clearable
      data={(parts.data ?? []).map((part) => ({ value: part.id, label: `${part.partNumber} — ${part.title}` }))}
      value={value}
      onChange={onChange}
      nothingFoundMessage="No part matches"
    />
  );
}

export function ReadingPicker({ workshopId, footageId, value, onChange }: PickerProps) {
  const measurements = useQuery(markQueries.measurements(workshopId));
  const parts = useQuery(markQueries.parts(workshopId));
  const assemblies = useQuery(markQueries.assemblies(workshopId));
  const data = readingChoices(measurements.data ?? [], footageId, { parts: parts.data, assemblies: assemblies.data });
  return (
    <Select
      label="Reading shown"
      placeholder={measurements.isPending ? 'Loading readings…' : data.length ? 'Choose a reading' : 'No readings yet: record one'}
      searchable
      clearable
      data={data}
      value={value}
      onChange={onChange}
      nothingFoundMessage="No reading matches"
    />
  );
}

export function FitCheckPicker({ workshopId, footageId, value, onChange }: PickerProps) {
  const assemblies = useQuery(markQueries.assemblies(workshopId));
  const footage = useQuery(markQueries.footage(workshopId, footageId));
  const data = fitCheckChoices(assemblies.data ?? [], footage.data?.buildId);
  return (
    <Select
      label="Fit check it evidences"
      description="from the checklists of the workshop's assemblies, this footage's build first"
      placeholder={assemblies.isPending ? 'Loading fit checks…' : data.length ? 'Choose a fit check' : 'No fit checks yet'}
      searchable
      clearable
      data={data}
      value={value}
      onChange={onChange}
      error={assemblies.isError ? assemblies.error.message : undefined}
      nothingFoundMessage="No fit check matches"
    />
  );
}

export function GuideStepPicker({ workshopId, footageId, value, onChange }: PickerProps) {
  const steps = useQuery(markQueries.guideSteps(workshopId, footageId));
  if (steps.isError) {
    return (
      <Text size="sm" c="red" role="alert">
        Guide steps could not be loaded: {steps.error.message}
      </Text>
    );
  }
  const data = steps.data ? guideStepChoices(steps.data) : [];
  if (steps.data && data.length === 0) {
    return (
      <Stack gap={2} data-testid="no-guide-steps">
        <Text size="sm" fw={500}>
          No guide steps yet
        </Text>
        <Text size="xs" c="dimmed">
          Once a guide of this workshop has steps, pick the one this moment shows. The mark can be saved without one.
        </Text>
      </Stack>
    );
  }
  return (
    <Select
      label="Guide step"
      placeholder={steps.isPending ? 'Loading guide steps…' : 'Choose a step'}
      searchable
      clearable
      data={data}
      value={value}
      onChange={onChange}
      nothingFoundMessage="No step matches"
    />
  );
}
