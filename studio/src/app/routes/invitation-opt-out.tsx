import { useSearchParams } from 'react-router-dom';
import { InvitationOptOutPage } from '@/features/workshops/components/invitation-opt-out-page';

/** The "stop invitations" link in every invitation mail (?token=): for anyone, signed in or not. */
export function InvitationOptOutRoute() {
  const [params] = useSearchParams();
  return <InvitationOptOutPage token={params.get('token')} />;
}
