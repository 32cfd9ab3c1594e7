import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import type { MemberRole } from '../common/types/access-context';
import { WorkshopMember } from './entities/workshop-member.entity';
import { Workshop } from './entities/workshop.entity';

export interface WorkshopAccess {
  disabled: boolean;
  /** null: the user is not a member. */
  role: MemberRole | null;
}

/** What the access guard asks on every workshop route: does it exist, and what is this user's role? */
@Injectable()
export class MembershipService {
  constructor(@InjectRepository(Workshop) private readonly workshops: Repository<Workshop>) {}

  /** One indexed query; null when the workshop does not exist. */
  async access(workshopId: string, userId: string): Promise<WorkshopAccess | null> {
    const row = await this.workshops
      .createQueryBuilder('workshop')
      .leftJoin(WorkshopMember, 'member', 'member.workshop_id = workshop.id AND member.user_id = :userId', { userId })
      .select(['workshop.disabled_at AS disabledAt', 'member.role AS role'])
      .where('workshop.id = :workshopId', { workshopId })
      .getRawOne<{ disabledAt: Date | null; role: MemberRole | null }>();
    if (!row) return null;
    return { disabled: row.disabledAt !== null, role: row.role ?? null };
  }
}
