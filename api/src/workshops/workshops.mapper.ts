import type { MemberRole } from '../common/types/access-context';
import type { User } from '../users/entities/user.entity';
import type { InvitationView, MemberView, WorkshopView } from './dto/workshop-views.dto';
import type { Invitation } from './entities/invitation.entity';
import type { WorkshopMember } from './entities/workshop-member.entity';
import type { Workshop } from './entities/workshop.entity';

export function toWorkshopView(
  workshop: Workshop,
  role: MemberRole | 'admin' | null,
  logoUrl: string | null,
): WorkshopView {
  return {
    id: workshop.id,
    slug: workshop.slug,
    name: workshop.name,
    description: workshop.description,
    logoUrl,
    disabled: workshop.disabledAt !== null,
    showMemberNames: workshop.showMemberNames,
    role,
    createdAt: workshop.createdAt.toISOString(),
  };
}

export function toMemberView(member: WorkshopMember, user: User): MemberView {
  return {
    userId: member.userId,
    displayName: user.displayName,
    email: user.email,
    role: member.role,
    joinedAt: member.createdAt.toISOString(),
  };
}

export function toInvitationView(invitation: Invitation, inviterName: string | null, now = new Date()): InvitationView {
  return {
    id: invitation.id,
    email: invitation.email,
    role: invitation.role,
    expiresAt: invitation.expiresAt.toISOString(),
    expired: invitation.expiresAt.getTime() <= now.getTime(),
    invitedBy: inviterName,
    createdAt: invitation.createdAt.toISOString(),
  };
}
