import { Alert, Loader, Stack, Switch, Text } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { FormProblems } from '@/components/form-problems';
import { notifyDone } from '@/lib/notify';
import { useUpdateMediaSettings } from '../api/mutations';
import { type Workshop, workshopQueries } from '../api/queries';

/**
 * Owners choose whether an upload's original file stays in storage once its web versions (the
 * streaming and download copies every browser plays) are made. Applies to footage processed from
 * the change on; footage already processed keeps what it has.
 */
export function MediaSettingsPanel({ workshop }: { workshop: Workshop }) {
  const settings = useQuery(workshopQueries.mediaSettings(workshop.id));
  const update = useUpdateMediaSettings(workshop.id);
  const [problem, setProblem] = useState<string | null>(null);

  if (settings.isPending) return <Loader size="sm" aria-label="Loading the footage settings" />;
  if (settings.isError) {
    return (
      <Alert color="red" title="The footage settings could not be loaded">
        {settings.error.message}
      </Alert>
    );
  }

  // While a change is on its way the switch shows the value asked for; a refusal puts it back.
  const keepOriginals = update.isPending ? update.variables.keepOriginals : settings.data.keepOriginals;
  return (
    <Stack gap="sm">
      <Switch
        label="Keep original uploads"
        description={
          keepOriginals
            ? 'Originals stay in storage beside their web versions, so web versions can be made again later.'
            : 'Originals are deleted once their web versions are ready. This saves storage, but web versions can no longer be made again.'
        }
        checked={keepOriginals}
        disabled={workshop.disabled || update.isPending}
        onChange={(event) => {
          const wanted = event.currentTarget.checked;
          setProblem(null);
          update.mutate(
            { keepOriginals: wanted },
            {
              onSuccess: () => notifyDone(wanted ? 'Originals will be kept' : 'Originals will be deleted after processing'),
              onError: (error) => setProblem(error.message),
            },
          );
        }}
      />
      <Text size="sm" c="dimmed">
        Applies to footage processed from now on; footage already processed keeps what it has.
      </Text>
      <FormProblems messages={problem} title="The setting was not changed" />
    </Stack>
  );
}
