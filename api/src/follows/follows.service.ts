import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { In, IsNull, Not, Repository } from 'typeorm';
import { Assembly } from '../assemblies/entities/assembly.entity';
import { Build } from '../builds/entities/build.entity';
import { isDuplicateKey } from '../common/database/errors';
import { hashSecretToken } from '../common/secret-token';
import { FitReport } from '../fit-reports/entities/fit-report.entity';
import { Guide } from '../guides/entities/guide.entity';
import { WorkshopMember } from '../workshops/entities/workshop-member.entity';
import { Workshop } from '../workshops/entities/workshop.entity';
import { FitNewsDelivery } from './entities/fit-news-delivery.entity';
import { MailLink } from './entities/mail-link.entity';
import { DEFAULT_MAIL_PREFERENCE, MailPreference } from './entities/mail-preference.entity';
import { Follow, type FollowTargetKind } from './entities/follow.entity';
import type { FollowResponseDto } from './dto/follow-response.dto';

export interface FollowTarget {
  kind: FollowTargetKind;
  id: string;
  workshopId: string;
  label: string;
}

/** What an unsubscribe link stops: what sent the mail, everything from its workshop, or all fit news. */
export const UNSUBSCRIBE_SCOPES = ['this', 'workshop', 'everything'] as const;
export type UnsubscribeScope = (typeof UNSUBSCRIBE_SCOPES)[number];

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
    @InjectRepository(MailLink) private readonly links: Repository<MailLink>,
    @InjectRepository(MailPreference) private readonly preferences: Repository<MailPreference>,
    @InjectRepository(FitReport) private readonly reports: Repository<FitReport>,
    @InjectRepository(Workshop) private readonly workshops: Repository<Workshop>,
    @InjectRepository(Build) private readonly builds: Repository<Build>,
    @InjectRepository(Assembly) private readonly assemblies: Repository<Assembly>,
    @InjectRepository(Guide) private readonly guides: Repository<Guide>,
    @InjectRepository(WorkshopMember) private readonly members: Repository<WorkshopMember>,
  ) {}

  async list(userId: string): Promise<FollowResponseDto[]> {
    const follows = await this.follows.find({ where: { userId }, order: { createdAt: 'DESC' } });
    return this.describe(follows);
  }

  /** Following twice gives back the first follow; `created` says which happened. */
  async follow(userId: string, kind: FollowTargetKind, targetId: string): Promise<{ follow: FollowResponseDto; created: boolean }> {
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

  /**
   * The e-mail's unsubscribe link: ends what sent that mail (the follow, or the news of the person's fit
   * report) and names the person's other follows that would still bring news of the same assembly (its
   * build, its workshop), so the page can offer to stop those too. Using it twice is harmless.
   * With `alsoStopFollowId`, the same link stops one of those other follows instead.
   */
  async unsubscribe(token: string, alsoStopFollowId?: string, scope: UnsubscribeScope = 'this') {
    const delivery = await this.deliveries.findOneBy({ tokenHash: hashSecretToken(token) });
    if (!delivery) return this.unsubscribeByLink(token, alsoStopFollowId, scope);
    if (scope !== 'this') return this.unsubscribeWider(delivery, scope);
    if (alsoStopFollowId !== undefined) {
      const covering = await this.followsCovering(delivery);
      if (!covering.some((follow) => follow.id === alsoStopFollowId)) {
        const message = 'That follow is already stopped, or this link cannot stop it';
        throw new NotFoundException({ message, errors: { followId: message }, code: 'reference_not_found' });
      }
      await this.follows.delete({ id: alsoStopFollowId, userId: delivery.userId });
      return this.unsubscribeOutcome(delivery, 'unfollowed');
    }
    if (delivery.fitReportId) return this.unsubscribeOutcome(delivery, await this.stopReportNews(delivery.userId, delivery.fitReportId));
    if (!delivery.followId) return this.unsubscribeOutcome(delivery, 'already');
    const removed = await this.follows.delete({ id: delivery.followId, userId: delivery.userId });
    return this.unsubscribeOutcome(delivery, removed.affected ? 'unfollowed' : 'already');
  }

  /**
   * Wider stops from the same link: every follow in the mail's workshop (and the news of the person's
   * reports to it), or every follow and report news the person has.
   */
  private async unsubscribeWider(delivery: FitNewsDelivery, scope: 'workshop' | 'everything') {
    const assembly = await this.assemblies.findOneBy({ id: delivery.assemblyId });
    const where = scope === 'workshop' ? { userId: delivery.userId, workshopId: assembly?.workshopId ?? '' } : { userId: delivery.userId };
    const removed = await this.follows.delete(where);
    const reportWhere =
      scope === 'workshop'
        ? { reporterId: delivery.userId, workshopId: assembly?.workshopId ?? '', fitNewsStoppedAt: IsNull() }
        : { reporterId: delivery.userId, fitNewsStoppedAt: IsNull() };
    const stoppedReports = await this.reports.update(reportWhere, { fitNewsStoppedAt: new Date() });
    const workshop = assembly ? await this.workshops.findOneBy({ id: assembly.workshopId }) : null;
    return {
      status: (removed.affected ?? 0) + (stoppedReports.affected ?? 0) > 0 ? ('unfollowed' as const) : ('already' as const),
      stopped: scope,
      label: scope === 'workshop' ? `all fit news from ${workshop?.name ?? 'this workshop'}` : 'all fit news',
      stillFollowing: await this.describe(await this.follows.find({ where: { userId: delivery.userId } })),
    };
  }

  /**
   * A digest's or a fit-report mail's link. Alone it stops what sent that mail: the digest (its follows
   * are paused) or the "new fit report" mail (turned off). With `followId` it stops one of the follows
   * its answer listed; with scope `everything`, all of the person's fit news. A digest spans workshops,
   * so `workshop` is refused rather than guessed.
   */
  private async unsubscribeByLink(token: string, followId: string | undefined, scope: UnsubscribeScope) {
    const link = await this.links.findOneBy({ tokenHash: hashSecretToken(token) });
    if (!link || (link.purpose === 'digest' && !link.cadence)) {
      throw new NotFoundException('This unsubscribe link is not known. Manage what you follow on your account page.');
    }
    const label = link.purpose === 'fit_report' ? 'mail about new fit reports' : `your ${link.cadence} digest`;
    const stillFollowing = async () => this.describe(await this.follows.find({ where: { userId: link.userId, delivery: Not('paused') } }));
    if (scope === 'workshop') {
      const message = 'This mail is not about one workshop: stop one follow (followId) or everything (scope "everything")';
      throw new BadRequestException({ message, errors: { scope: message } });
    }
    if (scope === 'everything') {
      const removed = await this.follows.delete({ userId: link.userId });
      const stoppedReports = await this.reports.update({ reporterId: link.userId, fitNewsStoppedAt: IsNull() }, { fitNewsStoppedAt: new Date() });
      return {
        status: (removed.affected ?? 0) + (stoppedReports.affected ?? 0) > 0 ? ('unfollowed' as const) : ('already' as const),
        stopped: 'everything' as const,
        label: 'all fit news',
        stillFollowing: await stillFollowing(),
      };
    }
    if (followId !== undefined) {
      const removed = await this.follows.delete({ id: followId, userId: link.userId });
      if (!removed.affected) {
        const message = 'That follow is already stopped, or this link cannot stop it';
        throw new NotFoundException({ message, errors: { followId: message }, code: 'reference_not_found' });
      }
      return { status: 'unfollowed' as const, stopped: 'follow' as const, label: 'that follow', stillFollowing: await stillFollowing() };
    }
    if (link.purpose === 'fit_report') {
      const current = await this.preferences.findOneBy({ userId: link.userId });
      const already = current?.fitReportMail === 'off';
      if (!already) await this.preferences.save({ ...(current ?? { ...DEFAULT_MAIL_PREFERENCE, userId: link.userId }), fitReportMail: 'off' });
      return { status: already ? ('already' as const) : ('unfollowed' as const), stopped: 'fit_report_mail' as const, label, stillFollowing: [] };
    }
    const paused = await this.follows.update({ userId: link.userId, delivery: link.cadence! }, { delivery: 'paused' });
    return {
      status: paused.affected ? ('unfollowed' as const) : ('already' as const),
      stopped: 'digest' as const,
      label,
      stillFollowing: await stillFollowing(),
    };
  }

  /** Stops the news of the person's reports tied to the same check as this one (each would bring the same mail). */
  private async stopReportNews(reporterId: string, reportId: string): Promise<'unfollowed' | 'already'> {
    const report = await this.reports.findOneBy({ id: reportId, reporterId });
    if (!report?.fitCheckId) return 'already';
    const stopped = await this.reports.update(
      { reporterId, fitCheckId: report.fitCheckId, fitNewsStoppedAt: IsNull() },
      { fitNewsStoppedAt: new Date() },
    );
    return stopped.affected ? 'unfollowed' : 'already';
  }

  private async unsubscribeOutcome(delivery: FitNewsDelivery, status: 'unfollowed' | 'already') {
    return {
      status,
      stopped: delivery.fitReportId ? ('report' as const) : ('follow' as const),
      label: delivery.followLabel,
      stillFollowing: await this.describe(await this.followsCovering(delivery)),
    };
  }

  /** The person's follows that bring news of the delivery's assembly: the assembly, its build, its workshop. */
  private async followsCovering(delivery: FitNewsDelivery): Promise<Follow[]> {
    const assembly = await this.assemblies.findOneBy({ id: delivery.assemblyId });
    if (!assembly) return [];
    const targets: { targetKind: FollowTargetKind; targetId: string }[] = [
      { targetKind: 'assembly', targetId: assembly.id },
      { targetKind: 'build', targetId: assembly.buildId },
      { targetKind: 'workshop', targetId: assembly.workshopId },
    ];
    const follows = await this.follows.find({ where: targets.map((target) => ({ ...target, userId: delivery.userId })) });
    // Closest first, as the fan-out chooses which follow a mail names.
    return targets.flatMap((target) => follows.filter((follow) => follow.targetKind === target.targetKind));
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

  private async describe(follows: Follow[]): Promise<FollowResponseDto[]> {
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
          delivery: follow.delivery,
          workshop: { name: workshop?.name ?? '', slug: workshop?.slug ?? '' },
          createdAt: follow.createdAt.toISOString(),
        };
      }),
    );
  }
}
