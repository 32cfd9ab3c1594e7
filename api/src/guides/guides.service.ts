import { ConflictException, Injectable, NotFoundException, UnprocessableEntityException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { In, IsNull, Not, Repository } from 'typeorm';
import { Assembly } from '../assemblies/entities/assembly.entity';
import { BuildsService } from '../builds/builds.service';
import { isDuplicateKey } from '../common/database/errors';
import { detectSafetyTopics } from '../engine/safety-topics';
import { Footage } from '../footage/entities/footage.entity';
import { Mark } from '../marks/entities/mark.entity';
import { User } from '../users/entities/user.entity';
import { Workshop } from '../workshops/entities/workshop.entity';
import type { CreateGuideDto, CreateStepDto, StepFieldsDto, UpdateGuideDto, UpdateStepDto } from './dto/guide.dto';
import { GuideRevision } from './entities/guide-revision.entity';
import { GuideStep } from './entities/guide-step.entity';
import { Guide } from './entities/guide.entity';
import { contentHash, guideContent, guideSearchText, plainText, type GuideMarkContent } from './guide-content';
import { toGuideResponse, toGuideSummary, toRevisionResponse, toStepResponse, type GuideState } from './guide.mapper';
import { sanitizeRichText, slugFromTitle } from './rich-text';
import type {
  GuideResponseDto,
  GuideRevisionResponseDto,
  GuideStepChoiceDto,
  GuideStepResponseDto,
  GuideSummaryDto,
} from './dto/guide-response.dto';

const SLUG_ATTEMPTS = 20;

/**
 * Writing and publishing build guides. Every lookup goes through the workshop, so another workshop's
 * ids answer 404; footage and assemblies a guide points at must belong to the guide's build.
 */
@Injectable()
export class GuidesService {
  constructor(
    @InjectRepository(Guide) private readonly guides: Repository<Guide>,
    @InjectRepository(GuideStep) private readonly steps: Repository<GuideStep>,
    @InjectRepository(GuideRevision) private readonly revisions: Repository<GuideRevision>,
    @InjectRepository(Mark) private readonly marks: Repository<Mark>,
    @InjectRepository(Footage) private readonly footage: Repository<Footage>,
    @InjectRepository(Assembly) private readonly assemblies: Repository<Assembly>,
    @InjectRepository(Workshop) private readonly workshops: Repository<Workshop>,
    @InjectRepository(User) private readonly users: Repository<User>,
    private readonly builds: BuildsService,
  ) {}

  // ---- guides ----

  /** A guide of the workshop with a published revision, by its slug. */
  publishedBySlug(workshopId: string, slug: string): Promise<Guide | null> {
    return this.guides.findOneBy({ workshopId, slug, publishedRevisionId: Not(IsNull()) });
  }

  /** Guides by id (for lists in other domains that name them); unknown ids are simply absent. */
  byIds(ids: string[]): Promise<Guide[]> {
    return this.guides.findBy({ id: In(ids) });
  }

  async list(workshopId: string, buildId: string): Promise<GuideSummaryDto[]> {
    await this.builds.get(workshopId, buildId);
    const guides = await this.guides.find({ where: { workshopId, buildId }, order: { createdAt: 'DESC' } });
    const workshop = await this.workshopOf(workshopId);
    return Promise.all(guides.map(async (guide) => toGuideSummary(guide, await this.stateOf(guide), workshop.slug)));
  }

  async create(workshopId: string, buildId: string, userId: string, input: CreateGuideDto): Promise<GuideResponseDto> {
    await this.builds.get(workshopId, buildId);
    const guide = this.guides.create({
      workshopId,
      buildId,
      title: input.title.trim(),
      summary: '',
      footageId: null,
      assemblyId: null,
      safetyTopics: [],
      tools: [],
      consumables: [],
      skillLevel: null,
      estimatedMinutes: null,
      publishedRevisionId: null,
      createdBy: userId,
    });
    await this.applyGuideFields(guide, input);
    await this.saveWithFreeSlug(guide);
    return this.describe(workshopId, guide.id);
  }

  async describe(workshopId: string, guideId: string): Promise<GuideResponseDto> {
    const guide = await this.get(workshopId, guideId);
    const workshop = await this.workshopOf(workshopId);
    const state = await this.stateOf(guide);
    const marks = await this.stepMarks(state.steps.map((step) => step.id));
    const steps = state.steps.map((step) => toStepResponse(step, marks.filter((mark) => mark.guideStepId === step.id)));
    const detected = detectSafetyTopics(plainText(guideContent(guide, state.steps, [])));
    return toGuideResponse(guide, state, steps, detected, workshop.slug);
  }

  async update(workshopId: string, guideId: string, input: UpdateGuideDto): Promise<GuideResponseDto> {
    const guide = await this.get(workshopId, guideId);
    const retitled = input.title !== undefined && input.title.trim() !== guide.title;
    if (input.title !== undefined) guide.title = input.title.trim();
    await this.applyGuideFields(guide, input);
    // The public address stays put once a guide has been published; a draft's follows its title.
    const everPublished = await this.revisions.existsBy({ guideId });
    if (retitled && !everPublished) await this.saveWithFreeSlug(guide);
    else await this.guides.save(guide);
    return this.describe(workshopId, guideId);
  }

  async remove(workshopId: string, guideId: string): Promise<void> {
    const guide = await this.get(workshopId, guideId);
    await this.guides.remove(guide);
  }

  // ---- steps ----

  async addStep(workshopId: string, guideId: string, input: CreateStepDto): Promise<GuideStepResponseDto> {
    const guide = await this.get(workshopId, guideId);
    const last = await this.steps.maximum('position', { guideId });
    const step = this.steps.create({
      guideId,
      position: (last ?? 0) + 1,
      title: input.title.trim(),
      body: '',
      footageId: null,
      startMs: null,
      endMs: null,
      cautionLevel: null,
      cautionText: '',
      estimatedMinutes: null,
    });
    await this.applyStepFields(guide, step, input);
    await this.steps.save(step);
    await this.touch(guide);
    return toStepResponse(step, []);
  }

  async updateStep(workshopId: string, guideId: string, stepId: string, input: UpdateStepDto): Promise<GuideStepResponseDto> {
    const guide = await this.get(workshopId, guideId);
    const step = await this.stepOf(guide, stepId);
    if (input.title !== undefined) step.title = input.title.trim();
    await this.applyStepFields(guide, step, input);
    await this.steps.save(step);
    await this.touch(guide);
    return toStepResponse(step, await this.stepMarks([step.id]));
  }

  async removeStep(workshopId: string, guideId: string, stepId: string): Promise<void> {
    const guide = await this.get(workshopId, guideId);
    const step = await this.stepOf(guide, stepId);
    await this.steps.manager.transaction(async (manager) => {
      await manager.delete(GuideStep, { id: step.id });
      await manager
        .createQueryBuilder()
        .update(GuideStep)
        .set({ position: () => 'position - 1' })
        .where('guide_id = :guideId AND position > :position', { guideId, position: step.position })
        .execute();
    });
    await this.touch(guide);
  }

  async reorderSteps(workshopId: string, guideId: string, stepIds: string[]): Promise<GuideResponseDto> {
    const guide = await this.get(workshopId, guideId);
    const current = await this.steps.find({ where: { guideId }, select: { id: true } });
    const known = new Set(current.map((step) => step.id));
    if (stepIds.length !== known.size || stepIds.some((id) => !known.has(id))) {
      throw new UnprocessableEntityException({
        message: `Give every step of this guide exactly once (${known.size} steps).`,
        errors: { stepIds: 'must list every step of the guide exactly once' },
      });
    }
    await this.steps.manager.transaction(async (manager) => {
      for (const [index, id] of stepIds.entries()) await manager.update(GuideStep, { id, guideId }, { position: index + 1 });
    });
    await this.touch(guide);
    return this.describe(workshopId, guideId);
  }

  /** Steps a mark can be tied to; with a footage, the steps anchored in it. */
  async stepChoices(workshopId: string, footageId?: string): Promise<GuideStepChoiceDto[]> {
    const query = this.steps
      .createQueryBuilder('step')
      .innerJoin(Guide, 'guide', 'guide.id = step.guide_id')
      .select(['step.id AS id', 'guide.id AS guideId', 'guide.title AS guideTitle', 'step.position AS position', 'step.title AS title'])
      .addSelect('step.start_ms', 'startMs')
      .where('guide.workshop_id = :workshopId', { workshopId })
      .orderBy('guide.title', 'ASC')
      .addOrderBy('step.position', 'ASC');
    if (footageId) query.andWhere('step.footage_id = :footageId', { footageId });
    const rows = await query.getRawMany<{ id: string; guideId: string; guideTitle: string; position: number; title: string; startMs: number | null }>();
    return rows.map((row) => ({ ...row, position: Number(row.position), startMs: row.startMs === null ? null : Number(row.startMs) }));
  }

  // ---- publishing ----

  async publish(workshopId: string, guideId: string, userId: string, note: string | undefined): Promise<GuideRevisionResponseDto> {
    const guide = await this.get(workshopId, guideId);
    const state = await this.stateOf(guide);
    if (state.steps.length === 0) {
      throw new UnprocessableEntityException('A guide needs at least one step before it can be published.');
    }
    const revision = await this.guides.manager.transaction(async (manager) => {
      // Lock the guide row so two publishes at once cannot take the same number.
      await manager.findOne(Guide, { where: { id: guide.id }, lock: { mode: 'pessimistic_write' } });
      const last = await manager.maximum(GuideRevision, 'number', { guideId });
      const saved = await manager.save(
        manager.create(GuideRevision, {
          guideId,
          number: (last ?? 0) + 1,
          note: note?.trim() ?? '',
          content: state.content,
          contentHash: contentHash(state.content),
          publishedBy: userId,
          publishedAt: new Date(),
        }),
      );
      await manager.update(Guide, { id: guide.id }, { publishedRevisionId: saved.id });
      // The revision's words for search, in the same transaction: a published guide is findable the moment it is public.
      await manager.query(
        'INSERT INTO guide_revision_search (revision_id, guide_id, workshop_id, footage_id, assembly_id, title, search_text) VALUES (?, ?, ?, ?, ?, ?, ?)',
        [saved.id, guide.id, guide.workshopId, state.content.footageId, state.content.assemblyId, state.content.title, guideSearchText(state.content)],
      );
      return saved;
    });
    return toRevisionResponse(revision, null);
  }

  async listRevisions(workshopId: string, guideId: string): Promise<GuideRevisionResponseDto[]> {
    await this.get(workshopId, guideId);
    const revisions = await this.revisions.find({
      where: { guideId },
      order: { number: 'DESC' },
      select: { id: true, number: true, note: true, publishedAt: true, publishedBy: true },
    });
    const publisherIds = [...new Set(revisions.map((revision) => revision.publishedBy).filter((id): id is string => id !== null))];
    const publishers = publisherIds.length ? await this.users.findBy({ id: In(publisherIds) }) : [];
    return revisions.map((revision) => toRevisionResponse(revision, publishers.find((user) => user.id === revision.publishedBy) ?? null));
  }

  /** Takes the guide out of public view; its revisions stay for a later publish. */
  async withdraw(workshopId: string, guideId: string): Promise<void> {
    const guide = await this.get(workshopId, guideId);
    if (!guide.publishedRevisionId) throw new ConflictException('This guide is not published.');
    await this.guides.update({ id: guide.id }, { publishedRevisionId: null });
  }

  // ---- shared ----

  async get(workshopId: string, guideId: string): Promise<Guide> {
    const guide = await this.guides.findOneBy({ id: guideId, workshopId });
    if (!guide) throw new NotFoundException('Guide not found');
    return guide;
  }

  /** The draft as it would be published, and how it compares with the published revision. */
  private async stateOf(guide: Guide): Promise<GuideState> {
    const steps = await this.steps.find({ where: { guideId: guide.id }, order: { position: 'ASC' } });
    const content = guideContent(guide, steps, await this.stepMarkContent(steps.map((step) => step.id)));
    const published = guide.publishedRevisionId
      ? await this.revisions.findOne({
          where: { id: guide.publishedRevisionId },
          select: { id: true, number: true, note: true, publishedAt: true, contentHash: true },
        })
      : null;
    const latest = await this.revisions.findOne({ where: { guideId: guide.id }, order: { number: 'DESC' }, select: { contentHash: true, id: true } });
    const compareWith = published ?? latest;
    return {
      steps,
      content,
      published,
      hasUnpublishedChanges: compareWith ? compareWith.contentHash !== contentHash(content) : true,
    };
  }

  private async stepMarks(stepIds: string[]): Promise<Mark[]> {
    if (stepIds.length === 0) return [];
    return this.marks.find({ where: { guideStepId: In(stepIds) }, order: { startMs: 'ASC' } });
  }

  private async stepMarkContent(stepIds: string[]): Promise<GuideMarkContent[]> {
    return (await this.stepMarks(stepIds)).map((mark) => ({
      id: mark.id,
      footageId: mark.footageId,
      kind: mark.kind,
      startMs: mark.startMs,
      endMs: mark.endMs,
      label: mark.label,
      stepId: mark.guideStepId,
      fitCheckId: mark.fitCheckId,
    }));
  }

  private async applyGuideFields(guide: Guide, input: UpdateGuideDto): Promise<void> {
    if (input.summary !== undefined) guide.summary = sanitizeRichText(input.summary);
    if (input.footageId !== undefined) {
      if (input.footageId !== null) await this.requireBuildFootage(guide, input.footageId, 'footageId');
      guide.footageId = input.footageId;
    }
    if (input.assemblyId !== undefined) {
      if (input.assemblyId !== null && !(await this.assemblies.existsBy({ id: input.assemblyId, workshopId: guide.workshopId, buildId: guide.buildId }))) {
        throw fieldError('assemblyId', 'Choose an assembly of this guide’s build.');
      }
      guide.assemblyId = input.assemblyId;
    }
    if (input.safetyTopics !== undefined) guide.safetyTopics = input.safetyTopics;
    if (input.tools !== undefined) guide.tools = input.tools.map((item) => item.trim());
    if (input.consumables !== undefined) guide.consumables = input.consumables.map((item) => item.trim());
    if (input.skillLevel !== undefined) guide.skillLevel = input.skillLevel;
    if (input.estimatedMinutes !== undefined) guide.estimatedMinutes = input.estimatedMinutes;
  }

  private async applyStepFields(guide: Guide, step: GuideStep, input: StepFieldsDto): Promise<void> {
    if (input.body !== undefined) step.body = sanitizeRichText(input.body);
    if (input.caution !== undefined) {
      step.cautionLevel = input.caution?.level ?? null;
      step.cautionText = input.caution?.text.trim() ?? '';
    }
    if (input.footageId !== undefined) step.footageId = input.footageId;
    if (input.startMs !== undefined) step.startMs = input.startMs;
    if (input.endMs !== undefined) step.endMs = input.endMs;
    if (input.estimatedMinutes !== undefined) step.estimatedMinutes = input.estimatedMinutes;
    if (step.startMs === null) {
      step.endMs = null;
    } else {
      // A time without a footage means the guide's own footage.
      step.footageId ??= guide.footageId;
      if (!step.footageId) throw fieldError('footageId', 'Choose the guide’s footage (or the step’s) before giving the step a time.');
    }
    if (step.footageId) {
      const footage = await this.requireBuildFootage(guide, step.footageId, 'footageId');
      if (step.startMs !== null && footage.durationMs !== null && step.startMs >= footage.durationMs) {
        throw fieldError('startMs', `The footage is only ${formatSeconds(footage.durationMs)} long.`);
      }
    }
    if (step.endMs !== null && step.startMs !== null && step.endMs <= step.startMs) {
      throw fieldError('endMs', 'The end of a step must come after its start.');
    }
  }

  private async requireBuildFootage(guide: Guide, footageId: string, field: string): Promise<Footage> {
    const footage = await this.footage.findOneBy({ id: footageId, workshopId: guide.workshopId, buildId: guide.buildId });
    if (!footage) throw fieldError(field, 'Choose a footage of this guide’s build.');
    return footage;
  }

  private async stepOf(guide: Guide, stepId: string): Promise<GuideStep> {
    const step = await this.steps.findOneBy({ id: stepId, guideId: guide.id });
    if (!step) throw new NotFoundException('Step not found');
    return step;
  }

  /** Step edits change the guide: its updated_at says when the draft last moved. */
  private async touch(guide: Guide): Promise<void> {
    await this.guides.update({ id: guide.id }, { updatedAt: new Date() });
  }

  private async workshopOf(workshopId: string): Promise<Workshop> {
    return this.workshops.findOneByOrFail({ id: workshopId });
  }

  /** Saves the guide under its title's slug, or the first free "-2", "-3"… in the workshop. */
  private async saveWithFreeSlug(guide: Guide): Promise<void> {
    const base = slugFromTitle(guide.title);
    for (let attempt = 1; attempt <= SLUG_ATTEMPTS; attempt++) {
      guide.slug = attempt === 1 ? base : `${base}-${attempt}`;
      if (await this.guides.existsBy({ workshopId: guide.workshopId, slug: guide.slug, id: Not(guide.id) })) continue;
      try {
        await this.guides.save(guide);
        return;
      } catch (error) {
        if (!isDuplicateKey(error)) throw error;
      }
    }
    throw new ConflictException({ message: 'Too many guides share this title; choose another.', errors: { title: 'choose another title' } });
  }
}

function fieldError(field: string, message: string): UnprocessableEntityException {
  return new UnprocessableEntityException({ message, errors: { [field]: message } });
}

function formatSeconds(ms: number): string {
  const seconds = Math.floor(ms / 1000);
  return `${Math.floor(seconds / 60)}:${String(seconds % 60).padStart(2, '0')}`;
}

