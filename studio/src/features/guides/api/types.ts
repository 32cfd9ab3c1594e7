import type { SkillLevel } from '@/lib/guide-effort';

/** Shapes of the guide editor routes (api/src/guides; OpenAPI at /api/docs). */

export const SAFETY_TOPICS = ['lifting', 'rotating_parts', 'high_voltage', 'welding', 'pressing'] as const;
export type SafetyTopic = (typeof SAFETY_TOPICS)[number];

/** The ANSI Z535 signal words, most severe first. */
export const CAUTION_LEVELS = ['DANGER', 'WARNING', 'CAUTION', 'NOTICE'] as const;
export type CautionLevel = (typeof CAUTION_LEVELS)[number];

export interface Caution {
  level: CautionLevel;
  text: string;
}

/** A mark linked to a step (the mark JSON of GET .../marks; only what the editor shows). */
export interface StepMark {
  id: string;
  footageId: string;
  kind: string;
  label: string;
  startMs: number;
  endMs: number | null;
}

export interface GuideStep {
  id: string;
  /** 1-based. */
  position: number;
  title: string;
  /** Sanitised HTML from the server; may be ''. */
  body: string;
  footageId: string | null;
  startMs: number | null;
  endMs: number | null;
  caution: Caution | null;
  estimatedMinutes: number | null;
  marks: StepMark[];
}

export interface PublishedRevision {
  number: number;
  publishedAt: string;
  note: string;
}

export interface Guide {
  id: string;
  workshopId: string;
  buildId: string;
  title: string;
  slug: string;
  summary: string;
  footageId: string | null;
  assemblyId: string | null;
  safetyTopics: SafetyTopic[];
  detectedSafetyTopics: SafetyTopic[];
  tools: string[];
  consumables: string[];
  skillLevel: SkillLevel | null;
  estimatedMinutes: number | null;
  status: 'draft' | 'published';
  hasUnpublishedChanges: boolean;
  publishedRevision: PublishedRevision | null;
  publicPath: string | null;
  steps: GuideStep[];
  createdAt: string;
  updatedAt: string;
}

export interface GuideSummary {
  id: string;
  buildId: string;
  title: string;
  slug: string;
  status: Guide['status'];
  hasUnpublishedChanges: boolean;
  stepCount: number;
  skillLevel: SkillLevel | null;
  estimatedMinutes: number | null;
  publishedRevision: PublishedRevision | null;
  publicPath: string | null;
  updatedAt: string;
}

export interface Revision extends PublishedRevision {
  publishedBy: { displayName: string } | null;
}

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
