import { BadRequestException, ConflictException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { DataSource, EntityManager, In, Repository } from 'typeorm';
import type { MemberRole, WorkshopMembership } from '../common/types/access-context';
import { User } from '../users/entities/user.entity';
import type { MemberView } from './dto/workshop-views.dto';
import { WorkshopMember } from './entities/workshop-member.entity';
import { toMemberView } from './workshops.mapper';

const LAST_OWNER = 'A workshop needs at least one owner: make another member owner first.';

/**
 * Roles within a workshop. Every change that could leave a workshop without an owner runs in a
 * transaction that locks the workshop's member rows, so two owners cannot both step down at once.
 */
@Injectable()
export class MembersService {
  constructor(
    @InjectRepository(WorkshopMember) private readonly members: Repository<WorkshopMember>,
    @InjectRepository(User) private readonly users: Repository<User>,
    @Inject(DataSource) private readonly dataSource: DataSource,
  ) {}

  async list(workshopId: string): Promise<MemberView[]> {
    const members = await this.members.find({ where: { workshopId }, order: { createdAt: 'ASC' } });
    if (members.length === 0) return [];
    const users = await this.users.findBy({ id: In(members.map((member) => member.userId)) });
    const byId = new Map(users.map((user) => [user.id, user]));
    return members.flatMap((member) => {
      const user = byId.get(member.userId);
      return user ? [toMemberView(member, user)] : [];
    });
  }

  async changeRole(workshopId: string, userId: string, role: MemberRole): Promise<MemberView> {
    await this.withLockedMembers(workshopId, async (manager, members) => {
      const target = this.find(members, userId);
      if (target.role === role) return;
      if (target.role === 'owner' && this.ownerCount(members) === 1) {
        throw new ConflictException({ message: LAST_OWNER, code: 'last_owner' });
      }
      await manager.update(WorkshopMember, { id: target.id }, { role });
    });
    return this.view(workshopId, userId);
  }

  async remove(workshopId: string, userId: string): Promise<void> {
    await this.withLockedMembers(workshopId, async (manager, members) => {
      const target = this.find(members, userId);
      if (target.role === 'owner' && this.ownerCount(members) === 1) {
        throw new ConflictException({ message: LAST_OWNER, code: 'last_owner' });
      }
      await manager.delete(WorkshopMember, { id: target.id });
    });
  }

  /** The chosen member becomes owner and the caller an editor. */
  async transferOwnership(membership: WorkshopMembership, newOwnerId: string): Promise<MemberView[]> {
    if (newOwnerId === membership.userId) {
      throw new BadRequestException({ message: 'You already own this workshop; choose another member.' });
    }
    await this.withLockedMembers(membership.workshopId, async (manager, members) => {
      const target = this.find(members, newOwnerId);
      const caller = this.find(members, membership.userId);
      await manager.update(WorkshopMember, { id: target.id }, { role: 'owner' });
      await manager.update(WorkshopMember, { id: caller.id }, { role: 'editor' });
    });
    return this.list(membership.workshopId);
  }

  async leave(membership: WorkshopMembership): Promise<void> {
    await this.withLockedMembers(membership.workshopId, async (manager, members) => {
      const me = this.find(members, membership.userId);
      if (me.role === 'owner' && this.ownerCount(members) === 1) {
        throw new ConflictException({
          message: 'You are the only owner: transfer ownership to another member before you leave.',
          code: 'last_owner',
        });
      }
      await manager.delete(WorkshopMember, { id: me.id });
    });
  }

  /** Adds a member, or raises an editor to owner; never lowers a role. Runs inside the caller's transaction. */
  async join(manager: EntityManager, workshopId: string, userId: string, role: MemberRole): Promise<MemberRole> {
    const existing = await manager.findOne(WorkshopMember, { where: { workshopId, userId }, lock: { mode: 'pessimistic_write' } });
    if (!existing) {
      await manager.insert(WorkshopMember, manager.create(WorkshopMember, { workshopId, userId, role }));
      return role;
    }
    if (existing.role === 'editor' && role === 'owner') {
      await manager.update(WorkshopMember, { id: existing.id }, { role });
      return role;
    }
    return existing.role;
  }

  private async withLockedMembers(
    workshopId: string,
    work: (manager: EntityManager, members: WorkshopMember[]) => Promise<void>,
  ): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const members = await manager.find(WorkshopMember, {
        where: { workshopId },
        lock: { mode: 'pessimistic_write' },
      });
      await work(manager, members);
    });
  }

  private find(members: WorkshopMember[], userId: string): WorkshopMember {
    const member = members.find((candidate) => candidate.userId === userId);
    if (!member) throw new NotFoundException({ message: 'Member not found', code: 'member_not_found' });
    return member;
  }

  private ownerCount(members: WorkshopMember[]): number {
    return members.filter((member) => member.role === 'owner').length;
  }

  private async view(workshopId: string, userId: string): Promise<MemberView> {
    const found = (await this.list(workshopId)).find((member) => member.userId === userId);
    if (!found) throw new NotFoundException({ message: 'Member not found', code: 'member_not_found' });
    return found;
  }
}
