import { useSearchParams } from 'react-router-dom';
import { UnsubscribeView } from '@/features/follows/components/unsubscribe-view';
import { useReleasePageShell } from '@/lib/page-shell';

/** The link in every fit-news e-mail (?token=): for anyone, signed in or not. */
export function UnsubscribeRoute() {
  const [params] = useSearchParams();
  // The server's static first paint (title and a sentence) gives way as soon as the page itself draws.
  useReleasePageShell(true);
  return <UnsubscribeView token={params.get('token')} />;
}
