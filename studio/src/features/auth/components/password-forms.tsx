import { Alert, Anchor, Button, PasswordInput, Stack, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { splitApiErrors } from '@/lib/form-errors';
import { useForgotPassword, useResetPassword } from '../api/mutations';
import { FormProblems } from '@/components/form-problems';

const PASSWORD_MIN = 10;

export function ForgotPasswordForm() {
  const forgot = useForgotPassword();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm({
    initialValues: { email: '' },
    validate: { email: (value) => (/^\S+@\S+\.\S+$/.test(value.trim()) ? null : 'Enter your e-mail address') },
  });

  if (forgot.isSuccess) {
    return (
      <Alert color="patina" title="Check your inbox">
        {forgot.data.message} The link works once, for one hour.
      </Alert>
    );
  }

  return (
    <form
      noValidate
      aria-label="Forgot password"
      onSubmit={form.onSubmit(({ email }) => {
        setProblem(null);
        forgot.mutate(email, {
          onError: (error) => {
            const { fields, general } = splitApiErrors(error, { email: 'E-mail address' });
            form.setErrors(fields);
            setProblem(general.join(' ') || null);
          },
        });
      })}
    >
      <Stack gap="sm">
        <FormProblems messages={problem} />
        <TextInput label="E-mail address" type="email" autoComplete="email" required {...form.getInputProps('email')} />
        <Button type="submit" loading={forgot.isPending}>
          Send me a link
        </Button>
        <Anchor component={Link} to={paths.signIn} size="sm">
          Back to sign in
        </Anchor>
      </Stack>
    </form>
  );
}

export function ResetPasswordForm({ token }: { token: string | null }) {
  const reset = useResetPassword();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm({
    initialValues: { password: '', repeat: '' },
    validate: {
      password: (value) => (value.length >= PASSWORD_MIN ? null : `Use at least ${PASSWORD_MIN} characters`),
      repeat: (value, values) => (value === values.password ? null : 'The two passwords differ'),
    },
  });

  if (!token) {
    return <Alert color="red">This link is incomplete. Open it again from the e-mail, or ask for a new one.</Alert>;
  }
  if (reset.isSuccess) {
    return (
      <Stack gap="sm">
        <Alert color="patina" title="Password changed">
          {reset.data.message} Every browser that was signed in has been signed out.
        </Alert>
        <Button component={Link} to={paths.signIn}>
          Sign in
        </Button>
      </Stack>
    );
  }

  return (
    <form
      noValidate
      aria-label="Choose a new password"
      onSubmit={form.onSubmit(({ password }) => {
        setProblem(null);
        reset.mutate(
          { token, password },
          {
            onError: (error) => {
              const { fields, general } = splitApiErrors(error, { password: 'New password' });
              form.setErrors(fields);
              setProblem(general.join(' ') || null);
            },
          },
        );
      })}
    >
      <Stack gap="sm">
        {problem && (
          <Alert color="red" role="alert">
            {problem}{' '}
            <Anchor component={Link} to={paths.forgotPassword}>
              Ask for a new link
            </Anchor>
          </Alert>
        )}
        <PasswordInput label="New password" autoComplete="new-password" required {...form.getInputProps('password')} />
        <PasswordInput label="New password again" autoComplete="new-password" required {...form.getInputProps('repeat')} />
        <Button type="submit" loading={reset.isPending}>
          Save the new password
        </Button>
      </Stack>
    </form>
  );
}
