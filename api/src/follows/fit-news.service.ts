import { Inject, Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import { In, IsNull, Not, Repository } from 'typeorm';
import { Assembly } from '../assemblies/entities/assembly.entity';
import { Build } from '../builds/entities/build.entity';
import { isDuplicateKey } from '../common/database/errors';
import { hashSecretToken, newSecretToken } from '../common/secret-token';
import type { AppConfig } from '../config/app-config';
import { formatLength } from '../engine/units';
import { FitCheckEvidence } from '../fit-checks/entities/fit-check-evidence.entity';
import type { FitCheckChangedEvent } from '../fit-checks/fit-checks.events';
import { Guide } from '../guides/entities/guide.entity';
import { publicGuidePath } from '../guides/guide.mapper';
import { MailQueueService } from '../infra/mail/mail-queue.service';
import { Mark } from '../marks/entities/mark.entity';
import { Measurement } from '../measurements/entities/measurement.entity';
import { User } from '../users/entities/user.entity';
import { Workshop } from '../workshops/entities/workshop.entity';
import { FitNewsDelivery } from './entities/fit-news-delivery.entity';
import { Follow, type FollowTargetKind } from './entities/follow.entity';
import { fitNewsMail } from './fit-news-mails';

/** The fit-check states followers hear about. */
export const NEWS_STATES = ['confirmed', 'no_fit'] as const;

/** A person following several of the targets hears once, through the closest one. */
const CLOSEST_FIRST: FollowTargetKind[] = ['assembly', 'build', 'workshop'];

/**
 * E-mails the followers of an assembly, its build and its workshop when one of its fit checks becomes
 * confirmed or no fit. Only news of an assembly a published guide shows goes out (the e-mail links to
 * that guide's checklist), only to confirmed addresses of active accounts, never to the person who made
 * the change, and once per person and change.
 */
@Injectable()
export class FitNewsService {
  private readonly logger = new Logger(FitNewsService.name);
  private readonly appOrigin: string;

  constructor(
    @InjectRepository(Follow) private readonly follows: Repository<Follow>,
    @InjectRepository(FitNewsDelivery) private readonly deliveries: Repository<FitNewsDelivery>,
    @InjectRepository(Guide) private readonly guides: Repository<Guide>,
    @InjectRepository(Assembly) private readonly assemblies: Repository<Assembly>,
    @InjectRepository(Build) private readonly builds: Repository<Build>,
    @InjectRepository(Workshop) private readonly workshops: Repository<Workshop>,
    @InjectRepository(User) private readonly users: Repository<User>,
    @InjectRepository(FitCheckEvidence) private readonly evidence: Repository<FitCheckEvidence>,
    @InjectRepository(Mark) private readonly marks: Repository<Mark>,
    @InjectRepository(Measurement) private readonly measurements: Repository<Measurement>,
    @Inject(MailQueueService) private readonly mail: MailQueueService,
    config: ConfigService<AppConfig, true>,
  ) {
    this.appOrigin = config.get('appOrigin', { infer: true });
  }

  /** Returns how many e-mails were queued (0 when the change is not news or nobody follows). */
  async deliver(event: FitCheckChangedEvent): Promise<number> {
    if (!(NEWS_STATES as readonly string[]).includes(event.to)) return 0;
    const workshop = await this.workshops.findOneBy({ id: event.workshopId, disabledAt: IsNull() });
    const assembly = await this.assemblies.findOneBy({ id: event.assemblyId });
    const guide = await this.guides.findOne({
      where: { assemblyId: event.assemblyId, publishedRevisionId: Not(IsNull()) },
      order: { createdAt: 'ASC' },
    });
    if (!workshop || !assembly || !guide) return 0;
    const build = await this.builds.findOneByOrFail({ id: assembly.buildId });

    const targets: Record<FollowTargetKind, { id: string; label: string }> = {
      assembly: { id: assembly.id, label: assembly.name },
      build: { id: build.id, label: build.title },
      workshop: { id: workshop.id, label: workshop.name },
    };
    const follows = await this.follows.find({
      where: CLOSEST_FIRST.map((kind) => ({ targetKind: kind, targetId: targets[kind].id })),
    });
    const closest = new Map<string, Follow>();
    for (const kind of CLOSEST_FIRST) {
      for (const follow of follows) if (follow.targetKind === kind && !closest.has(follow.userId)) closest.set(follow.userId, follow);
    }
    const recipients = closest.size
      ? await this.users.findBy({ id: In([...closest.keys()]), emailVerifiedAt: Not(IsNull()), disabledAt: IsNull() })
      : [];
    const evidence = await this.evidenceLines(event.fitCheckId);
    const guideUrl = `${this.appOrigin}${publicGuidePath(workshop.slug, guide.slug)}#checklist`;

    let queued = 0;
    for (const user of recipients) {
      if (user.id === event.actorId) continue;
      const follow = closest.get(user.id)!;
      const token = newSecretToken();
      try {
        await this.deliveries.insert(
          this.deliveries.create({
            fitCheckEventId: event.eventId,
            userId: user.id,
            followId: follow.id,
            followLabel: targets[follow.targetKind].label,
            tokenHash: hashSecretToken(token),
          }),
        );
      } catch (error) {
        if (isDuplicateKey(error)) continue; // already told about this change
        throw error;
      }
      await this.mail.enqueue(
        fitNewsMail({
          to: user.email,
          news: event.to === 'confirmed' ? 'confirmed' : 'no_fit',
          checkTitle: event.title,
          reason: event.reason,
          evidence,
          workshopName: workshop.name,
          assemblyName: assembly.name,
          buildTitle: build.title,
          guideUrl,
          followLabel: targets[follow.targetKind].label,
          unsubscribePageUrl: `${this.appOrigin}/unsubscribe?token=${token}`,
          oneClickUnsubscribeUrl: `${this.appOrigin}/api/follows/unsubscribe?token=${token}`,
        }),
      );
      queued += 1;
    }
    this.logger.log(`fit news for check ${event.fitCheckId} (${event.to}): ${queued} e-mail(s) queued`);
    return queued;
  }

  /** What proves the check, in words a follower can read without signing in. */
  private async evidenceLines(fitCheckId: string): Promise<string[]> {
    const rows = await this.evidence.find({ where: { fitCheckId }, order: { createdAt: 'ASC' } });
    const markIds = rows.map((row) => row.markId).filter((id): id is string => !!id);
    const readingIds = rows.map((row) => row.measurementId).filter((id): id is string => !!id);
    const marks = markIds.length ? await this.marks.findBy({ id: In(markIds) }) : [];
    const readings = readingIds.length ? await this.measurements.findBy({ id: In(readingIds) }) : [];
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
