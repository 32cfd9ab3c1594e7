import { useSearchParams } from 'react-router-dom';
import { UnsubscribeView } from '@/features/follows/components/unsubscribe-view';

/** The link in every fit-news e-mail (?token=): for anyone, signed in or not. */
export function UnsubscribeRoute() {
  const [params] = useSearchParams();
  return <UnsubscribeView token={params.get('token')} />;
}
