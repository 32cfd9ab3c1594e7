import { accountMailFooter } from '../auth/auth-mails';
import {
  ConflictException,
  ForbiddenException,
  GoneException,
  Inject,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import { DataSource, In, IsNull, Repository } from 'typeorm';
import type { AppConfig } from '../config/app-config';
import { hashSecretToken, newSecretToken } from '../common/secret-token';
import type { SessionUser, WorkshopMembership } from '../common/types/access-context';
import { MailOutbox } from '../outbox/mail-outbox.service';
import { normalizeEmail } from '../users/email-address';
import { User } from '../users/entities/user.entity';
import type { CreateInvitationDto } from './dto/members.dto';
import type { AcceptedInvitation, InvitationPreview, InvitationView } from './dto/workshop-views.dto';
import { Invitation } from './entities/invitation.entity';
import { InvitationOptOutsService } from './invitation-opt-outs.service';
import { WorkshopMember } from './entities/workshop-member.entity';
import { Workshop } from './entities/workshop.entity';
import { MembersService } from './members.service';
import { toInvitationView } from './workshops.mapper';

export const INVITATION_TTL_MS = 7 * 24 * 3600 * 1000;
const INVITATION_UNKNOWN = 'This invitation link is not valid. Ask the workshop owner for a new one.';

@Injectable()
export class InvitationsService {
  private readonly appOrigin: string;

  constructor(
    @InjectRepository(Invitation) private readonly invitations: Repository<Invitation>,
    @InjectRepository(Workshop) private readonly workshops: Repository<Workshop>,
    @InjectRepository(WorkshopMember) private readonly members: Repository<WorkshopMember>,
    @InjectRepository(User) private readonly users: Repository<User>,
    @Inject(MembersService) private readonly membersService: MembersService,
    @Inject(InvitationOptOutsService) private readonly optOuts: InvitationOptOutsService,
    @Inject(MailOutbox) private readonly mail: MailOutbox,
    @Inject(DataSource) private readonly dataSource: DataSource,
    @Inject(ConfigService) config: ConfigService<AppConfig, true>,
  ) {
    this.appOrigin = config.get('appOrigin', { infer: true });
  }

  /** Invitations not yet accepted (expired ones too, so the owner can see and resend them). */
  async listPending(workshopId: string): Promise<InvitationView[]> {
    const pending = await this.invitations.find({
      where: { workshopId, acceptedAt: IsNull() },
      order: { createdAt: 'DESC' },
    });
    const inviterIds = [...new Set(pending.flatMap((invitation) => (invitation.invitedBy ? [invitation.invitedBy] : [])))];
    const inviters = inviterIds.length ? await this.users.findBy({ id: In(inviterIds) }) : [];
    const names = new Map(inviters.map((user) => [user.id, user.displayName]));
    return pending.map((invitation) =>
      toInvitationView(invitation, invitation.invitedBy ? (names.get(invitation.invitedBy) ?? null) : null),
    );
  }

  /**
   * E-mails an invitation link (valid 7 days). Inviting the same address again replaces the earlier link.
   * An address that stopped invitations (the link in every invitation mail) is refused with 409 and sent nothing.
   */
  async invite(membership: WorkshopMembership, inviter: SessionUser, dto: CreateInvitationDto): Promise<InvitationView> {
    const email = normalizeEmail(dto.email);
    const workshop = await this.workshops.findOneByOrFail({ id: membership.workshopId });
    const existingUser = await this.users.findOneBy({ email });
    if (existingUser && (await this.members.existsBy({ workshopId: workshop.id, userId: existingUser.id }))) {
      const message = 'This person is already a member of the workshop';
      throw new ConflictException({ message, code: 'already_member', errors: { email: message } });
    }
    const token = newSecretToken();
    const invitation = this.invitations.create({
      workshopId: workshop.id,
      email,
      role: dto.role,
      tokenHash: hashSecretToken(token),
      expiresAt: new Date(Date.now() + INVITATION_TTL_MS),
      acceptedAt: null,
      acceptedBy: null,
      invitedBy: inviter.id,
    });
    const url = `${this.appOrigin}/invitations/accept?token=${encodeURIComponent(token)}`;
    const roleWords = dto.role === 'owner' ? 'an owner' : 'an editor';
    // The invitation and its mail commit together: no invitation without its mail, no mail for a rolled-back one.
    await this.dataSource.transaction(async (manager) => {
      await this.optOuts.refuseIfStopped(email, manager);
      const stopUrl = `${this.appOrigin}/invitations/stop?token=${encodeURIComponent(await this.optOuts.newLink(email, manager))}`;
      await manager.delete(Invitation, { workshopId: workshop.id, email, acceptedAt: IsNull() });
      await manager.insert(Invitation, invitation);
      await this.mail.send(
        {
          kind: 'invitation',
          idempotencyKey: `invitation:${invitation.id}`,
          mail: {
            to: email,
            subject: `${inviter.displayName} invited you to ${workshop.name} on Fitwright`,
            text: [
              `${inviter.displayName} invited you to join the workshop "${workshop.name}" on Fitwright as ${roleWords}.`,
              `Accept the invitation (the link works for 7 days): ${url}`,
              `If you have no Fitwright account yet, create one with this address (${email}) and then accept.`,
              // Transactional, not a list: it says why it came and where mail is managed instead of offering an unsubscribe.
              ...accountMailFooter(
                `${inviter.displayName} entered this address to invite you to "${workshop.name}". An invitation comes only when a workshop member sends one; if you do not want it, ignore it and it lapses in 7 days.`,
                `${this.appOrigin}/account`,
              ),
              `Do not want invitations to this address from anyone on Fitwright? Stop them here, no account needed (you can allow them again on the same page): ${stopUrl}`,
              '— Fitwright',
            ].join('\n\n'),
          },
        },
        manager,
      );
    });
    const saved = await this.invitations.findOneByOrFail({ id: invitation.id });
    return toInvitationView(saved, inviter.displayName);
  }

  async revoke(workshopId: string, invitationId: string): Promise<void> {
    const result = await this.invitations.delete({ id: invitationId, workshopId, acceptedAt: IsNull() });
    if (!result.affected) throw new NotFoundException({ message: 'Invitation not found', code: 'invitation_not_found' });
  }

  /** What the link shows: whose workshop, which role, for which address. */
  async preview(token: string): Promise<InvitationPreview> {
    const invitation = await this.findByToken(token);
    const workshop = await this.workshops.findOneBy({ id: invitation.workshopId });
    if (!workshop) throw new NotFoundException({ message: INVITATION_UNKNOWN, code: 'invitation_not_found' });
    const inviter = invitation.invitedBy ? await this.users.findOneBy({ id: invitation.invitedBy }) : null;
    const status = invitation.acceptedAt ? 'accepted' : invitation.expiresAt.getTime() <= Date.now() ? 'expired' : 'pending';
    return {
      workshop: { id: workshop.id, name: workshop.name, slug: workshop.slug },
      email: invitation.email,
      role: invitation.role,
      invitedBy: inviter?.displayName ?? null,
      expiresAt: invitation.expiresAt.toISOString(),
      status,
    };
  }

  /**
   * Joins the signed-in user to the workshop. The account's address must be the invited one; following
   * the link proves that the user reads that mailbox, so it also confirms the address.
   */
  async accept(user: SessionUser, token: string): Promise<AcceptedInvitation> {
    const invitation = await this.findByToken(token);
    if (invitation.acceptedAt) {
      if (invitation.acceptedBy === user.id) return { workshopId: invitation.workshopId, role: invitation.role };
      throw new GoneException({ message: 'This invitation has already been used.', code: 'invitation_used' });
    }
    if (invitation.expiresAt.getTime() <= Date.now()) {
      throw new GoneException({
        message: 'This invitation has expired. Ask the workshop owner to invite you again.',
        code: 'invitation_expired',
      });
    }
    if (invitation.email !== user.email) {
      throw new ForbiddenException({
        message: `This invitation was sent to ${invitation.email}. Sign in with that address to accept it.`,
        code: 'invitation_other_address',
      });
    }
    let role = invitation.role;
    await this.dataSource.transaction(async (manager) => {
      const claimed = await manager.update(
        Invitation,
        { id: invitation.id, acceptedAt: IsNull() },
        { acceptedAt: new Date(), acceptedBy: user.id },
      );
      if (claimed.affected !== 1) {
        throw new GoneException({ message: 'This invitation has already been used.', code: 'invitation_used' });
      }
      role = await this.membersService.join(manager, invitation.workshopId, user.id, invitation.role);
      if (!user.emailVerified) {
        await manager.update(User, { id: user.id, emailVerifiedAt: IsNull() }, { emailVerifiedAt: new Date() });
      }
    });
    return { workshopId: invitation.workshopId, role };
  }

  private async findByToken(token: string): Promise<Invitation> {
    const invitation = await this.invitations.findOneBy({ tokenHash: hashSecretToken(token) });
    if (!invitation) throw new NotFoundException({ message: INVITATION_UNKNOWN, code: 'invitation_not_found' });
    return invitation;
  }
}
