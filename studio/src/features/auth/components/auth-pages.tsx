import { Anchor, Text } from '@mantine/core';
import { Link, Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { safeNextPath, useSession } from '@/lib/session';
import { AuthCard } from './auth-card';
import { ConfirmEmailChangeView, VerifyEmailView } from './email-link-views';
import { ForgotPasswordForm, ResetPasswordForm } from './password-forms';
import { SignInForm } from './sign-in-form';
import { SignUpForm } from './sign-up-form';

export function SignInPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const { user } = useSession();
  const next = params.get('next') ?? undefined;
  const destination = safeNextPath(next, paths.workshops);
  if (user) return <Navigate to={destination} replace />;
  return (
    <AuthCard title="Sign in" subtitle="Welcome back to your workshop.">
      <SignInForm next={next} onSignedIn={() => navigate(destination, { replace: true })} />
    </AuthCard>
  );
}

export function SignUpPage() {
  const [params] = useSearchParams();
  const next = params.get('next') ?? undefined;
  return (
    <AuthCard
      title="Create your account"
      subtitle="Record your fits, publish your build guides, follow the workshops you trust."
    >
      <SignUpForm next={next} initialEmail={params.get('email') ?? ''} />
    </AuthCard>
  );
}

export function VerifyEmailPage() {
  const [params] = useSearchParams();
  return (
    <AuthCard title="Confirm your e-mail address">
      <VerifyEmailView token={params.get('token')} />
    </AuthCard>
  );
}

export function ConfirmEmailPage() {
  const [params] = useSearchParams();
  return (
    <AuthCard title="Confirm your new e-mail address">
      <ConfirmEmailChangeView token={params.get('token')} />
    </AuthCard>
  );
}

export function ForgotPasswordPage() {
  return (
    <AuthCard title="Forgot your password?" subtitle="We will e-mail you a link to choose a new one.">
      <ForgotPasswordForm />
    </AuthCard>
  );
}

export function ResetPasswordPage() {
  const [params] = useSearchParams();
  return (
    <AuthCard
      title="Choose a new password"
      subtitle={
        <Text span size="sm">
          Remembered it?{' '}
          <Anchor component={Link} to={paths.signIn} size="sm">
            Sign in
          </Anchor>
        </Text>
      }
    >
      <ResetPasswordForm token={params.get('token')} />
    </AuthCard>
  );
}
