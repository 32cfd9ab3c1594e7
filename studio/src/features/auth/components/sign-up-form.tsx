import { Alert, Anchor, Button, PasswordInput, Stack, Text, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { splitApiErrors } from '@/lib/form-errors';
import { useSignUp } from '../api/mutations';
import { FormProblems } from '@/components/form-problems';

const LABELS = { displayName: 'Your name', email: 'E-mail address', password: 'Password' };
const PASSWORD_MIN = 10;

export function SignUpForm({ next, initialEmail = '' }: { next?: string; initialEmail?: string }) {
  const signUp = useSignUp();
  const [problem, setProblem] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const form = useForm({
    initialValues: { displayName: '', email: initialEmail, password: '' },
    validate: {
      displayName: (value) => (value.trim().length > 0 ? null : 'Enter the name others will see'),
      email: (value) => (/^\S+@\S+\.\S+$/.test(value.trim()) ? null : 'Enter a valid e-mail address'),
      password: (value) => (value.length >= PASSWORD_MIN ? null : `Use at least ${PASSWORD_MIN} characters`),
    },
  });

  const handleSubmit = (values: typeof form.values) => {
    setProblem(null);
    signUp.mutate(values, {
      onSuccess: () => setSentTo(values.email.trim()),
      onError: (error) => {
        const { fields, general } = splitApiErrors(error, LABELS);
        form.setErrors(fields);
        setProblem(general.join(' ') || null);
      },
    });
  };

  const signInPath = next ? `${paths.signIn}?next=${encodeURIComponent(next)}` : paths.signIn;

  if (sentTo) {
    return (
      <Stack gap="sm">
        <Alert color="patina" title="Check your inbox">
          We sent a link to <strong>{sentTo}</strong> to confirm your e-mail address. After confirming, sign in.
        </Alert>
        <Text size="sm" c="dimmed">
          No message after a few minutes? Look in your spam folder, or sign in and ask for a new link.
        </Text>
        <Button component={Link} to={signInPath} variant="light">
          Go to sign in
        </Button>
      </Stack>
    );
  }

  return (
    <form onSubmit={form.onSubmit(handleSubmit)} noValidate aria-label="Create an account">
      <Stack gap="sm">
        <FormProblems messages={problem} />
        <TextInput label={LABELS.displayName} autoComplete="name" required {...form.getInputProps('displayName')} />
        <TextInput label={LABELS.email} type="email" autoComplete="email" required {...form.getInputProps('email')} />
        <PasswordInput
          label={LABELS.password}
          description={`At least ${PASSWORD_MIN} characters; a few words make a good one.`}
          autoComplete="new-password"
          required
          {...form.getInputProps('password')}
        />
        <Button type="submit" loading={signUp.isPending} mt="xs">
          Create account
        </Button>
        <Anchor component={Link} to={signInPath} size="sm">
          Already have an account? Sign in
        </Anchor>
      </Stack>
    </form>
  );
}
