import type { ApiSchema } from '@/lib/api-types';
import type { SkillLevel } from '@/lib/guide-effort';

/** Shapes of the guide editor routes (api/src/guides; OpenAPI at /api/docs). */

export type SafetyTopic = ApiSchema<'GuideResponseDto'>['safetyTopics'][number];
export const SAFETY_TOPICS = ['lifting', 'rotating_parts', 'high_voltage', 'welding', 'pressing'] as const satisfies readonly SafetyTopic[];

/** The ANSI Z535 signal words, most severe first. */
export type CautionLevel = ApiSchema<'GuideCautionDto'>['level'];
export const CAUTION_LEVELS = ['DANGER', 'WARNING', 'CAUTION', 'NOTICE'] as const satisfies readonly CautionLevel[];

export type Guide = ApiSchema<'GuideResponseDto'>;
export type GuideStep = ApiSchema<'GuideStepResponseDto'>;
export type Caution = ApiSchema<'GuideCautionDto'>;
/** A mark linked to a step (the marks routes' own shape). */
export type StepMark = GuideStep['marks'][number];
export type PublishedRevision = ApiSchema<'GuidePublishedRevisionDto'>;
export type GuideSummary = ApiSchema<'GuideSummaryDto'>;
export type Revision = ApiSchema<'GuideRevisionResponseDto'>;

/** What the editor sends for a guide's details (PATCH takes any of them). */
export interface GuideInput {
  title: string;
  summary: string;
  footageId: string | null;
  assemblyId: string | null;
  safetyTopics: SafetyTopic[];
  tools: string[];
  consumables: string[];
  skillLevel: SkillLevel | null;
  estimatedMinutes: number | null;
}

export interface StepInput {
  title: string;
  body: string;
  footageId: string | null;
  startMs: number | null;
  endMs: number | null;
  caution: Caution | null;
  estimatedMinutes: number | null;
}

/** Only what the pickers need from the footage and assemblies routes. */
export interface FootageChoice {
  id: string;
  title: string;
  state: 'uploading' | 'processing' | 'ready' | 'failed';
  durationMs: number | null;
  width: number | null;
  height: number | null;
  posterUrl: string | null;
}

export interface AssemblyChoice {
  id: string;
  name: string;
}

export interface Playback {
  url: string;
  expiresAt: string;
  /** The HLS master (same-origin API path), null until the web renditions are ready; absent from an older API. */
  hlsUrl?: string | null;
  displayWidth?: number | null;
  displayHeight?: number | null;
}
