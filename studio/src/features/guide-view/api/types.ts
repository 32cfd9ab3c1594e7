import type { ChecklistVerdict, FitCheckState } from '@/components/check-state';
import type { SkillLevel } from '@/lib/guide-effort';

/** Shapes of the public guide routes (api/src/guides; OpenAPI at /api/docs). Anyone may read them, signed in or not. */

export type CautionLevel = 'DANGER' | 'WARNING' | 'CAUTION' | 'NOTICE';
export type SafetyTopic = 'lifting' | 'rotating_parts' | 'high_voltage' | 'welding' | 'pressing';
export type MarkKind = 'part' | 'measurement' | 'check_evidence' | 'step' | 'caution' | 'note';
export type { ChecklistVerdict };

/** One card of the public index (GET /api/guides). */
export interface PublishedGuideSummary {
  workshop: { name: string; slug: string };
  slug: string;
  title: string;
  buildTitle: string;
  publishedAt: string;
  revision: number;
  stepCount: number;
  /** The skill level and estimated minutes of the published revision; null when its author gave none. */
  skillLevel: SkillLevel | null;
  estimatedMinutes: number | null;
  posterUrl: string | null;
  path: string;
}

export interface GuideCaution {
  level: CautionLevel;
  text: string;
}

export interface PublishedStep {
  id: string;
  position: number;
  title: string;
  /** Sanitised HTML from the server (may be ''). */
  body: string;
  footageId: string | null;
  startMs: number | null;
  endMs: number | null;
  caution: GuideCaution | null;
  /** The author's estimate of the step, in minutes. */
  estimatedMinutes: number | null;
}

export interface Cue {
  startMs: number;
  endMs: number;
  text: string;
}

export interface GuidePart {
  partNumber: string;
  maker: string;
  title: string;
  category: string;
  position: string;
}

export interface CheckEvidence {
  kind: 'mark' | 'measurement' | 'photo';
  label: string;
  startMs: number | null;
  /** A photo's address on the guide's public path (it redirects to the image). */
  photoUrl?: string;
}

export interface PublishedCheck {
  id: string;
  title: string;
  state: FitCheckState;
  required: boolean;
  detail: string | null;
  confirmedAt: string | null;
  /** The member who confirmed it, only where the workshop shows member names; otherwise null. */
  confirmedBy: string | null;
  evidence: CheckEvidence[];
}

export interface PublishedChecklist {
  assemblyName: string;
  verdict: ChecklistVerdict;
  checks: PublishedCheck[];
}

export interface GuideMark {
  id: string;
  kind: MarkKind;
  startMs: number;
  endMs: number | null;
  label: string;
  stepId: string | null;
  fitCheckId: string | null;
}

export interface GuideFootage {
  id: string;
  title: string;
  durationMs: number | null;
  /** Same-origin API paths that redirect to short-lived storage URLs. */
  videoUrl: string;
  posterUrl: string | null;
  captionsUrl: string | null;
  /** The web renditions, null until made (absent from an API without the media pipeline). */
  hlsUrl?: string | null;
  mp4Url?: string | null;
  /** WebVTT thumbnails track for scrub previews. */
  thumbnailsUrl?: string | null;
  waveformUrl?: string | null;
  /** The picture as shown, after rotation. */
  displayWidth?: number | null;
  displayHeight?: number | null;
}

/** What a reader may follow from a guide (the follows contract): its workshop, its build, and the checklist's assembly. */
export interface GuideFollowTargets {
  workshop: { id: string; label: string };
  build: { id: string; label: string };
  assembly: { id: string; label: string } | null;
}

/** GET /api/guides/:workshopSlug/:guideSlug (404 when not published). */
export interface PublishedGuide {
  workshop: { name: string; slug: string };
  guide: {
    title: string;
    slug: string;
    /** Sanitised HTML from the server. */
    summary: string;
    buildTitle: string;
    vehicle: string | null;
    tools: string[];
    consumables: string[];
    safetyTopics: SafetyTopic[];
    skillLevel: SkillLevel | null;
    estimatedMinutes: number | null;
  };
  revision: { number: number; publishedAt: string; note: string };
  cautions: (GuideCaution & { topic: SafetyTopic })[];
  disclaimer: string;
  footage: GuideFootage | null;
  steps: PublishedStep[];
  parts: GuidePart[];
  checklist: PublishedChecklist | null;
  marks: GuideMark[];
  followTargets: GuideFollowTargets;
}
