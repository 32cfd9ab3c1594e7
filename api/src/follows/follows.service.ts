import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { In, IsNull, Not, Repository } from 'typeorm';
import { Assembly } from '../assemblies/entities/assembly.entity';
import { Build } from '../builds/entities/build.entity';
import { isDuplicateKey } from '../common/database/errors';
import { hashSecretToken } from '../common/secret-token';
import { Guide } from '../guides/entities/guide.entity';
import { WorkshopMember } from '../workshops/entities/workshop-member.entity';
import { Workshop } from '../workshops/entities/workshop.entity';
import { FitNewsDelivery } from './entities/fit-news-delivery.entity';
import { Follow, type FollowTargetKind } from './entities/follow.entity';

export interface FollowTarget {
  kind: FollowTargetKind;
  id: string;
  workshopId: string;
  label: string;
}

const NOTHING_TO_FOLLOW = 'Nothing to follow here';

/**
 * Who follows what. Anyone signed in may follow what a published guide shows (its workshop, build
 * or assembly) and members may follow their own workshop's things; nothing else is visible to follow.
 */
@Injectable()
export class FollowsService {
  constructor(
    @InjectRepository(Follow) private readonly follows: Repository<Follow>,
    @InjectRepository(FitNewsDelivery) private readonly deliveries: Repository<FitNewsDelivery>,
    @InjectRepository(Workshop) private readonly workshops: Repository<Workshop>,
    @InjectRepository(Build) private readonly builds: Repository<Build>,
    @InjectRepository(Assembly) private readonly assemblies: Repository<Assembly>,
    @InjectRepository(Guide) private readonly guides: Repository<Guide>,
    @InjectRepository(WorkshopMember) private readonly members: Repository<WorkshopMember>,
  ) {}

  async list(userId: string) {
    const follows = await this.follows.find({ where: { userId }, order: { createdAt: 'DESC' } });
    return this.describe(follows);
  }

  /** Following twice gives back the first follow; `created` says which happened. */
  async follow(userId: string, kind: FollowTargetKind, targetId: string) {
    const target = await this.target(kind, targetId);
    if (!target || !(await this.mayFollow(userId, target))) {
      throw new NotFoundException({ message: NOTHING_TO_FOLLOW, errors: { targetId: NOTHING_TO_FOLLOW }, code: 'reference_not_found' });
    }
    const existing = await this.follows.findOneBy({ userId, targetKind: kind, targetId });
    if (existing) return { follow: (await this.describe([existing]))[0], created: false };
    try {
      const saved = await this.follows.save(this.follows.create({ userId, workshopId: target.workshopId, targetKind: kind, targetId }));
      return { follow: (await this.describe([saved]))[0], created: true };
    } catch (error) {
      if (!isDuplicateKey(error)) throw error;
      const raced = await this.follows.findOneByOrFail({ userId, targetKind: kind, targetId });
      return { follow: (await this.describe([raced]))[0], created: false };
    }
  }

  async unfollow(userId: string, followId: string): Promise<void> {
    const follow = await this.follows.findOneBy({ id: followId, userId });
    if (!follow) throw new NotFoundException('Follow not found');
    await this.follows.remove(follow);
  }

  /** The e-mail's unsubscribe link: ends the follow that sent it. Using it twice is harmless. */
  async unsubscribe(token: string) {
    const delivery = await this.deliveries.findOneBy({ tokenHash: hashSecretToken(token) });
    if (!delivery) throw new NotFoundException('This unsubscribe link is not known. Manage what you follow on your account page.');
    if (!delivery.followId) return { status: 'already' as const, label: delivery.followLabel };
    await this.follows.delete({ id: delivery.followId });
    return { status: 'unfollowed' as const, label: delivery.followLabel };
  }

  /** The workshop, build or assembly, named, or null when there is no such thing. */
  async target(kind: FollowTargetKind, id: string): Promise<FollowTarget | null> {
    if (kind === 'workshop') {
      const workshop = await this.workshops.findOneBy({ id, disabledAt: IsNull() });
      return workshop && { kind, id, workshopId: workshop.id, label: workshop.name };
    }
    if (kind === 'build') {
      const build = await this.builds.findOneBy({ id });
      return build && { kind, id, workshopId: build.workshopId, label: build.title };
    }
    const assembly = await this.assemblies.findOneBy({ id });
    return assembly && { kind, id, workshopId: assembly.workshopId, label: assembly.name };
  }

  private async mayFollow(userId: string, target: FollowTarget): Promise<boolean> {
    if (await this.members.existsBy({ userId, workshopId: target.workshopId })) return true;
    if (!(await this.workshops.existsBy({ id: target.workshopId, disabledAt: IsNull() }))) return false;
    const published = { publishedRevisionId: Not(IsNull()) };
    if (target.kind === 'workshop') return this.guides.existsBy({ workshopId: target.id, ...published });
    if (target.kind === 'build') return this.guides.existsBy({ buildId: target.id, ...published });
    return this.guides.existsBy({ assemblyId: target.id, ...published });
  }

  private async describe(follows: Follow[]) {
    const workshopIds = [...new Set(follows.map((follow) => follow.workshopId))];
    const workshops = workshopIds.length ? await this.workshops.findBy({ id: In(workshopIds) }) : [];
    return Promise.all(
      follows.map(async (follow) => {
        const workshop = workshops.find((candidate) => candidate.id === follow.workshopId);
        const target = await this.target(follow.targetKind, follow.targetId);
        return {
          id: follow.id,
          targetKind: follow.targetKind,
          targetId: follow.targetId,
          label: target?.label ?? '(removed)',
          workshop: { name: workshop?.name ?? '', slug: workshop?.slug ?? '' },
          createdAt: follow.createdAt.toISOString(),
        };
      }),
    );
  }
}
