import { createHash } from 'node:crypto';
import type { MarkKind } from '../marks/entities/mark.entity';
import type { SkillLevel } from '../engine/guide-effort';
import type { CautionLevel, SafetyTopic } from '../engine/safety-topics';
import type { Guide } from './entities/guide.entity';
import type { GuideStep } from './entities/guide-step.entity';

/** What a creator authored in a guide, as published in a revision and compared to the draft. */
export interface GuideContent {
  title: string;
  slug: string;
  summary: string;
  footageId: string | null;
  assemblyId: string | null;
  safetyTopics: SafetyTopic[];
  tools: string[];
  consumables: string[];
  /** Absent (not null) when not given, so revisions published before these fields existed keep their hash. */
  skillLevel?: SkillLevel;
  estimatedMinutes?: number;
  steps: GuideStepContent[];
  /** Marks tied to the steps when the revision was published. */
  stepMarks: GuideMarkContent[];
}

export interface GuideStepContent {
  id: string;
  position: number;
  title: string;
  body: string;
  footageId: string | null;
  startMs: number | null;
  endMs: number | null;
  caution: { level: CautionLevel; text: string } | null;
  /** Absent when not given (see GuideContent.skillLevel). */
  estimatedMinutes?: number;
}

export interface GuideMarkContent {
  id: string;
  footageId: string;
  kind: MarkKind;
  startMs: number;
  endMs: number | null;
  label: string;
  stepId: string | null;
  fitCheckId: string | null;
}

export function stepContent(step: GuideStep): GuideStepContent {
  return {
    id: step.id,
    position: step.position,
    title: step.title,
    body: step.body,
    footageId: step.footageId,
    startMs: step.startMs,
    endMs: step.endMs,
    caution: step.cautionLevel ? { level: step.cautionLevel, text: step.cautionText } : null,
    ...(step.estimatedMinutes !== null ? { estimatedMinutes: step.estimatedMinutes } : {}),
  };
}

export function guideContent(guide: Guide, steps: GuideStep[], stepMarks: GuideMarkContent[]): GuideContent {
  return {
    title: guide.title,
    slug: guide.slug,
    summary: guide.summary,
    footageId: guide.footageId,
    assemblyId: guide.assemblyId,
    safetyTopics: guide.safetyTopics,
    tools: guide.tools,
    consumables: guide.consumables,
    ...(guide.skillLevel !== null ? { skillLevel: guide.skillLevel } : {}),
    ...(guide.estimatedMinutes !== null ? { estimatedMinutes: guide.estimatedMinutes } : {}),
    steps: steps.map(stepContent),
    stepMarks,
  };
}

/** A stable fingerprint: equal content gives an equal hash whatever the key order in storage. */
export function contentHash(content: GuideContent): string {
  return createHash('sha256').update(stableJson(content)).digest('hex');
}

function stableJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(stableJson).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([key, item]) => `${JSON.stringify(key)}:${stableJson(item)}`).join(',')}}`;
  }
  return JSON.stringify(value ?? null);
}

/** The guide's words as plain text, for finding its safety topics. */
export function plainText(content: Pick<GuideContent, 'title' | 'summary' | 'steps'>): string {
  const parts = [content.title, content.summary];
  for (const step of content.steps) parts.push(step.title, step.body, step.caution?.text ?? '');
  return parts
    .join('\n')
    .replace(/<[^>]*>/g, ' ')
    .replace(/&nbsp;/g, ' ')
    .replace(/&amp;/g, '&');
}

/** Everything a reader can search in a published revision, as plain text (stored with the revision for FULLTEXT search). */
export function guideSearchText(content: GuideContent): string {
  return [plainText(content), ...content.tools, ...content.consumables].join('\n');
}
