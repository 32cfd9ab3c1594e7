import type { ApiSchema } from '@/lib/api-types';

/**
 * Shapes of the public guide routes (api/src/guides; anyone may read them, signed in or not), named from the
 * generated contract (`npm run contract`), so a changed answer fails the studio's type check.
 */

/** GET /api/guides/:workshopSlug/:guideSlug (404 when not published). */
export type PublishedGuide = ApiSchema<'PublishedGuideDto'>;
/** One card of the public index (GET /api/guides). */
export type PublishedGuideSummary = ApiSchema<'PublishedGuideSummaryDto'>;

export type PublishedStep = ApiSchema<'PublishedGuideStepDto'>;
export type GuideFootage = ApiSchema<'PublishedFootageDto'>;
export type GuidePart = ApiSchema<'PublishedGuidePartDto'>;
export type PublishedChecklist = ApiSchema<'PublishedChecklistDto'>;
export type PublishedCheck = ApiSchema<'PublishedCheckDto'>;
export type CheckEvidence = ApiSchema<'PublishedCheckEvidenceDto'>;
export type GuideMark = ApiSchema<'PublishedGuideMarkDto'>;
/** What a reader may follow from a guide (the follows contract): its workshop, its build, and the checklist's assembly. */
export type GuideFollowTargets = ApiSchema<'GuideFollowTargetsDto'>;
export type GuideCaution = ApiSchema<'StandardCautionDto'>;

export type CautionLevel = GuideCaution['level'];
export type SafetyTopic = GuideCaution['topic'];
export type MarkKind = GuideMark['kind'];
export type ChecklistVerdict = ApiSchema<'ChecklistVerdict'>;

/** A cue's timing and words, as the public cues route gives them (GET /api/guides/:w/:g/cues). */
export type Cue = Pick<ApiSchema<'CueDto'>, 'startMs' | 'endMs' | 'text'>;
