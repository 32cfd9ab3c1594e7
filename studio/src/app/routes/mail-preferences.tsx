import { useSearchParams } from 'react-router-dom';
import { MailPreferencesPage } from '@/features/follows/components/mail-preferences-page';

/** The preferences link in every mail (?token=): for anyone, signed in or not. */
export function MailPreferencesRoute() {
  const [params] = useSearchParams();
  return <MailPreferencesPage token={params.get('token')} />;
}
