import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { In, IsNull, Repository } from 'typeorm';
import { AssembliesService } from '../assemblies/assemblies.service';
import { Build } from '../builds/entities/build.entity';
import { detectSafetyTopics, GUIDE_DISCLAIMER, SAFETY_TOPICS, standardCautions } from '../engine/safety-topics';
import type { SkillLevel } from '../engine/guide-effort';
import { formatLength } from '../engine/units';
import { entityTagOf } from '../common/http/entity-tag';
import { Footage } from '../footage/entities/footage.entity';
import { FootageMediaService } from '../footage/footage-media.service';
import { FitChecksService } from '../fit-checks/fit-checks.service';
import { StorageService } from '../infra/storage/storage.service';
import { Mark } from '../marks/entities/mark.entity';
import { Measurement } from '../measurements/entities/measurement.entity';
import { Transcript } from '../transcripts/entities/transcript.entity';
import { User } from '../users/entities/user.entity';
import type { CueWindowQueryDto, CueWindowResponseDto } from '../transcripts/dto/transcript.dto';
import { TranscriptsService } from '../transcripts/transcripts.service';
import { Workshop } from '../workshops/entities/workshop.entity';
import { GuideRevision } from './entities/guide-revision.entity';
import { Guide } from './entities/guide.entity';
import { plainText, type GuideContent, type GuideMarkContent } from './guide-content';
import { publicGuidePath } from './guide.mapper';
import { PUBLISHED_GUIDE_VERSION_SQL, PUBLISHED_INDEX_VERSION_SQL } from './published-guide-versions';
import { PublishedGuideCache, type CachedAnswer } from './published-guide-cache';

const MEDIA_URL_TTL_SECONDS = 60 * 60;
const INDEX_LIMIT = 50;
/** Part of every tag: change it when the answers' shape changes, so no cache keeps the old shape. */
const ANSWER_SHAPE = 'public-guides-5';

interface PublishedGuide {
  workshop: Workshop;
  guide: Guide;
  revision: GuideRevision;
  content: GuideContent;
}

/**
 * What viewers see: the published revision of a guide, with the live verified-fit checklist of its
 * assembly (checks keep moving after publishing) and its footage through short-lived storage links.
 * A withdrawn guide, or one of a disabled workshop, is not found.
 */
@Injectable()
export class PublishedGuidesService {
  constructor(
    @InjectRepository(Guide) private readonly guides: Repository<Guide>,
    @InjectRepository(GuideRevision) private readonly revisions: Repository<GuideRevision>,
    @InjectRepository(Workshop) private readonly workshops: Repository<Workshop>,
    @InjectRepository(Build) private readonly builds: Repository<Build>,
    @InjectRepository(Footage) private readonly footage: Repository<Footage>,
    @InjectRepository(Transcript) private readonly transcripts: Repository<Transcript>,
    @InjectRepository(Mark) private readonly marks: Repository<Mark>,
    @InjectRepository(Measurement) private readonly measurements: Repository<Measurement>,
    @InjectRepository(User) private readonly users: Repository<User>,
    private readonly fitChecks: FitChecksService,
    private readonly assemblies: AssembliesService,
    private readonly transcriptsService: TranscriptsService,
    private readonly storage: StorageService,
    private readonly footageMedia: FootageMediaService,
    private readonly cache: PublishedGuideCache,
  ) {}

  /** The index's entity tag (held in Redis, else one aggregate over the published guides; the same for every search). */
  async indexTag(): Promise<string> {
    return this.cache.tag('index', async () => {
      const [row] = await this.guides.query<Record<string, unknown>[]>(PUBLISHED_INDEX_VERSION_SQL);
      return entityTagOf([ANSWER_SHAPE, 'index', row]);
    });
  }

  /** The follow-along read's entity tag (held in Redis, else one indexed query); null when the guide is not published. */
  async readTag(workshopSlug: string, guideSlug: string): Promise<string | null> {
    return this.cache.tag(`read:${workshopSlug}/${guideSlug}`, async () => {
      const [row] = await this.guides.query<Record<string, unknown>[]>(PUBLISHED_GUIDE_VERSION_SQL, [guideSlug, workshopSlug]);
      return row ? entityTagOf([ANSWER_SHAPE, 'read', row]) : null;
    });
  }

  /** The follow-along answer of the state `tag` names: built once, then served gzipped from Redis by every process. */
  readAnswer(workshopSlug: string, guideSlug: string, tag: string): Promise<CachedAnswer> {
    return this.cache.answer(tag, () => this.read(workshopSlug, guideSlug));
  }

  /** The index without a search for the state `tag` names: built once, then served gzipped from Redis like a follow-along answer. */
  indexAnswer(tag: string): Promise<CachedAnswer> {
    return this.cache.answer(tag, () => this.index());
  }

  async index(query?: string) {
    const builder = this.guides
      .createQueryBuilder('guide')
      .innerJoin(Workshop, 'workshop', 'workshop.id = guide.workshop_id AND workshop.disabled_at IS NULL')
      .innerJoin(GuideRevision, 'revision', 'revision.id = guide.published_revision_id')
      .innerJoin(Build, 'build', 'build.id = guide.build_id')
      .select([
        'guide.id AS id',
        'guide.slug AS slug',
        'workshop.name AS workshopName',
        'workshop.slug AS workshopSlug',
        'build.title AS buildTitle',
        'revision.number AS revision',
        'revision.published_at AS publishedAt',
      ])
      .addSelect("JSON_VALUE(revision.content, '$.title')", 'title')
      .addSelect("JSON_LENGTH(revision.content, '$.steps')", 'stepCount')
      .addSelect("JSON_VALUE(revision.content, '$.footageId')", 'footageId')
      .addSelect("JSON_VALUE(revision.content, '$.skillLevel')", 'skillLevel')
      .addSelect("JSON_VALUE(revision.content, '$.estimatedMinutes')", 'estimatedMinutes')
      .orderBy('revision.published_at', 'DESC')
      .limit(INDEX_LIMIT);
    for (const [index, word] of (query ?? '').trim().split(/\s+/).filter(Boolean).slice(0, 8).entries()) {
      const like = `%${word.replace(/[\\%_]/g, (match) => `\\${match}`)}%`;
      builder.andWhere(
        `(JSON_VALUE(revision.content, '$.title') LIKE :word${index} OR build.title LIKE :word${index} OR workshop.name LIKE :word${index})`,
        { [`word${index}`]: like },
      );
    }
    const rows = await builder.getRawMany<{
      slug: string;
      workshopName: string;
      workshopSlug: string;
      buildTitle: string;
      revision: number;
      publishedAt: Date;
      title: string;
      stepCount: number;
      footageId: string | null;
      skillLevel: SkillLevel | null;
      estimatedMinutes: string | number | null;
    }>();
    const posters = await this.footageWithPosters(rows.map((row) => row.footageId).filter((id): id is string => !!id));
    return rows.map((row) => {
      const path = publicGuidePath(row.workshopSlug, row.slug);
      return {
        workshop: { name: row.workshopName, slug: row.workshopSlug },
        slug: row.slug,
        title: row.title,
        buildTitle: row.buildTitle,
        publishedAt: new Date(row.publishedAt).toISOString(),
        revision: Number(row.revision),
        stepCount: Number(row.stepCount),
        skillLevel: row.skillLevel ?? null,
        estimatedMinutes: row.estimatedMinutes === null || row.estimatedMinutes === undefined ? null : Number(row.estimatedMinutes),
        posterUrl: row.footageId && posters.has(row.footageId) ? `/api${path}/poster` : null,
        path,
      };
    });
  }

  async read(workshopSlug: string, guideSlug: string) {
    const { workshop, guide, revision, content } = await this.find(workshopSlug, guideSlug);
    const build = await this.builds.findOneByOrFail({ id: guide.buildId });
    const topics = SAFETY_TOPICS.filter((topic) => content.safetyTopics.includes(topic) || detectSafetyTopics(plainText(content)).includes(topic));
    const footage = content.footageId ? await this.footage.findOneBy({ id: content.footageId, workshopId: workshop.id }) : null;
    const transcript = footage ? await this.transcripts.findOneBy({ footageId: footage.id, isActive: true }) : null;
    const basePath = `/api${publicGuidePath(workshop.slug, guide.slug)}`;
    const checklist = content.assemblyId ? await this.checklist(workshop, content.assemblyId, footage?.id ?? null, basePath) : null;
    const parts = content.assemblyId ? await this.parts(workshop.id, content.assemblyId) : [];
    return {
      workshop: { name: workshop.name, slug: workshop.slug },
      guide: {
        title: content.title,
        slug: guide.slug,
        summary: content.summary,
        buildTitle: build.title,
        vehicle: build.vehicle,
        tools: content.tools,
        consumables: content.consumables,
        safetyTopics: topics,
        skillLevel: content.skillLevel ?? null,
        estimatedMinutes: content.estimatedMinutes ?? null,
      },
      revision: { number: revision.number, publishedAt: revision.publishedAt.toISOString(), note: revision.note },
      cautions: standardCautions(topics),
      disclaimer: GUIDE_DISCLAIMER,
      footage:
        footage && footage.state === 'ready'
          ? {
              id: footage.id,
              title: footage.title,
              durationMs: footage.durationMs,
              videoUrl: `${basePath}/video`,
              posterUrl: footage.posterKey ? `${basePath}/poster` : null,
              captionsUrl: transcript ? `${basePath}/captions.vtt` : null,
              // Web renditions (HLS, scrub previews, waveform) once made; `videoUrl` then serves the H.264 MP4.
              ...(await this.footageMedia.playbackMedia(footage, { basePath }, `${basePath}/video`)),
            }
          : null,
      steps: content.steps.map((step) => ({ ...step, estimatedMinutes: step.estimatedMinutes ?? null })),
      parts,
      checklist: checklist?.view ?? null,
      // What a signed-in reader may follow from here (POST /api/follows).
      followTargets: {
        workshop: { id: workshop.id, label: workshop.name },
        build: { id: build.id, label: build.title },
        assembly: checklist && content.assemblyId ? { id: content.assemblyId, label: checklist.view.assemblyName } : null,
      },
      marks: this.marksUsed(content.stepMarks, checklist?.evidenceMarks ?? [], footage?.id ?? null),
    };
  }

  async videoUrl(workshopSlug: string, guideSlug: string): Promise<string> {
    const footage = await this.guideFootage(workshopSlug, guideSlug);
    // The web MP4 plays in every browser; the original (perhaps HEVC, perhaps dropped) only until it exists.
    if (footage.renditionsState === 'ready') return this.footageMedia.downloadUrl(footage);
    return this.storage.presignedGetUrl(footage.objectKey, MEDIA_URL_TTL_SECONDS);
  }

  async posterUrl(workshopSlug: string, guideSlug: string): Promise<string> {
    const footage = await this.guideFootage(workshopSlug, guideSlug);
    if (!footage.posterKey) throw new NotFoundException('This footage has no poster frame');
    return this.storage.presignedGetUrl(footage.posterKey, MEDIA_URL_TTL_SECONDS);
  }

  async captions(workshopSlug: string, guideSlug: string): Promise<string> {
    const footage = await this.guideFootage(workshopSlug, guideSlug);
    return (await this.transcriptsService.exportWebVtt(footage.workshopId, footage.id)).body;
  }

  /** A window of the guide's transcript, so the reader's list fetches the cues it shows rather than every cue. */
  async cueWindow(workshopSlug: string, guideSlug: string, window: CueWindowQueryDto): Promise<CueWindowResponseDto> {
    const footage = await this.guideFootage(workshopSlug, guideSlug);
    const transcript = await this.transcripts.findOneBy({ footageId: footage.id, isActive: true });
    if (!transcript) throw new NotFoundException('This guide has no transcript');
    return this.transcriptsService.cueWindow(transcript.id, window);
  }

  /** A photo evidencing a live check of the guide's assembly (never a retired check's, nor another assembly's). */
  async evidencePhotoUrl(workshopSlug: string, guideSlug: string, evidenceId: string): Promise<string> {
    const { workshop, content } = await this.find(workshopSlug, guideSlug);
    const { items } = content.assemblyId ? await this.fitChecks.checklist(workshop.id, content.assemblyId) : { items: [] };
    const owner = items.find(({ check, evidence }) => check.state !== 'retired' && evidence.some((item) => item.id === evidenceId && item.kind === 'photo'));
    if (!owner) throw new NotFoundException('Photo not found');
    return this.fitChecks.evidencePhotoUrl(workshop.id, owner.check.id, evidenceId);
  }

  private async find(workshopSlug: string, guideSlug: string): Promise<PublishedGuide> {
    const workshop = await this.workshops.findOneBy({ slug: workshopSlug, disabledAt: IsNull() });
    const guide = workshop ? await this.guides.findOneBy({ workshopId: workshop.id, slug: guideSlug }) : null;
    const revision = guide?.publishedRevisionId ? await this.revisions.findOneBy({ id: guide.publishedRevisionId }) : null;
    if (!workshop || !guide || !revision) throw new NotFoundException('This guide is not published.');
    return { workshop, guide, revision, content: revision.content };
  }

  /** The published guide's footage, ready to play; 404 when the guide is not published or has none. */
  async guideFootage(workshopSlug: string, guideSlug: string): Promise<Footage> {
    const { workshop, content } = await this.find(workshopSlug, guideSlug);
    const footage = content.footageId ? await this.footage.findOneBy({ id: content.footageId, workshopId: workshop.id }) : null;
    if (!footage || footage.state !== 'ready') throw new NotFoundException('This guide has no footage to play');
    return footage;
  }

  private async footageWithPosters(ids: string[]): Promise<Set<string>> {
    if (ids.length === 0) return new Set();
    const rows = await this.footage.find({ where: { id: In(ids), state: 'ready' }, select: { id: true, posterKey: true } });
    return new Set(rows.filter((row) => row.posterKey).map((row) => row.id));
  }

  private async parts(workshopId: string, assemblyId: string) {
    const assembly = await this.assemblies.detail(workshopId, assemblyId).catch(() => null);
    return (assembly?.parts ?? []).map(({ position, part }) => ({
      partNumber: part.partNumber,
      maker: part.maker,
      title: part.title,
      category: part.category,
      position,
    }));
  }

  /** The live checklist with evidence a viewer can follow; evidence marks in the guide's footage seek the video. */
  private async checklist(workshop: Workshop, assemblyId: string, footageId: string | null, basePath: string) {
    const workshopId = workshop.id;
    const assembly = await this.assemblies.get(workshopId, assemblyId).catch(() => null);
    if (!assembly) return null;
    const { verdict, items } = await this.fitChecks.checklist(workshopId, assemblyId);
    const evidence = items.flatMap((item) => item.evidence);
    const markIds = evidence.map((item) => item.markId).filter((id): id is string => !!id);
    const checkIds = items.map((item) => item.check.id);
    // Marks attached as evidence, and check-evidence marks pointing at these checks.
    const markWhere = [...(markIds.length ? [{ id: In(markIds) }] : []), ...(checkIds.length ? [{ fitCheckId: In(checkIds) }] : [])];
    const marks = markWhere.length ? await this.marks.find({ where: markWhere }) : [];
    const measurementIds = evidence.map((item) => item.measurementId).filter((id): id is string => !!id);
    const measurements = measurementIds.length ? await this.measurements.findBy({ id: In(measurementIds) }) : [];
    // Members' names reach readers only where the workshop chose to show them.
    const confirmerIds = workshop.showMemberNames ? [...new Set(items.map(({ check }) => check.confirmedBy).filter((id): id is string => !!id))] : [];
    const confirmers = confirmerIds.length ? await this.users.find({ where: { id: In(confirmerIds) }, select: { id: true, displayName: true } }) : [];
    const checks = items
      .filter(({ check }) => check.state !== 'retired')
      .map(({ check, evidence: items }) => ({
        id: check.id,
        title: check.title,
        state: check.state,
        required: check.required,
        detail: typeof check.detail?.summary === 'string' ? check.detail.summary : check.reason || null,
        confirmedAt: check.confirmedAt?.toISOString() ?? null,
        confirmedBy: (check.confirmedBy && confirmers.find((user) => user.id === check.confirmedBy)?.displayName) || null,
        evidence: items.map((item) => {
          if (item.kind === 'mark') {
            const mark = marks.find((candidate) => candidate.id === item.markId);
            return { kind: 'mark' as const, label: mark?.label || item.note || 'Moment in the footage', startMs: mark && mark.footageId === footageId ? mark.startMs : null };
          }
          if (item.kind === 'measurement') {
            const reading = measurements.find((candidate) => candidate.id === item.measurementId);
            const label = reading ? `Reading ${formatLength(reading.valueNm, reading.unit, reading.instrumentResolutionNm)}` : 'Reading';
            return { kind: 'measurement' as const, label, startMs: reading && reading.footageId === footageId ? reading.footageTimeMs : null };
          }
          // The photo's address on this guide's public path, which redirects to a short-lived storage link.
          return { kind: 'photo' as const, label: item.note || 'Photo of the test fit', startMs: null, photoUrl: `${basePath}/evidence/${item.id}/photo` };
        }),
      }));
    const evidenceMarks = marks.filter((mark) => markIds.includes(mark.id) || (mark.fitCheckId !== null && checkIds.includes(mark.fitCheckId)));
    return { view: { assemblyName: assembly.name, verdict, checks }, evidenceMarks };
  }

  /** The marks the guide uses, in its footage: those on its steps (as published) and those evidencing its checks (live). */
  private marksUsed(stepMarks: GuideMarkContent[], evidenceMarks: Mark[], footageId: string | null) {
    const byId = new Map<string, { id: string; kind: Mark['kind']; startMs: number; endMs: number | null; label: string; stepId: string | null; fitCheckId: string | null }>();
    for (const mark of stepMarks) {
      if (mark.footageId === footageId) {
        byId.set(mark.id, { id: mark.id, kind: mark.kind, startMs: mark.startMs, endMs: mark.endMs, label: mark.label, stepId: mark.stepId, fitCheckId: mark.fitCheckId });
      }
    }
    for (const mark of evidenceMarks) {
      if (mark.footageId === footageId && !byId.has(mark.id)) {
        byId.set(mark.id, { id: mark.id, kind: mark.kind, startMs: mark.startMs, endMs: mark.endMs, label: mark.label, stepId: null, fitCheckId: mark.fitCheckId });
      }
    }
    return [...byId.values()].sort((a, b) => a.startMs - b.startMs);
  }
}
