import { Avatar, Button, FileButton, Group, Paper, Stack, Text, Textarea, TextInput, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { splitApiErrors } from '@/lib/form-errors';
import { notifyDone, notifyError } from '@/lib/notify';
import { useDeleteWorkshop, useRemoveLogo, useUpdateWorkshop, useUploadLogo } from '../api/mutations';
import type { Workshop } from '../api/queries';
import { MediaSettingsPanel } from './media-settings-panel';
import { PublicNamesPanel } from './public-names-panel';
import { WorkshopGate } from './workshop-gate';
import { WorkshopHeader } from './workshop-header';
import { FormProblems } from '@/components/form-problems';

const LABELS = { name: 'Workshop name', slug: 'Web address', description: 'Short description' };
const LOGO_TYPES = ['image/png', 'image/jpeg', 'image/webp'];
const LOGO_MAX_BYTES = 2 * 1024 * 1024;

function DetailsForm({ workshop, readOnly }: { workshop: Workshop; readOnly: boolean }) {
  const update = useUpdateWorkshop(workshop.id);
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm({
    initialValues: { name: workshop.name, slug: workshop.slug, description: workshop.description },
  });
  return (
    <form
      noValidate
      aria-label="Workshop details"
      onSubmit={form.onSubmit((values) => {
        setProblem(null);
        update.mutate(values, {
          onSuccess: () => notifyDone('Workshop saved'),
          onError: (error) => {
            const { fields, general } = splitApiErrors(error, LABELS);
            form.setErrors(fields);
            setProblem(general.join(' ') || null);
          },
        });
      })}
    >
      <Stack gap="sm">
        <FormProblems messages={problem} />
        <TextInput label={LABELS.name} readOnly={readOnly} {...form.getInputProps('name')} />
        <TextInput
          label={LABELS.slug}
          description="Changing it changes the addresses of your published guides"
          readOnly={readOnly}
          {...form.getInputProps('slug')}
        />
        <Textarea label={LABELS.description} autosize minRows={2} maxLength={500} readOnly={readOnly} {...form.getInputProps('description')} />
        {!readOnly && (
          <Group>
            <Button type="submit" loading={update.isPending}>
              Save
            </Button>
          </Group>
        )}
      </Stack>
    </form>
  );
}

function LogoPanel({ workshop, readOnly }: { workshop: Workshop; readOnly: boolean }) {
  const upload = useUploadLogo(workshop.id);
  const remove = useRemoveLogo(workshop.id);
  const [problem, setProblem] = useState<string | null>(null);

  const handleFile = (file: File | null) => {
    setProblem(null);
    if (!file) return;
    if (!LOGO_TYPES.includes(file.type)) return setProblem('Choose a PNG, JPEG or WebP image.');
    if (file.size > LOGO_MAX_BYTES) return setProblem('The logo must be 2 MB or smaller.');
    upload.mutate(file, {
      onSuccess: () => notifyDone('Logo updated'),
      onError: (error) => setProblem(error.message),
    });
  };

  return (
    <Stack gap="sm">
      <Group>
        <Avatar src={workshop.logoUrl} alt={`${workshop.name} logo`} size={72} radius="md" color="patina">
          {workshop.name.slice(0, 2).toUpperCase()}
        </Avatar>
        <Text size="sm" c="dimmed" maw={320}>
          A square PNG, JPEG or WebP image, at most 2 MB. It appears beside your workshop's name.
        </Text>
      </Group>
      <FormProblems messages={problem} />
      {!readOnly && (
        <Group>
          <FileButton onChange={handleFile} accept={LOGO_TYPES.join(',')}>
            {(props) => (
              <Button {...props} variant="light" loading={upload.isPending}>
                {workshop.logoUrl ? 'Replace logo' : 'Upload logo'}
              </Button>
            )}
          </FileButton>
          {workshop.logoUrl && (
            <Button
              variant="subtle"
              color="red"
              loading={remove.isPending}
              onClick={() => remove.mutate(undefined, { onError: (error) => notifyError('Could not remove the logo', error) })}
            >
              Remove logo
            </Button>
          )}
        </Group>
      )}
    </Stack>
  );
}

/** Owners only: typing the name again is the confirmation, because nothing of it can be brought back. */
export function DeleteWorkshopPanel({ workshop }: { workshop: Workshop }) {
  const remove = useDeleteWorkshop(workshop.id);
  const navigate = useNavigate();
  const [typed, setTyped] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const matches = typed.trim() === workshop.name;
  return (
    <form
      noValidate
      aria-label="Delete this workshop"
      onSubmit={(event) => {
        event.preventDefault();
        setProblem(null);
        remove.mutate(typed, {
          onSuccess: () => {
            notifyDone(`${workshop.name} was deleted`);
            navigate(paths.workshops);
          },
          onError: (error) => setProblem(error instanceof Error ? error.message : 'The workshop could not be deleted.'),
        });
      }}
    >
      <Stack gap="sm">
        <Text size="sm">
          Deletes the workshop for everyone: its members, builds, parts, footage and transcripts, marks, guides (published ones
          disappear from the public pages), fit reports and every stored file. Followers stop hearing from it. This cannot be undone.
        </Text>
        <TextInput
          label={`Type the workshop's name, ${workshop.name}, to confirm`}
          value={typed}
          onChange={(event) => setTyped(event.currentTarget.value)}
          autoComplete="off"
        />
        <FormProblems messages={problem} />
        <Group>
          <Button type="submit" color="red" disabled={!matches} loading={remove.isPending}>
            Delete this workshop
          </Button>
        </Group>
      </Stack>
    </form>
  );
}

function Settings({ workshop }: { workshop: Workshop }) {
  const readOnly = workshop.role === 'admin' || workshop.disabled;
  return (
    <Stack>
      <WorkshopHeader workshop={workshop} />
      <Stack maw={640} gap="lg">
        <Paper withBorder p="lg" radius="md">
          <Title order={3} size="h4" mb="sm">
            Details
          </Title>
          <DetailsForm key={workshop.id} workshop={workshop} readOnly={readOnly} />
        </Paper>
        <Paper withBorder p="lg" radius="md">
          <Title order={3} size="h4" mb="sm">
            Logo
          </Title>
          <LogoPanel workshop={workshop} readOnly={readOnly} />
        </Paper>
        <Paper withBorder p="lg" radius="md">
          <Title order={3} size="h4" mb="sm">
            Public pages
          </Title>
          <PublicNamesPanel workshop={workshop} />
        </Paper>
        {workshop.role === 'owner' && (
          <Paper withBorder p="lg" radius="md">
            <Title order={3} size="h4" mb="sm">
              Footage storage
            </Title>
            <MediaSettingsPanel workshop={workshop} />
          </Paper>
        )}
        {workshop.role === 'owner' && (
          <Paper withBorder p="lg" radius="md" style={{ borderColor: 'var(--mantine-color-red-6)' }}>
            <Title order={3} size="h4" mb="sm">
              Delete the workshop
            </Title>
            <DeleteWorkshopPanel workshop={workshop} />
          </Paper>
        )}
      </Stack>
    </Stack>
  );
}

export function WorkshopSettingsPage({ workshopId }: { workshopId: string }) {
  return <WorkshopGate workshopId={workshopId}>{(workshop) => <Settings workshop={workshop} />}</WorkshopGate>;
}
