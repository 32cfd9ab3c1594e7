import { ConflictException, Inject, Injectable, Logger, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Brackets, In, Repository } from 'typeorm';
import { SessionService } from '../auth/session.service';
import type { SessionUser } from '../common/types/access-context';
import { User } from '../users/entities/user.entity';
import { toAdminUserView } from '../users/users.mapper';
import { WorkshopMember } from '../workshops/entities/workshop-member.entity';
import { Workshop } from '../workshops/entities/workshop.entity';
import type { AdminSearchDto, AdminUserPageDto, AdminWorkshopPageDto } from './dto/admin.dto';

const PAGE_SIZE = 50;

/** LIKE wildcards in a search are literal characters. */
function likePattern(search: string): string {
  return `%${search.replace(/[\\%_]/g, (char) => `\\${char}`)}%`;
}

@Injectable()
export class AdminService {
  private readonly logger = new Logger(AdminService.name);

  constructor(
    @InjectRepository(User) private readonly users: Repository<User>,
    @InjectRepository(Workshop) private readonly workshops: Repository<Workshop>,
    @InjectRepository(WorkshopMember) private readonly members: Repository<WorkshopMember>,
    @Inject(SessionService) private readonly sessions: SessionService,
  ) {}

  async listUsers(query: AdminSearchDto): Promise<AdminUserPageDto> {
    const page = query.page ?? 1;
    const builder = this.users.createQueryBuilder('user').orderBy('user.created_at', 'DESC');
    if (query.search) {
      const pattern = likePattern(query.search.toLowerCase());
      builder.where(
        new Brackets((where) =>
          where.where('user.email LIKE :pattern', { pattern }).orWhere('LOWER(user.display_name) LIKE :pattern', { pattern }),
        ),
      );
    }
    const [users, total] = await builder
      .skip((page - 1) * PAGE_SIZE)
      .take(PAGE_SIZE)
      .getManyAndCount();
    return { items: users.map(toAdminUserView), total, page, pageSize: PAGE_SIZE };
  }

  /** A disabled user cannot sign in, and every session of theirs stops working at once. */
  async setUserDisabled(admin: SessionUser, userId: string, disabled: boolean): Promise<void> {
    if (disabled && userId === admin.id) {
      throw new ConflictException({ message: 'You cannot disable your own account.', code: 'disable_self' });
    }
    const user = await this.users.findOneBy({ id: userId });
    if (!user) throw new NotFoundException({ message: 'User not found', code: 'user_not_found' });
    user.disabledAt = disabled ? (user.disabledAt ?? new Date()) : null;
    await this.users.save(user);
    if (disabled) await this.sessions.endAllFor(user.id);
    this.logger.log(`admin ${admin.id} ${disabled ? 'disabled' : 'enabled'} user ${user.id}`);
  }

  async listWorkshops(query: AdminSearchDto): Promise<AdminWorkshopPageDto> {
    const page = query.page ?? 1;
    const builder = this.workshops.createQueryBuilder('workshop').orderBy('workshop.created_at', 'DESC');
    if (query.search) {
      const pattern = likePattern(query.search.toLowerCase());
      builder.where(
        new Brackets((where) =>
          where.where('LOWER(workshop.name) LIKE :pattern', { pattern }).orWhere('workshop.slug LIKE :pattern', { pattern }),
        ),
      );
    }
    const [workshops, total] = await builder
      .skip((page - 1) * PAGE_SIZE)
      .take(PAGE_SIZE)
      .getManyAndCount();
    const ids = workshops.map((workshop) => workshop.id);
    const members = ids.length ? await this.members.findBy({ workshopId: In(ids) }) : [];
    const ownerIds = [...new Set(members.filter((member) => member.role === 'owner').map((member) => member.userId))];
    const ownerUsers = ownerIds.length ? await this.users.findBy({ id: In(ownerIds) }) : [];
    const names = new Map(ownerUsers.map((user) => [user.id, `${user.displayName} <${user.email}>`]));
    return {
      items: workshops.map((workshop) => {
        const ofWorkshop = members.filter((member) => member.workshopId === workshop.id);
        return {
          id: workshop.id,
          slug: workshop.slug,
          name: workshop.name,
          disabled: workshop.disabledAt !== null,
          memberCount: ofWorkshop.length,
          owners: ofWorkshop.filter((member) => member.role === 'owner').map((member) => names.get(member.userId) ?? member.userId),
          createdAt: workshop.createdAt.toISOString(),
        };
      }),
      total,
      page,
      pageSize: PAGE_SIZE,
    };
  }

  /** A disabled workshop stays readable by its members and admins; nobody can change it. */
  async setWorkshopDisabled(admin: SessionUser, workshopId: string, disabled: boolean): Promise<void> {
    const workshop = await this.workshops.findOneBy({ id: workshopId });
    if (!workshop) throw new NotFoundException({ message: 'Workshop not found', code: 'workshop_missing' });
    workshop.disabledAt = disabled ? (workshop.disabledAt ?? new Date()) : null;
    await this.workshops.save(workshop);
    this.logger.log(`admin ${admin.id} ${disabled ? 'disabled' : 'enabled'} workshop ${workshop.id}`);
  }
}
