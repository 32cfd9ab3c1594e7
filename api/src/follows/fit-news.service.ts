import { Inject, Injectable, Logger, OnModuleInit } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import { EntityManager, In, IsNull, Not, Repository } from 'typeorm';
import { Assembly } from '../assemblies/entities/assembly.entity';
import { Build } from '../builds/entities/build.entity';
import { hashSecretToken, newSecretToken } from '../common/secret-token';
import type { AppConfig } from '../config/app-config';
import { formatLength } from '../engine/units';
import { FitCheckEvidence } from '../fit-checks/entities/fit-check-evidence.entity';
import { FitReport } from '../fit-reports/entities/fit-report.entity';
import { FIT_CHECK_CHANGED, type FitCheckChangedEvent } from '../fit-checks/fit-checks.events';
import { Guide } from '../guides/entities/guide.entity';
import { publicGuidePath } from '../guides/guide.mapper';
import { Mark } from '../marks/entities/mark.entity';
import { Measurement } from '../measurements/entities/measurement.entity';
import { MailRelay } from '../outbox/mail-relay.service';
import type { MailDraft } from '../outbox/mail-outbox.service';
import { User } from '../users/entities/user.entity';
import { Workshop } from '../workshops/entities/workshop.entity';
import { DigestItem } from './entities/digest-item.entity';
import { FitNewsDelivery } from './entities/fit-news-delivery.entity';
import { MailPreference } from './entities/mail-preference.entity';
import { Follow, type FollowTargetKind } from './entities/follow.entity';
import { fitNewsMail } from './fit-news-mails';

/** The fit-check states followers hear about. */
export const NEWS_STATES = ['confirmed', 'no_fit'] as const;

/** A person following several of the targets hears once, through the closest one. */
const CLOSEST_FIRST: FollowTargetKind[] = ['assembly', 'build', 'workshop'];

/** The idempotency key of one person's mail about one change: the outbox never holds two. */
export const fitNewsKey = (eventId: string, userId: string) => `fit-news:${eventId}:${userId}`;

/**
 * E-mails news of a fit check that became confirmed or no fit: to the people whose fit report it
 * verifies, and to the followers of its assembly, build and workshop when a published guide shows that
 * assembly (the e-mail links to the guide's checklist). Only confirmed addresses of active accounts,
 * never the person who made the change, once per person and change.
 */
@Injectable()
export class FitNewsService implements OnModuleInit {
  private readonly logger = new Logger(FitNewsService.name);
  private readonly appOrigin: string;

  constructor(
    @InjectRepository(FitNewsDelivery) private readonly deliveries: Repository<FitNewsDelivery>,
    @Inject(MailRelay) private readonly relay: MailRelay,
    config: ConfigService<AppConfig, true>,
  ) {
    this.appOrigin = config.get('appOrigin', { infer: true });
  }

  onModuleInit(): void {
    this.relay.registerExpander(FIT_CHECK_CHANGED, (manager, payload) => this.expand(manager, payload as FitCheckChangedEvent));
  }

  /**
   * The relay's half of a check change: records one delivery per person (unique per change and person)
   * and returns their mails for the outbox, in the relay's transaction. Empty when the change is not news.
   */
  async expand(manager: EntityManager, event: FitCheckChangedEvent): Promise<MailDraft[]> {
    if (!(NEWS_STATES as readonly string[]).includes(event.to)) return [];
    const workshop = await manager.findOneBy(Workshop, { id: event.workshopId, disabledAt: IsNull() });
    const assembly = await manager.findOneBy(Assembly, { id: event.assemblyId });
    if (!workshop || !assembly) return [];
    const build = await manager.findOneByOrFail(Build, { id: assembly.buildId });
    const guide = await manager.findOne(Guide, {
      where: { assemblyId: event.assemblyId, publishedRevisionId: Not(IsNull()) },
      order: { createdAt: 'ASC' },
    });
    const targets: Record<FollowTargetKind, { id: string; label: string }> = {
      assembly: { id: assembly.id, label: assembly.name },
      build: { id: build.id, label: build.title },
      workshop: { id: workshop.id, label: workshop.name },
    };

    // Who hears, and why: reporters whose claim this check verifies, then followers through their closest follow.
    // Followers only hear of assemblies a published guide shows; a reporter's report was tied to the check on purpose.
    // A reporter who stopped a report's news from an e-mail hears no more through it.
    const reasons = new Map<string, Follow | FitReport>();
    const reports = await manager.find(FitReport, {
      where: { fitCheckId: event.fitCheckId, status: Not('declined'), fitNewsStoppedAt: IsNull() },
      select: { id: true, reporterId: true },
      order: { createdAt: 'ASC' },
    });
    for (const report of reports) if (!reasons.has(report.reporterId)) reasons.set(report.reporterId, report);
    if (guide) {
      const follows = await manager.find(Follow, { where: CLOSEST_FIRST.map((kind) => ({ targetKind: kind, targetId: targets[kind].id })) });
      for (const kind of CLOSEST_FIRST) {
        for (const follow of follows) {
          // A paused follow brings nothing; a wider one the person did not pause still does.
          if (follow.targetKind === kind && follow.delivery !== 'paused' && !reasons.has(follow.userId)) reasons.set(follow.userId, follow);
        }
      }
    }
    reasons.delete(event.actorId ?? '');
    // An address paused after repeated refusals by its mail server gets nothing until its owner resumes it.
    const paused = reasons.size
      ? new Set((await manager.findBy(MailPreference, { userId: In([...reasons.keys()]), pausedAt: Not(IsNull()) })).map((row) => row.userId))
      : new Set<string>();
    const recipients = reasons.size
      ? (await manager.findBy(User, { id: In([...reasons.keys()]), emailVerifiedAt: Not(IsNull()), disabledAt: IsNull() })).filter(
          (user) => !paused.has(user.id),
        )
      : [];
    const evidence = recipients.length ? await this.evidenceLines(manager, event.fitCheckId) : [];
    const link = guide
      ? { label: 'See the verified-fit checklist', url: `${this.appOrigin}${publicGuidePath(workshop.slug, guide.slug)}#checklist` }
      : { label: 'See your fit reports', url: `${this.appOrigin}/account` };

    const alreadyTold = new Set(
      (await manager.find(FitNewsDelivery, { where: { fitCheckEventId: event.eventId }, select: { userId: true } })).map((row) => row.userId),
    );
    const records: FitNewsDelivery[] = [];
    const digestItems: DigestItem[] = [];
    const drafts: MailDraft[] = [];
    for (const user of recipients) {
      if (alreadyTold.has(user.id)) continue;
      const reason = reasons.get(user.id)!;
      const follow = reason instanceof Follow ? reason : null;
      if (follow && guide && (follow.delivery === 'daily' || follow.delivery === 'weekly')) {
        digestItems.push(
          manager.create(DigestItem, {
            userId: user.id,
            followId: follow.id,
            cadence: follow.delivery,
            fitCheckEventId: event.eventId,
            guideTitle: guide.title.slice(0, 200),
            guideUrl: link.url,
            checkTitle: event.title.slice(0, 200),
            stateBefore: event.from,
            stateAfter: event.to,
            followLabel: targets[follow.targetKind].label.slice(0, 200),
            occurredAt: event.occurredAt ? new Date(event.occurredAt) : new Date(),
            digestKey: null,
          }),
        );
        continue;
      }
      const token = newSecretToken();
      records.push(
        this.deliveries.create({
          fitCheckEventId: event.eventId,
          userId: user.id,
          assemblyId: assembly.id,
          followId: follow?.id ?? null,
          fitReportId: follow ? null : reason.id,
          followLabel: follow ? targets[follow.targetKind].label : 'your fit report',
          tokenHash: hashSecretToken(token),
        }),
      );
      drafts.push({
        kind: 'fit-news',
        idempotencyKey: fitNewsKey(event.eventId, user.id),
        userId: user.id,
        fitCheckEventId: event.eventId,
        mail: fitNewsMail({
          to: user.email,
          news: event.to === 'confirmed' ? 'confirmed' : 'no_fit',
          checkTitle: event.title,
          reason: event.reason,
          evidence,
          workshopName: workshop.name,
          assemblyName: assembly.name,
          buildTitle: build.title,
          link,
          because: follow ? { kind: 'follow', label: targets[follow.targetKind].label } : { kind: 'report' },
          unsubscribe: {
            pageUrl: `${this.appOrigin}/unsubscribe?token=${token}`,
            oneClickUrl: `${this.appOrigin}/api/follows/unsubscribe?token=${token}`,
            preferencesUrl: `${this.appOrigin}/mail-preferences?token=${token}`,
          },
        }),
      });
    }
    for (let start = 0; start < records.length; start += 500) await manager.insert(FitNewsDelivery, records.slice(start, start + 500));
    for (let start = 0; start < digestItems.length; start += 500) {
      await manager.createQueryBuilder().insert().into(DigestItem).values(digestItems.slice(start, start + 500)).orIgnore().execute();
    }
    this.logger.log(`fit news for check ${event.fitCheckId} (${event.to}): ${drafts.length} e-mail(s) written to the outbox, ${digestItems.length} change(s) kept for digests`);
    return drafts;
  }

  /** What proves the check, in words a follower can read without signing in. */
  private async evidenceLines(manager: EntityManager, fitCheckId: string): Promise<string[]> {
    const rows = await manager.find(FitCheckEvidence, { where: { fitCheckId }, order: { createdAt: 'ASC' } });
    const markIds = rows.map((row) => row.markId).filter((id): id is string => !!id);
    const readingIds = rows.map((row) => row.measurementId).filter((id): id is string => !!id);
    const marks = markIds.length ? await manager.findBy(Mark, { id: In(markIds) }) : [];
    const readings = readingIds.length ? await manager.findBy(Measurement, { id: In(readingIds) }) : [];
    return rows.map((row) => {
      if (row.kind === 'mark') {
        const mark = marks.find((candidate) => candidate.id === row.markId);
        return `a moment in the video${mark?.label ? `: ${mark.label}` : ''}`;
      }
      if (row.kind === 'measurement') {
        const reading = readings.find((candidate) => candidate.id === row.measurementId);
        return reading ? `a reading of ${formatLength(reading.valueNm, reading.unit, reading.instrumentResolutionNm)}` : 'a reading';
      }
      return `a photo${row.note ? `: ${row.note}` : ''}`;
    });
  }
}
