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
import { AcceptInvitationPage } from '@/features/workshops/components/accept-invitation';

export const SignInRoute = SignInPage;
export const SignUpRoute = SignUpPage;
export const VerifyEmailRoute = VerifyEmailPage;
export const ConfirmEmailRoute = ConfirmEmailPage;
export const ForgotPasswordRoute = ForgotPasswordPage;
export const ResetPasswordRoute = ResetPasswordPage;
export const AccountRoute = AccountSettings;

export function AcceptInvitationRoute() {
  const [params] = useSearchParams();
  return <AcceptInvitationPage token={params.get('token')} />;
}
