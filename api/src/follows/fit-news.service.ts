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
import { FitReport } from '../fit-reports/entities/fit-report.entity';
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
 * E-mails news of a fit check that became confirmed or no fit: to the people whose fit report it
 * verifies, and to the followers of its assembly, build and workshop when a published guide shows that
 * assembly (the e-mail links to the guide's checklist). Only confirmed addresses of active accounts,
 * never the person who made the change, once per person and change.
 */
@Injectable()
export class FitNewsService {
  private readonly logger = new Logger(FitNewsService.name);
  private readonly appOrigin: string;

  constructor(
    @InjectRepository(Follow) private readonly follows: Repository<Follow>,
    @InjectRepository(FitNewsDelivery) private readonly deliveries: Repository<FitNewsDelivery>,
    @InjectRepository(FitReport) private readonly reports: Repository<FitReport>,
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

  /** Returns how many e-mails were queued (0 when the change is not news or nobody is to hear). */
  async deliver(event: FitCheckChangedEvent): Promise<number> {
    if (!(NEWS_STATES as readonly string[]).includes(event.to)) return 0;
    const workshop = await this.workshops.findOneBy({ id: event.workshopId, disabledAt: IsNull() });
    const assembly = await this.assemblies.findOneBy({ id: event.assemblyId });
    if (!workshop || !assembly) return 0;
    const build = await this.builds.findOneByOrFail({ id: assembly.buildId });
    const guide = await this.guides.findOne({
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
    const reports = await this.reports.find({
      where: { fitCheckId: event.fitCheckId, status: Not('declined'), fitNewsStoppedAt: IsNull() },
      select: { id: true, reporterId: true },
      order: { createdAt: 'ASC' },
    });
    for (const report of reports) if (!reasons.has(report.reporterId)) reasons.set(report.reporterId, report);
    if (guide) {
      const follows = await this.follows.find({ where: CLOSEST_FIRST.map((kind) => ({ targetKind: kind, targetId: targets[kind].id })) });
      for (const kind of CLOSEST_FIRST) {
        for (const follow of follows) if (follow.targetKind === kind && !reasons.has(follow.userId)) reasons.set(follow.userId, follow);
      }
    }
    reasons.delete(event.actorId ?? '');
    const recipients = reasons.size
      ? await this.users.findBy({ id: In([...reasons.keys()]), emailVerifiedAt: Not(IsNull()), disabledAt: IsNull() })
      : [];
    const evidence = recipients.length ? await this.evidenceLines(event.fitCheckId) : [];
    const link = guide
      ? { label: 'See the verified-fit checklist', url: `${this.appOrigin}${publicGuidePath(workshop.slug, guide.slug)}#checklist` }
      : { label: 'See your fit reports', url: `${this.appOrigin}/account` };

    let queued = 0;
    for (const user of recipients) {
      const reason = reasons.get(user.id)!;
      const follow = reason instanceof Follow ? reason : null;
      const token = newSecretToken();
      try {
        await this.deliveries.insert(
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
          link,
          because: follow ? { kind: 'follow', label: targets[follow.targetKind].label } : { kind: 'report' },
          unsubscribe: {
            pageUrl: `${this.appOrigin}/unsubscribe?token=${token}`,
            oneClickUrl: `${this.appOrigin}/api/follows/unsubscribe?token=${token}`,
          },
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
