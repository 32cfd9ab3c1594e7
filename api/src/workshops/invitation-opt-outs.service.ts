import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { EntityManager, Repository } from 'typeorm';
import { newId } from '../common/database/columns';
import { hashSecretToken, newSecretToken } from '../common/secret-token';
import type { InvitationOptOutView } from './dto/invitation-opt-out.dto';
import { InvitationOptOut, InvitationOptOutLink } from './entities/invitation-opt-out.entity';

const LINK_UNKNOWN = 'We do not know this link. Open it again from the invitation e-mail, or copy the whole address.';
export const INVITATIONS_STOPPED_MESSAGE = 'This address has asked not to receive invitations. Nothing was sent.';

/** An address's own "no more invitations", set and undone from the link in any invitation mail to it. */
@Injectable()
export class InvitationOptOutsService {
  constructor(
    @InjectRepository(InvitationOptOut) private readonly optOuts: Repository<InvitationOptOut>,
    @InjectRepository(InvitationOptOutLink) private readonly links: Repository<InvitationOptOutLink>,
  ) {}

  /** Refuses an invitation to an address that stopped them (409 naming the field), before anything is written. */
  async refuseIfStopped(email: string, manager: EntityManager): Promise<void> {
    if (await manager.existsBy(InvitationOptOut, { email })) {
      throw new ConflictException({ message: INVITATIONS_STOPPED_MESSAGE, code: 'invitations_stopped', errors: { email: INVITATIONS_STOPPED_MESSAGE } });
    }
  }

  /** A fresh link for one invitation mail, stored in the invitation's transaction. Returns the token. */
  async newLink(email: string, manager: EntityManager): Promise<string> {
    const token = newSecretToken();
    await manager.insert(InvitationOptOutLink, { id: newId(), email, tokenHash: hashSecretToken(token) });
    return token;
  }

  async view(token: string): Promise<InvitationOptOutView> {
    return this.describe((await this.linkFor(token)).email);
  }

  /** Stops or allows invitations to the link's address; repeating either is harmless. */
  async set(token: string, stopped: boolean): Promise<InvitationOptOutView> {
    const { email } = await this.linkFor(token);
    if (stopped) await this.optOuts.createQueryBuilder().insert().into(InvitationOptOut).values({ id: newId(), email }).orIgnore().execute();
    else await this.optOuts.delete({ email });
    return this.describe(email);
  }

  private async linkFor(token: string): Promise<InvitationOptOutLink> {
    const link = await this.links.findOneBy({ tokenHash: hashSecretToken(token) });
    if (!link) throw new NotFoundException({ message: LINK_UNKNOWN, code: 'invitation_opt_out_link_unknown' });
    return link;
  }

  private async describe(email: string): Promise<InvitationOptOutView> {
    const optOut = await this.optOuts.findOneBy({ email });
    return { email, stopped: optOut !== null, stoppedSince: optOut?.createdAt.toISOString() ?? null };
  }
}
