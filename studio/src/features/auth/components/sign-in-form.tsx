import { Anchor, Button, Group, PasswordInput, Stack, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { splitApiErrors } from '@/lib/form-errors';
import type { SessionUser } from '@/lib/session';
import { useSignIn } from '../api/mutations';
import { FormProblems } from '@/components/form-problems';

const LABELS = { email: 'E-mail address', password: 'Password' };

export function SignInForm({ onSignedIn, next }: { onSignedIn: (user: SessionUser) => void; next?: string }) {
  const signIn = useSignIn();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm({
    initialValues: { email: '', password: '' },
    validate: {
      email: (value) => (/^\S+@\S+\.\S+$/.test(value.trim()) ? null : 'Enter your e-mail address'),
      password: (value) => (value.length > 0 ? null : 'Enter your password'),
    },
  });

  const handleSubmit = (values: typeof form.values) => {
    setProblem(null);
    signIn.mutate(values, {
      onSuccess: ({ user }) => {
        if (user) onSignedIn(user);
      },
      onError: (error) => {
        const { fields, general } = splitApiErrors(error, LABELS);
        form.setErrors(fields);
        setProblem(general.join(' ') || null);
      },
    });
  };

  const withNext = (path: string) => (next ? `${path}?next=${encodeURIComponent(next)}` : path);

  return (
    <form onSubmit={form.onSubmit(handleSubmit)} noValidate aria-label="Sign in">
      <Stack gap="sm">
        <FormProblems messages={problem} />
        <TextInput label={LABELS.email} type="email" autoComplete="email" required {...form.getInputProps('email')} />
        <PasswordInput label={LABELS.password} autoComplete="current-password" required {...form.getInputProps('password')} />
        <Group justify="space-between" mt="xs">
          <Anchor component={Link} to={paths.forgotPassword} size="sm">
            Forgot your password?
          </Anchor>
          <Button type="submit" loading={signIn.isPending}>
            Sign in
          </Button>
        </Group>
        <Anchor component={Link} to={withNext(paths.signUp)} size="sm">
          New here? Create an account
        </Anchor>
      </Stack>
    </form>
  );
}
