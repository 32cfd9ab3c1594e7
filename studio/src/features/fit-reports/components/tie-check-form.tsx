import { Button, Group, Select, Stack, Text } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { STATE_LOOK } from '@/components/check-state';
import { fitReportQueries } from '../api/queries';

export interface TieCheckFormProps {
  workshopId: string;
  /** The build the report was sent about: its assemblies are offered first. */
  defaultBuildId: string;
  pending: boolean;
  onTie: (checkId: string) => void;
  onCancel: () => void;
}

/**
 * Picks the fit check that will verify a report: a build of the workshop, one of its assemblies,
 * then one of that assembly's checks (their state in words beside each).
 */
export function TieCheckForm({ workshopId, defaultBuildId, pending, onTie, onCancel }: TieCheckFormProps) {
  const [buildId, setBuildId] = useState<string>(defaultBuildId);
  const [chosenAssemblyId, setChosenAssemblyId] = useState<string | null>(null);
  const [checkId, setCheckId] = useState<string | null>(null);
  const [error, setError] = useState<string | undefined>();

  const builds = useQuery(fitReportQueries.builds(workshopId));
  const assemblies = useQuery(fitReportQueries.assemblies(workshopId, buildId));
  // A build with one assembly needs no choosing.
  const assemblyId = chosenAssemblyId ?? (assemblies.data?.length === 1 ? assemblies.data[0].id : null);
  const checks = useQuery({ ...fitReportQueries.checks(workshopId, assemblyId ?? ''), enabled: assemblyId !== null });

  const handleBuild = (value: string | null) => {
    if (!value) return;
    setBuildId(value);
    setChosenAssemblyId(null);
    setCheckId(null);
  };
  const handleAssembly = (value: string | null) => {
    setChosenAssemblyId(value);
    setCheckId(null);
  };
  const handleSubmit = () => {
    if (!checkId) {
      setError('Pick the fit check that verifies this report');
      return;
    }
    onTie(checkId);
  };

  const checkChoices = (checks.data ?? [])
    .filter((check) => check.state !== 'retired')
    .map((check) => ({
      value: check.id,
      label: `${check.title} (${STATE_LOOK[check.state].label.toLowerCase()}${check.required ? '' : ', optional'})`,
    }));
  const loadProblem = builds.error ?? assemblies.error ?? checks.error;

  return (
    <form
      aria-label="Tie to a fit check"
      onSubmit={(event) => {
        event.preventDefault();
        handleSubmit();
      }}
    >
      <Stack gap="xs">
        <Text size="sm" fw={600}>
          Which fit check will verify this report?
        </Text>
        <Group align="flex-start" gap="sm" grow preventGrowOverflow={false}>
          <Select
            label="Build"
            data={(builds.data ?? []).map((build) => ({ value: build.id, label: build.title }))}
            value={buildId}
            onChange={handleBuild}
            allowDeselect={false}
            disabled={builds.isPending}
            miw={180}
          />
          <Select
            label="Assembly"
            placeholder={assemblies.isPending ? 'Loading…' : assemblies.data?.length ? 'Pick an assembly' : 'This build has no assembly'}
            data={(assemblies.data ?? []).map((assembly) => ({ value: assembly.id, label: assembly.name }))}
            value={assemblyId}
            onChange={handleAssembly}
            disabled={!assemblies.data?.length}
            miw={180}
          />
          <Select
            label="Fit check"
            placeholder={!assemblyId ? 'Pick an assembly first' : checks.isPending ? 'Loading…' : checkChoices.length ? 'Pick a check' : 'No checks yet'}
            data={checkChoices}
            value={checkId}
            onChange={(value) => {
              setCheckId(value);
              setError(undefined);
            }}
            error={error}
            searchable
            nothingFoundMessage="No check matches"
            disabled={!checkChoices.length}
            miw={240}
          />
        </Group>
        {loadProblem && (
          <Text size="sm" c="red" role="alert">
            {loadProblem.message}
          </Text>
        )}
        <Group gap="xs">
          <Button type="submit" size="xs" loading={pending}>
            Tie
          </Button>
          <Button size="xs" variant="default" onClick={onCancel}>
            Cancel
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
