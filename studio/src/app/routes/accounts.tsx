import { Stack } from '@mantine/core';
import { useSearchParams } from 'react-router-dom';
import { AccountSettings } from '@/features/auth/components/account-settings';
import {
  ConfirmEmailPage,
  ForgotPasswordPage,
  ResetPasswordPage,
  SignInPage,
  SignUpPage,
  VerifyEmailPage,
} from '@/features/auth/components/auth-pages';
import { MyFitReports } from '@/features/fit-reports/components/my-fit-reports';
import { FollowingSection } from '@/features/follows/components/following-section';
import { MailPreferencesSection } from '@/features/follows/components/mail-preferences-page';
import { AcceptInvitationPage } from '@/features/workshops/components/accept-invitation';

export const SignInRoute = SignInPage;
export const SignUpRoute = SignUpPage;
export const VerifyEmailRoute = VerifyEmailPage;
export const ConfirmEmailRoute = ConfirmEmailPage;
export const ForgotPasswordRoute = ForgotPasswordPage;
export const ResetPasswordRoute = ResetPasswordPage;

/** Account settings, then what the person follows, how its mail comes, and the fit reports they sent (composed here: features do not import each other). */
export function AccountRoute() {
  return (
    <Stack maw={640} gap="lg">
      <AccountSettings />
      <FollowingSection />
      <MailPreferencesSection />
      <MyFitReports />
    </Stack>
  );
}

export function AcceptInvitationRoute() {
  const [params] = useSearchParams();
  return <AcceptInvitationPage token={params.get('token')} />;
}
