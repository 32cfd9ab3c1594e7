import { Stack, Switch } from '@mantine/core';
import { useState } from 'react';
import { FormProblems } from '@/components/form-problems';
import { notifyDone } from '@/lib/notify';
import { useWorkshopReadOnly } from '@/lib/workshop-access';
import { useUpdateWorkshop } from '../api/mutations';
import type { Workshop } from '../api/queries';

/**
 * Owners and editors choose whether public guides and the fit finder name the member who confirmed a
 * check. Off by default: a member's name goes public only when the workshop says so.
 */
export function PublicNamesPanel({ workshop }: { workshop: Workshop }) {
  const readOnly = useWorkshopReadOnly();
  const update = useUpdateWorkshop(workshop.id);
  const [problem, setProblem] = useState<string | null>(null);
  // While a change is on its way (and the workshop is read again) the switch shows the value asked for; a refusal puts it back.
  const showNames = update.isPending && update.variables.showMemberNames !== undefined ? update.variables.showMemberNames : workshop.showMemberNames;
  return (
    <Stack gap="sm">
      <Switch
        label="Show members' names on public pages"
        description="Public guides and the fit finder then say which member confirmed each check. Off by default."
        checked={showNames}
        disabled={readOnly || update.isPending}
        onChange={(event) => {
          const wanted = event.currentTarget.checked;
          setProblem(null);
          update.mutate(
            { showMemberNames: wanted },
            {
              onSuccess: () => notifyDone(wanted ? "Members' names will show on public pages" : "Members' names are no longer shown on public pages"),
              onError: (error) => setProblem(error.message),
            },
          );
        }}
      />
      <FormProblems messages={problem} title="The setting was not changed" />
    </Stack>
  );
}
