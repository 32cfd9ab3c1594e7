import {
  ConflictException,
  ForbiddenException,
  Inject,
  Injectable,
  Logger,
  NotFoundException,
  UnprocessableEntityException,
} from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { DataSource, In, IsNull, Repository } from 'typeorm';
import type { SessionUser, WorkshopMembership } from '../common/types/access-context';
import { StorageService } from '../infra/storage/storage.service';
import type { CreateWorkshopDto, UpdateWorkshopDto } from './dto/workshop.dto';
import type { WorkshopView } from './dto/workshop-views.dto';
import { WorkshopMember } from './entities/workshop-member.entity';
import { Workshop } from './entities/workshop.entity';
import { requireImage, type UploadedFileLike } from '../common/uploads/image-file';

/** Logos are small: a header image, not a photo. */
export const LOGO_MAX_BYTES = 2 * 1024 * 1024;
import { toWorkshopView } from './workshops.mapper';
import { isDuplicateKey } from '../common/database/errors';

const SLUG_TAKEN = 'That web address is taken; choose another';

@Injectable()
export class WorkshopsService {
  private readonly logger = new Logger(WorkshopsService.name);

  constructor(
    @InjectRepository(Workshop) private readonly workshops: Repository<Workshop>,
    @InjectRepository(WorkshopMember) private readonly members: Repository<WorkshopMember>,
    @Inject(DataSource) private readonly dataSource: DataSource,
    @Inject(StorageService) private readonly storage: StorageService,
  ) {}

  /** The creator becomes the owner, in the same transaction. */
  async create(user: SessionUser, dto: CreateWorkshopDto): Promise<WorkshopView> {
    if (!user.emailVerified) {
      throw new ForbiddenException({
        message: 'Confirm your e-mail address before you create a workshop.',
        code: 'email_unverified',
      });
    }
    const workshop = this.workshops.create({
      name: dto.name,
      slug: dto.slug,
      description: dto.description ?? '',
      logoKey: null,
      disabledAt: null,
    });
    try {
      await this.dataSource.transaction(async (manager) => {
        await manager.insert(Workshop, workshop);
        const owner = manager.create(WorkshopMember, { workshopId: workshop.id, userId: user.id, role: 'owner' });
        await manager.insert(WorkshopMember, owner);
      });
    } catch (error) {
      if (isDuplicateKey(error)) throw new ConflictException({ message: SLUG_TAKEN, errors: { slug: SLUG_TAKEN } });
      throw error;
    }
    return this.get(workshop.id, 'owner');
  }

  /** The caller's workshops, oldest membership first. */
  async listFor(userId: string): Promise<WorkshopView[]> {
    const memberships = await this.members.find({ where: { userId }, order: { createdAt: 'ASC' } });
    if (memberships.length === 0) return [];
    const workshops = await this.workshops.findBy({ id: In(memberships.map((membership) => membership.workshopId)) });
    const byId = new Map(workshops.map((workshop) => [workshop.id, workshop]));
    const views: WorkshopView[] = [];
    for (const membership of memberships) {
      const workshop = byId.get(membership.workshopId);
      if (workshop) views.push(toWorkshopView(workshop, membership.role, await this.logoUrl(workshop)));
    }
    return views;
  }

  /** A workshop that is not disabled, by its slug (public pages and what readers send through them). */
  activeBySlug(slug: string): Promise<Workshop | null> {
    return this.workshops.findOneBy({ slug, disabledAt: IsNull() });
  }

  /** Workshops by id (for lists in other domains that name them); unknown ids are simply absent. */
  byIds(ids: string[]): Promise<Workshop[]> {
    return this.workshops.findBy({ id: In(ids) });
  }

  async get(workshopId: string, role: WorkshopMembership['role'] | null): Promise<WorkshopView> {
    const workshop = await this.getEntity(workshopId);
    return toWorkshopView(workshop, role, await this.logoUrl(workshop));
  }

  async update(membership: WorkshopMembership, dto: UpdateWorkshopDto): Promise<WorkshopView> {
    const workshop = await this.getEntity(membership.workshopId);
    if (dto.name !== undefined) workshop.name = dto.name;
    if (dto.slug !== undefined) workshop.slug = dto.slug;
    if (dto.description !== undefined) workshop.description = dto.description;
    if (dto.showMemberNames !== undefined) workshop.showMemberNames = dto.showMemberNames;
    try {
      await this.workshops.save(workshop);
    } catch (error) {
      if (isDuplicateKey(error)) throw new ConflictException({ message: SLUG_TAKEN, errors: { slug: SLUG_TAKEN } });
      throw error;
    }
    return this.get(workshop.id, membership.role);
  }

  /** Stores a new logo (PNG, JPEG or WebP, checked by content, at most 2 MB) and deletes the old one. */
  async setLogo(membership: WorkshopMembership, file: UploadedFileLike | undefined): Promise<WorkshopView> {
    const image = requireImage(file, { field: 'logo', what: 'The logo', maxBytes: LOGO_MAX_BYTES });
    const workshop = await this.getEntity(membership.workshopId);
    const previous = workshop.logoKey;
    const key = `workshops/${workshop.id}/logo-${randomUUID()}.${image.extension}`;
    await this.storage.putObject(key, image.bytes, image.contentType);
    workshop.logoKey = key;
    await this.workshops.save(workshop);
    if (previous) await this.deleteQuietly(previous);
    return this.get(workshop.id, membership.role);
  }

  async removeLogo(membership: WorkshopMembership): Promise<void> {
    const workshop = await this.getEntity(membership.workshopId);
    if (!workshop.logoKey) return;
    const previous = workshop.logoKey;
    workshop.logoKey = null;
    await this.workshops.save(workshop);
    await this.deleteQuietly(previous);
  }

  /**
   * Deletes the workshop; the database cascades to everything that belongs to it, then its stored files
   * (all under workshops/<id>/) are removed. Typing the name again guards against the wrong tab.
   */
  async remove(membership: WorkshopMembership, confirmName: string): Promise<void> {
    const workshop = await this.getEntity(membership.workshopId);
    if (confirmName.trim() !== workshop.name) {
      throw new UnprocessableEntityException({
        message: `Type the workshop's name, ${workshop.name}, to delete it.`,
        errors: { confirmName: 'does not match the workshop’s name' },
      });
    }
    await this.workshops.delete({ id: workshop.id });
    try {
      const files = await this.storage.deletePrefix(`workshops/${workshop.id}/`);
      this.logger.log(`workshop ${workshop.id} deleted with ${files} stored file(s)`);
    } catch (error) {
      // The rows are gone already; leftover files are unreachable and a bucket lifecycle rule can sweep them.
      this.logger.warn(`workshop ${workshop.id} deleted; its files could not all be removed: ${error instanceof Error ? error.message : String(error)}`);
    }
  }

  private async getEntity(workshopId: string): Promise<Workshop> {
    const workshop = await this.workshops.findOneBy({ id: workshopId });
    if (!workshop) throw new NotFoundException({ message: 'Workshop not found', code: 'workshop_not_found' });
    return workshop;
  }

  private async logoUrl(workshop: Workshop): Promise<string | null> {
    return workshop.logoKey ? this.storage.presignedGetUrl(workshop.logoKey) : null;
  }

  /** An orphaned object costs little; a failed request because of it would cost more. */
  private async deleteQuietly(key: string): Promise<void> {
    try {
      await this.storage.deleteObject(key);
    } catch (error) {
      this.logger.warn(`could not delete ${key}: ${error instanceof Error ? error.message : String(error)}`);
    }
  }
}
