import { toMarkResponse } from '../marks/mark.mapper';
import type { Mark } from '../marks/entities/mark.entity';
import type { User } from '../users/entities/user.entity';
import type { SafetyTopic } from '../engine/safety-topics';
import type { GuideRevision } from './entities/guide-revision.entity';
import type { GuideStep } from './entities/guide-step.entity';
import type { Guide } from './entities/guide.entity';
import { stepContent, type GuideContent } from './guide-content';
import type { GuideResponseDto, GuideRevisionResponseDto, GuideStepResponseDto, GuideSummaryDto } from './dto/guide-response.dto';

/** A draft's steps and content, with the revision it is compared to. */
export interface GuideState {
  steps: GuideStep[];
  content: GuideContent;
  published: Pick<GuideRevision, 'id' | 'number' | 'note' | 'publishedAt' | 'contentHash'> | null;
  hasUnpublishedChanges: boolean;
}

export function publicGuidePath(workshopSlug: string, guideSlug: string): string {
  return `/guides/${workshopSlug}/${guideSlug}`;
}

function publication(guide: Guide, state: GuideState, workshopSlug: string) {
  return {
    status: state.published ? ('published' as const) : ('draft' as const),
    hasUnpublishedChanges: state.hasUnpublishedChanges,
    publishedRevision: state.published
      ? { number: state.published.number, publishedAt: state.published.publishedAt.toISOString(), note: state.published.note }
      : null,
    publicPath: state.published ? publicGuidePath(workshopSlug, guide.slug) : null,
  };
}

export function toGuideSummary(guide: Guide, state: GuideState, workshopSlug: string): GuideSummaryDto {
  return {
    id: guide.id,
    buildId: guide.buildId,
    title: guide.title,
    slug: guide.slug,
    ...publication(guide, state, workshopSlug),
    stepCount: state.steps.length,
    skillLevel: guide.skillLevel,
    estimatedMinutes: guide.estimatedMinutes,
    updatedAt: guide.updatedAt.toISOString(),
  };
}

export function toStepResponse(step: GuideStep, marks: Mark[]): GuideStepResponseDto {
  return { ...stepContent(step), estimatedMinutes: step.estimatedMinutes, marks: marks.map(toMarkResponse) };
}

export function toGuideResponse(
  guide: Guide,
  state: GuideState,
  steps: GuideStepResponseDto[],
  detectedSafetyTopics: SafetyTopic[],
  workshopSlug: string,
): GuideResponseDto {
  return {
    id: guide.id,
    workshopId: guide.workshopId,
    buildId: guide.buildId,
    title: guide.title,
    slug: guide.slug,
    summary: guide.summary,
    footageId: guide.footageId,
    assemblyId: guide.assemblyId,
    safetyTopics: guide.safetyTopics,
    detectedSafetyTopics,
    tools: guide.tools,
    consumables: guide.consumables,
    skillLevel: guide.skillLevel,
    estimatedMinutes: guide.estimatedMinutes,
    ...publication(guide, state, workshopSlug),
    steps,
    createdAt: guide.createdAt.toISOString(),
    updatedAt: guide.updatedAt.toISOString(),
  };
}

export function toRevisionResponse(revision: Pick<GuideRevision, 'number' | 'note' | 'publishedAt'>, publisher: User | null): GuideRevisionResponseDto {
  return {
    number: revision.number,
    note: revision.note,
    publishedAt: revision.publishedAt.toISOString(),
    publishedBy: publisher ? { displayName: publisher.displayName } : null,
  };
}
