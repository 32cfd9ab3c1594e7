import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { In, IsNull, LessThanOrEqual, Repository } from 'typeorm';
import { FitCheckEvent } from '../fit-checks/entities/fit-check-event.entity';
import { FitCheck } from '../fit-checks/entities/fit-check.entity';
import { GuideRevision } from '../guides/entities/guide-revision.entity';
import { Guide } from '../guides/entities/guide.entity';
import { checkStateAt, compareChecklists, compareRevisions, type CheckHistoryInput } from '../guides/revision-diff';
import { Workshop } from '../workshops/entities/workshop.entity';
import type {
  GuideReadingDto,
  PublicRevisionDto,
  PublicRevisionGuideRefDto,
  PublicRevisionListDto,
  RevisionCheckDto,
  RevisionCompareDto,
  RevisionRefDto,
} from './dto/guide-revisions.dto';
import { GuideRead } from './entities/guide-read.entity';

interface PublishedGuide {
  workshop: Workshop;
  guide: Guide;
  current: GuideRevision;
  ref: PublicRevisionGuideRefDto;
}

/**
 * Earlier published revisions of a public guide, for anyone, and the signed-in reader's "last opened" record.
 * Only a guide published now is found (withdrawn, or in a disabled workshop: 404), and only revisions up to the
 * one published: a draft never shows here, since a draft is no revision at all.
 */
@Injectable()
export class GuideRevisionsService {
  constructor(
    @InjectRepository(Workshop) private readonly workshops: Repository<Workshop>,
    @InjectRepository(Guide) private readonly guides: Repository<Guide>,
    @InjectRepository(GuideRevision) private readonly revisions: Repository<GuideRevision>,
    @InjectRepository(FitCheck) private readonly checks: Repository<FitCheck>,
    @InjectRepository(FitCheckEvent) private readonly checkEvents: Repository<FitCheckEvent>,
    @InjectRepository(GuideRead) private readonly reads: Repository<GuideRead>,
  ) {}

  async list(workshopSlug: string, guideSlug: string): Promise<PublicRevisionListDto> {
    const { guide, current, ref } = await this.findPublished(workshopSlug, guideSlug);
    const revisions = await this.revisions.find({
      where: { guideId: guide.id, number: LessThanOrEqual(current.number) },
      select: { number: true, publishedAt: true, note: true },
      order: { number: 'DESC' },
    });
    return {
      guide: ref,
      currentRevision: current.number,
      revisions: revisions.map((revision) => ({ ...revisionRef(revision), current: revision.number === current.number })),
    };
  }

  async revision(workshopSlug: string, guideSlug: string, number: number): Promise<PublicRevisionDto> {
    const { workshop, guide, current, ref } = await this.findPublished(workshopSlug, guideSlug);
    const revision = await this.numbered(guide, current, number, 'number');
    const { content } = revision;
    const checks = content.assemblyId ? await this.checkHistory(workshop.id, content.assemblyId) : [];
    const atMs = revision.publishedAt.getTime();
    return {
      ...revisionRef(revision),
      currentRevision: current.number,
      guide: ref,
      title: content.title,
      summary: content.summary,
      tools: content.tools,
      consumables: content.consumables,
      skillLevel: content.skillLevel ?? null,
      estimatedMinutes: content.estimatedMinutes ?? null,
      steps: content.steps.map((step, index) => ({
        id: step.id,
        number: index + 1,
        title: step.title,
        body: step.body,
        caution: step.caution,
        startMs: step.startMs,
        endMs: step.endMs,
        estimatedMinutes: step.estimatedMinutes ?? null,
      })),
      checklist: checks.flatMap((check): RevisionCheckDto[] => {
        const state = checkStateAt(check, atMs);
        return state === null || state === 'retired' ? [] : [{ id: check.id, title: check.title, required: check.required, state }];
      }),
    };
  }

  async compare(workshopSlug: string, guideSlug: string, fromNumber: number, toNumber: number): Promise<RevisionCompareDto> {
    const { workshop, guide, current, ref } = await this.findPublished(workshopSlug, guideSlug);
    const from = await this.numbered(guide, current, fromNumber, 'from');
    const to = await this.numbered(guide, current, toNumber, 'to');
    const diff = compareRevisions(from.content, to.content);
    const fromChecks = from.content.assemblyId ? await this.checkHistory(workshop.id, from.content.assemblyId) : [];
    const toChecks =
      to.content.assemblyId === from.content.assemblyId ? fromChecks : to.content.assemblyId ? await this.checkHistory(workshop.id, to.content.assemblyId) : [];
    const { guide: guideChanges, ...steps } = diff;
    return {
      guide: ref,
      currentRevision: current.number,
      from: revisionRef(from),
      to: revisionRef(to),
      guideChanges,
      ...steps,
      checklist: compareChecklists(fromChecks, from.publishedAt.getTime(), toChecks, to.publishedAt.getTime()),
    };
  }

  async reading(userId: string, workshopSlug: string, guideSlug: string): Promise<GuideReadingDto> {
    const { guide, current } = await this.findPublished(workshopSlug, guideSlug);
    const read = await this.reads.findOneBy({ userId, guideId: guide.id });
    return { currentRevision: current.number, lastReadRevision: read?.revisionNumber ?? null, lastReadAt: read?.readAt.toISOString() ?? null };
  }

  /** The reader has opened the guide as published now. */
  async recordReading(userId: string, workshopSlug: string, guideSlug: string): Promise<GuideReadingDto> {
    const { guide, current } = await this.findPublished(workshopSlug, guideSlug);
    const readAt = new Date();
    await this.reads.query(
      `INSERT INTO guide_reads (user_id, guide_id, revision_number, read_at) VALUES (?, ?, ?, ?)
       ON DUPLICATE KEY UPDATE revision_number = VALUES(revision_number), read_at = VALUES(read_at)`,
      [userId, guide.id, current.number, readAt],
    );
    return { currentRevision: current.number, lastReadRevision: current.number, lastReadAt: readAt.toISOString() };
  }

  private async findPublished(workshopSlug: string, guideSlug: string): Promise<PublishedGuide> {
    const workshop = await this.workshops.findOneBy({ slug: workshopSlug, disabledAt: IsNull() });
    const guide = workshop ? await this.guides.findOneBy({ workshopId: workshop.id, slug: guideSlug }) : null;
    const current = guide?.publishedRevisionId ? await this.revisions.findOneBy({ id: guide.publishedRevisionId }) : null;
    if (!workshop || !guide || !current) throw new NotFoundException('This guide is not published.');
    return { workshop, guide, current, ref: { workshopName: workshop.name, workshopSlug: workshop.slug, guideSlug: guide.slug, title: current.content.title } };
  }

  /** A revision up to the published one; anything else is "not found", naming the field that asked for it. */
  private async numbered(guide: Guide, current: GuideRevision, number: number, field: string): Promise<GuideRevision> {
    const revision = number === current.number ? current : number < current.number ? await this.revisions.findOneBy({ guideId: guide.id, number }) : null;
    if (!revision) {
      throw new NotFoundException({
        message: 'Revision not found',
        errors: { [field]: `This guide has no published revision ${number}; the latest is ${current.number}` },
        code: 'revision_not_found',
      });
    }
    return revision;
  }

  /** The assembly's checks with their state changes, oldest first, for reading a state at any moment. */
  private async checkHistory(workshopId: string, assemblyId: string): Promise<CheckHistoryInput[]> {
    const checks = await this.checks.find({ where: { workshopId, assemblyId }, order: { createdAt: 'ASC' } });
    if (checks.length === 0) return [];
    const events = await this.checkEvents.find({ where: { fitCheckId: In(checks.map((check) => check.id)) }, order: { createdAt: 'ASC' } });
    const byCheck = new Map<string, CheckHistoryInput['events']>(checks.map((check) => [check.id, []]));
    for (const event of events) byCheck.get(event.fitCheckId)!.push({ fromState: event.fromState, toState: event.toState, atMs: event.createdAt.getTime() });
    return checks.map((check) => ({
      id: check.id,
      title: check.title,
      required: check.required,
      createdAtMs: check.createdAt.getTime(),
      state: check.state,
      events: byCheck.get(check.id)!,
    }));
  }
}

function revisionRef(revision: Pick<GuideRevision, 'number' | 'publishedAt' | 'note'>): RevisionRefDto {
  return { number: revision.number, publishedAt: revision.publishedAt.toISOString(), note: revision.note };
}
