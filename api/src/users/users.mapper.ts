import type { SessionUser } from '../common/types/access-context';
import type { User } from './entities/user.entity';

export function toSessionUser(user: User): SessionUser {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    isAdmin: user.isAdmin,
    preferredUnits: user.preferredUnits,
    emailVerified: user.emailVerifiedAt !== null,
  };
}

/** How a site admin sees an account. */
export interface AdminUserView extends SessionUser {
  disabled: boolean;
  createdAt: string;
}

export function toAdminUserView(user: User): AdminUserView {
  return {
    ...toSessionUser(user),
    disabled: user.disabledAt !== null,
    createdAt: user.createdAt.toISOString(),
  };
}
