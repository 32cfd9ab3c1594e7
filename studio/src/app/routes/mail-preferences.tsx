import { useSearchParams } from 'react-router-dom';
import { MailPreferencesPage } from '@/features/follows/components/mail-preferences-page';
import { useReleasePageShell } from '@/lib/page-shell';

/** The preferences link in every mail (?token=): for anyone, signed in or not. */
export function MailPreferencesRoute() {
  const [params] = useSearchParams();
  // The server's static first paint (title and a sentence) gives way as soon as the page itself draws.
  useReleasePageShell(true);
  return <MailPreferencesPage token={params.get('token')} />;
}
