import { BadRequestException, ConflictException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { FitChecksService } from '../fit-checks/fit-checks.service';
import { FootageService } from '../footage/footage.service';
import type { Measurement } from '../measurements/entities/measurement.entity';
import { MeasurementsService } from '../measurements/measurements.service';
import { PartsService } from '../parts/parts.service';
import { CreateMarkDto, MarkLinksDto, UpdateMarkDto, AcceptSuggestionDto, type PageQueryDto } from './dto/mark.dto';
import { Mark, MarkKind } from './entities/mark.entity';
import { MarkSuggestion, SuggestionStatus } from './entities/mark-suggestion.entity';
import { resolutionOfDigits } from './spoken-reading';
import { GuideStepLinks } from './guide-step-links.port';
import { referenceNotFound } from '../common/http/field-errors';

type LinkField = keyof Required<MarkLinksDto>;

/** Which link each kind may carry; any other link given with that kind is refused. */
const LINK_OF_KIND: Partial<Record<MarkKind, LinkField>> = {
  part: 'partId',
  measurement: 'measurementId',
  check_evidence: 'fitCheckId',
  step: 'guideStepId',
};
const LINK_FIELDS: LinkField[] = ['partId', 'measurementId', 'fitCheckId', 'guideStepId'];

/** Marks of a footage and the suggestions mined from its transcript; every lookup goes through the workshop. */
@Injectable()
export class MarksService {
  constructor(
    @InjectRepository(Mark) private readonly marks: Repository<Mark>,
    @InjectRepository(MarkSuggestion) private readonly suggestions: Repository<MarkSuggestion>,
    @Inject(FootageService) private readonly footage: FootageService,
    @Inject(MeasurementsService) private readonly measurements: MeasurementsService,
    @Inject(PartsService) private readonly parts: PartsService,
    @Inject(FitChecksService) private readonly fitChecks: FitChecksService,
    @Inject(GuideStepLinks) private readonly guideSteps: GuideStepLinks,
  ) {}

  async list(workshopId: string, footageId: string, kind?: MarkKind): Promise<Mark[]> {
    return (await this.listPage(workshopId, footageId, kind)).items;
  }

  /** In time order; a page when `page.limit` is given (ids break ties, so pages never repeat or skip a mark). */
  async listPage(workshopId: string, footageId: string, kind?: MarkKind, page: PageQueryDto = {}): Promise<{ items: Mark[]; total: number }> {
    await this.footage.get(workshopId, footageId);
    const [items, total] = await this.marks.findAndCount({
      where: { workshopId, footageId, ...(kind ? { kind } : {}) },
      order: { startMs: 'ASC', createdAt: 'ASC', id: 'ASC' },
      ...(page.limit !== undefined ? { skip: page.offset ?? 0, take: page.limit } : {}),
    });
    return { items, total };
  }

  async create(workshopId: string, footageId: string, actorId: string, input: CreateMarkDto): Promise<Mark> {
    const footage = await this.footage.get(workshopId, footageId);
    const mark = this.marks.create({
      workshopId,
      footageId,
      startMs: input.startMs,
      endMs: input.endMs ?? null,
      kind: input.kind,
      partId: input.partId ?? null,
      measurementId: input.measurementId ?? null,
      fitCheckId: input.fitCheckId ?? null,
      guideStepId: input.guideStepId ?? null,
      label: input.label?.trim() ?? '',
      createdBy: actorId,
    });
    await this.validate(workshopId, mark, footage.durationMs);
    const saved = await this.marks.save(mark);
    await this.syncCheckEvidence(saved, actorId);
    return saved;
  }

  async update(workshopId: string, footageId: string, markId: string, actorId: string, input: UpdateMarkDto): Promise<Mark> {
    const footage = await this.footage.get(workshopId, footageId);
    const mark = await this.get(workshopId, footageId, markId);
    const previousStartMs = mark.startMs;
    if (input.startMs !== undefined) mark.startMs = input.startMs;
    if (input.endMs !== undefined) mark.endMs = input.endMs;
    if (input.kind !== undefined) mark.kind = input.kind;
    if (input.label !== undefined) mark.label = input.label.trim();
    for (const field of LINK_FIELDS) {
      const value = input[field];
      if (value !== undefined) mark[field] = value;
    }
    // Changing the kind drops links the new kind cannot carry, unless the same request sets them.
    if (input.kind !== undefined) {
      for (const field of LINK_FIELDS) if (field !== LINK_OF_KIND[mark.kind] && input[field] === undefined) mark[field] = null;
    }
    await this.validate(workshopId, mark, footage.durationMs);
    const saved = await this.marks.save(mark);
    await this.syncCheckEvidence(saved, actorId);
    if (saved.kind === 'measurement' && saved.measurementId && saved.startMs !== previousStartMs) {
      // A reading taken at the mark's moment moves with it; one tied to another moment keeps its own.
      await this.measurements.followMark(saved.measurementId, saved.footageId, previousStartMs, saved.startMs);
    }
    return saved;
  }

  /** A check-evidence mark is evidence of its fit check; the fit-check domain keeps that list in step. */
  private async syncCheckEvidence(mark: Mark, actorId: string): Promise<void> {
    await this.fitChecks.syncMarkEvidence(mark.id, mark.kind === 'check_evidence' ? mark.fitCheckId : null, actorId);
  }

  async remove(workshopId: string, footageId: string, markId: string): Promise<void> {
    const mark = await this.get(workshopId, footageId, markId);
    await this.marks.remove(mark);
  }

  async listSuggestions(workshopId: string, footageId: string, status: SuggestionStatus = 'pending'): Promise<MarkSuggestion[]> {
    return (await this.listSuggestionsPage(workshopId, footageId, status)).items;
  }

  async listSuggestionsPage(
    workshopId: string,
    footageId: string,
    status: SuggestionStatus = 'pending',
    page: PageQueryDto = {},
  ): Promise<{ items: MarkSuggestion[]; total: number }> {
    await this.footage.get(workshopId, footageId);
    const [items, total] = await this.suggestions.findAndCount({
      where: { workshopId, footageId, status },
      order: { startMs: 'ASC', phrase: 'ASC', id: 'ASC' },
      ...(page.limit !== undefined ? { skip: page.offset ?? 0, take: page.limit } : {}),
    });
    return { items, total };
  }

  /**
   * Accepting makes the mark at the cue's time; a measurement suggestion also records the reading
   * (value and unit as spoken, linked to the footage at that time). The suggestion is claimed first
   * with a conditional update, so two people accepting at once make one mark.
   */
  async accept(
    workshopId: string,
    footageId: string,
    suggestionId: string,
    actorId: string,
    input: AcceptSuggestionDto,
  ): Promise<{ suggestion: MarkSuggestion; mark: Mark; measurement: Measurement | null }> {
    const suggestion = await this.pendingSuggestion(workshopId, footageId, suggestionId);
    if (suggestion.kind === 'measurement' && Boolean(input.featureId) === Boolean(input.interfaceId)) {
      throw new BadRequestException('Say what was measured: give exactly one of featureId (a part feature) or interfaceId');
    }
    await this.claim(suggestion, 'accepted', actorId);
    try {
      let measurement: Measurement | null = null;
      if (suggestion.kind === 'measurement' && suggestion.value !== null && suggestion.unit !== null) {
        measurement = await this.measurements.create(workshopId, actorId, {
          featureId: input.featureId,
          interfaceId: input.interfaceId,
          quantity: input.quantity ?? 'other',
          value: suggestion.value,
          unit: suggestion.unit,
          instrumentKind: input.instrumentKind ?? 'other',
          resolution: input.resolution ?? resolutionOfDigits(suggestion.value),
          footageId,
          footageTimeMs: suggestion.startMs,
          note: `Spoken in the footage: “${suggestion.phrase}”`,
        });
      }
      const mark = await this.marks.save(
        this.marks.create({
          workshopId,
          footageId,
          startMs: suggestion.startMs,
          endMs: suggestion.endMs > suggestion.startMs ? suggestion.endMs : null,
          kind: suggestion.kind,
          partId: suggestion.kind === 'part' ? suggestion.partId : null,
          measurementId: measurement?.id ?? null,
          fitCheckId: null,
          guideStepId: null,
          label: input.label?.trim() || suggestion.phrase.slice(0, 200),
          createdBy: actorId,
        }),
      );
      await this.suggestions.update({ id: suggestion.id }, { markId: mark.id });
      return { suggestion: { ...suggestion, status: 'accepted', markId: mark.id }, mark, measurement };
    } catch (error) {
      // Hand the suggestion back so the creator can fix the input and accept again.
      await this.suggestions.update({ id: suggestion.id }, { status: 'pending', decidedBy: null, decidedAt: null });
      throw error;
    }
  }

  async dismiss(workshopId: string, footageId: string, suggestionId: string, actorId: string): Promise<MarkSuggestion> {
    const suggestion = await this.pendingSuggestion(workshopId, footageId, suggestionId);
    await this.claim(suggestion, 'dismissed', actorId);
    return { ...suggestion, status: 'dismissed' };
  }

  private async get(workshopId: string, footageId: string, markId: string): Promise<Mark> {
    const mark = await this.marks.findOneBy({ id: markId, workshopId, footageId });
    if (!mark) throw new NotFoundException('Mark not found');
    return mark;
  }

  private async pendingSuggestion(workshopId: string, footageId: string, suggestionId: string): Promise<MarkSuggestion> {
    await this.footage.get(workshopId, footageId);
    const suggestion = await this.suggestions.findOneBy({ id: suggestionId, workshopId, footageId });
    if (!suggestion) throw new NotFoundException('Suggestion not found');
    if (suggestion.status !== 'pending') throw new ConflictException(`This suggestion was already ${suggestion.status}`);
    return suggestion;
  }

  private async claim(suggestion: MarkSuggestion, status: SuggestionStatus, actorId: string): Promise<void> {
    const result = await this.suggestions.update(
      { id: suggestion.id, status: 'pending' },
      { status, decidedBy: actorId, decidedAt: new Date() },
    );
    if (!result.affected) throw new ConflictException('This suggestion was decided meanwhile; reload the suggestions');
  }

  /** Times inside the footage, a link only of the kind's own sort, and every linked record in this workshop. */
  private async validate(workshopId: string, mark: Mark, durationMs: number | null): Promise<void> {
    if (durationMs !== null && mark.startMs > durationMs) {
      throw new BadRequestException(`startMs ${mark.startMs} is past the end of the footage (${durationMs} ms)`);
    }
    if (mark.endMs !== null) {
      if (mark.endMs <= mark.startMs) throw new BadRequestException('endMs must be after startMs');
      if (durationMs !== null && mark.endMs > durationMs) {
        throw new BadRequestException(`endMs ${mark.endMs} is past the end of the footage (${durationMs} ms)`);
      }
    }
    const allowed = LINK_OF_KIND[mark.kind];
    for (const field of LINK_FIELDS) {
      if (mark[field] !== null && field !== allowed) {
        throw new BadRequestException(
          allowed ? `A ${mark.kind} mark links with ${allowed}, not ${field}` : `A ${mark.kind} mark links to nothing; remove ${field}`,
        );
      }
    }
    if (mark.partId && !(await this.parts.existsInWorkshop(workshopId, mark.partId))) throw referenceNotFound('partId', 'Part');
    if (mark.measurementId && !(await this.measurements.existsInWorkshop(workshopId, mark.measurementId))) {
      throw referenceNotFound('measurementId', 'Measurement');
    }
    if (mark.fitCheckId && !(await this.fitChecks.existsInWorkshop(workshopId, mark.fitCheckId))) {
      throw referenceNotFound('fitCheckId', 'Fit check');
    }
    if (mark.guideStepId && !(await this.guideSteps.stepInWorkshop(workshopId, mark.guideStepId))) {
      throw referenceNotFound('guideStepId', 'Guide step');
    }
  }
}
