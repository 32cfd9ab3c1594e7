import { Alert, Button, Group, Paper, PasswordInput, SegmentedControl, Stack, Text, TextInput, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState, type ReactNode } from 'react';
import { splitApiErrors } from '@/lib/form-errors';
import { notifyDone } from '@/lib/notify';
import { useSession, type SessionUser } from '@/lib/session';
import { useChangeEmail, useChangePassword, useResendVerification, useUpdateProfile } from '../api/mutations';
import { FormProblems } from '@/components/form-problems';

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Paper withBorder p="lg" radius="md">
      <Stack gap="sm">
        <Title order={3} size="h4">
          {title}
        </Title>
        {children}
      </Stack>
    </Paper>
  );
}

function ProfileForm({ user }: { user: SessionUser }) {
  const update = useUpdateProfile();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm({
    initialValues: { displayName: user.displayName, preferredUnits: user.preferredUnits },
    validate: { displayName: (value) => (value.trim() ? null : 'Enter the name others will see') },
  });
  return (
    <form
      noValidate
      aria-label="Profile"
      onSubmit={form.onSubmit((values) => {
        setProblem(null);
        update.mutate(values, {
          onSuccess: () => notifyDone('Profile saved'),
          onError: (error) => {
            const { fields, general } = splitApiErrors(error, { displayName: 'Display name', preferredUnits: 'Units' });
            form.setErrors(fields);
            setProblem(general.join(' ') || null);
          },
        });
      })}
    >
      <Stack gap="sm">
        <FormProblems messages={problem} />
        <TextInput label="Display name" description="Shown to your workshop's members and readers" {...form.getInputProps('displayName')} />
        <div>
          <Text size="sm" fw={500} mb={4}>
            Show lengths in
          </Text>
          <SegmentedControl
            aria-label="Show lengths in"
            data={[
              { value: 'metric', label: 'Millimetres' },
              { value: 'inch', label: 'Inches' },
            ]}
            {...form.getInputProps('preferredUnits')}
          />
        </div>
        <Group>
          <Button type="submit" loading={update.isPending}>
            Save profile
          </Button>
        </Group>
      </Stack>
    </form>
  );
}

function PasswordForm() {
  const change = useChangePassword();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm({
    initialValues: { currentPassword: '', newPassword: '' },
    validate: {
      currentPassword: (value) => (value ? null : 'Enter your current password'),
      newPassword: (value) => (value.length >= 10 ? null : 'Use at least 10 characters'),
    },
  });
  return (
    <form
      noValidate
      aria-label="Change password"
      onSubmit={form.onSubmit((values) => {
        setProblem(null);
        change.mutate(values, {
          onSuccess: (result) => {
            form.reset();
            notifyDone(result.message);
          },
          onError: (error) => {
            const { fields, general } = splitApiErrors(error, { currentPassword: 'Current password', newPassword: 'New password' });
            form.setErrors(fields);
            setProblem(general.join(' ') || null);
          },
        });
      })}
    >
      <Stack gap="sm">
        <FormProblems messages={problem} />
        <PasswordInput label="Current password" autoComplete="current-password" {...form.getInputProps('currentPassword')} />
        <PasswordInput label="New password" autoComplete="new-password" {...form.getInputProps('newPassword')} />
        <Group>
          <Button type="submit" loading={change.isPending}>
            Change password
          </Button>
        </Group>
      </Stack>
    </form>
  );
}

function EmailForm({ user }: { user: SessionUser }) {
  const change = useChangeEmail();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm({
    initialValues: { newEmail: '', password: '' },
    validate: {
      newEmail: (value) => (/^\S+@\S+\.\S+$/.test(value.trim()) ? null : 'Enter a valid e-mail address'),
      password: (value) => (value ? null : 'Enter your password to confirm'),
    },
  });
  if (change.isSuccess) {
    return <Alert color="patina">{change.data.message}</Alert>;
  }
  return (
    <form
      noValidate
      aria-label="Change e-mail address"
      onSubmit={form.onSubmit((values) => {
        setProblem(null);
        change.mutate(values, {
          onError: (error) => {
            const { fields, general } = splitApiErrors(error, { newEmail: 'New e-mail address', password: 'Password' });
            form.setErrors(fields);
            setProblem(general.join(' ') || null);
          },
        });
      })}
    >
      <Stack gap="sm">
        <Text size="sm">
          Now: <strong>{user.email}</strong>. We send a link to the new address; the change happens when you follow it.
        </Text>
        <FormProblems messages={problem} />
        <TextInput label="New e-mail address" type="email" autoComplete="email" {...form.getInputProps('newEmail')} />
        <PasswordInput label="Password" autoComplete="current-password" {...form.getInputProps('password')} />
        <Group>
          <Button type="submit" loading={change.isPending}>
            Send confirmation link
          </Button>
        </Group>
      </Stack>
    </form>
  );
}

export function UnverifiedNotice() {
  const resend = useResendVerification();
  return (
    <Alert color="yellow" title="Confirm your e-mail address">
      <Stack gap="xs">
        <Text size="sm">Follow the link we e-mailed you to create workshops and invite people.</Text>
        {resend.isSuccess ? (
          <Text size="sm">{resend.data.message}</Text>
        ) : (
          <Group>
            <Button size="xs" variant="white" loading={resend.isPending} onClick={() => resend.mutate()}>
              Send the link again
            </Button>
          </Group>
        )}
        {resend.isError && <Text size="sm" c="red">{resend.error.message}</Text>}
      </Stack>
    </Alert>
  );
}

export function AccountSettings() {
  const { user } = useSession();
  if (!user) return null;
  return (
    <Stack maw={640} gap="lg">
      <Title order={2}>Account settings</Title>
      {!user.emailVerified && <UnverifiedNotice />}
      <Section title="Profile">
        <ProfileForm key={user.id} user={user} />
      </Section>
      <Section title="Password">
        <PasswordForm />
      </Section>
      <Section title="E-mail address">
        <EmailForm user={user} />
      </Section>
    </Stack>
  );
}
