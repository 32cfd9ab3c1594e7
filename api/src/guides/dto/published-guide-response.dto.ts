import { ApiProperty, ApiPropertyOptional, OmitType } from '@nestjs/swagger';
import { FIT_CHECK_STATES, type ChecklistVerdict, type FitCheckState } from '../../engine/checklist';
import { CHECKLIST_VERDICTS } from '../../fit-checks/dto/fit-check-response.dto';
import { SKILL_LEVELS, type SkillLevel } from '../../engine/guide-effort';
import { CAUTION_LEVELS, GUIDE_DISCLAIMER, SAFETY_TOPICS, type CautionLevel, type SafetyTopic } from '../../engine/safety-topics';
import { MARK_KINDS, type MarkKind } from '../../marks/entities/mark.entity';
import { PART_CATEGORIES, type PartCategory } from '../../parts/part-vocabulary';
import { GuidePublishedRevisionDto, GuideStepResponseDto } from './guide-response.dto';

/** The answers of the public guide routes (GET /api/guides and /api/guides/:workshopSlug/:guideSlug): anyone may read them. */

const EXAMPLE_PATH = '/guides/hollow-lane-garage/swapping-the-motor-coupler';
const EXAMPLE_API_PATH = `/api${EXAMPLE_PATH}`;

export class PublicWorkshopRefDto {
  @ApiProperty({ example: 'Hollow Lane Garage' }) name!: string;
  @ApiProperty({ example: 'hollow-lane-garage' }) slug!: string;
}

/** One card of the public index. */
export class PublishedGuideSummaryDto {
  @ApiProperty({ type: PublicWorkshopRefDto }) workshop!: PublicWorkshopRefDto;
  @ApiProperty({ example: 'swapping-the-motor-coupler' }) slug!: string;
  @ApiProperty({ example: 'Swapping the motor coupler' }) title!: string;
  @ApiProperty({ example: 'Cargo trike drive refit' }) buildTitle!: string;
  @ApiProperty({ format: 'date-time', example: '2026-11-02T09:30:00.000Z' }) publishedAt!: string;
  @ApiProperty({ example: 2, description: 'The published revision’s number' }) revision!: number;
  @ApiProperty({ example: 6 }) stepCount!: number;
  @ApiProperty({ enum: SKILL_LEVELS, nullable: true, description: 'Null when the author gave none' }) skillLevel!: SkillLevel | null;
  @ApiProperty({ type: Number, nullable: true, example: 90, description: 'Null when the author gave none' }) estimatedMinutes!: number | null;
  @ApiProperty({ type: String, nullable: true, example: `${EXAMPLE_API_PATH}/poster`, description: 'Redirects to the footage’s poster; null without one' })
  posterUrl!: string | null;
  @ApiProperty({ example: EXAMPLE_PATH, description: 'The studio’s address of the guide' }) path!: string;
}

export class PublishedGuideInfoDto {
  @ApiProperty({ example: 'Swapping the motor coupler' }) title!: string;
  @ApiProperty({ example: 'swapping-the-motor-coupler' }) slug!: string;
  @ApiProperty({ example: '<p>Fit a 21-tooth coupler to the motor shaft and check it engages fully.</p>', description: 'Cleaned rich text (HTML)' })
  summary!: string;
  @ApiProperty({ example: 'Cargo trike drive refit' }) buildTitle!: string;
  @ApiProperty({ type: String, nullable: true, example: 'Three-wheel cargo trike, 250 W hub drive' }) vehicle!: string | null;
  @ApiProperty({ type: [String], example: ['13 mm socket', 'soft-faced mallet'] }) tools!: string[];
  @ApiProperty({ type: [String], example: ['anti-seize'] }) consumables!: string[];
  @ApiProperty({ enum: SAFETY_TOPICS, isArray: true, description: 'Chosen by the creator or found in the guide’s text' })
  safetyTopics!: SafetyTopic[];
  @ApiProperty({ enum: SKILL_LEVELS, nullable: true }) skillLevel!: SkillLevel | null;
  @ApiProperty({ type: Number, nullable: true, example: 90 }) estimatedMinutes!: number | null;
}

/** The standard caution of a safety topic the guide touches (ANSI Z535 signal word and text). */
export class StandardCautionDto {
  @ApiProperty({ enum: SAFETY_TOPICS }) topic!: SafetyTopic;
  @ApiProperty({ enum: CAUTION_LEVELS }) level!: CautionLevel;
  @ApiProperty({ example: 'A jack is not a support. Raise the vehicle at the maker’s lifting points on firm, level ground and hold it on rated stands or a lift with its locks engaged before going underneath.' })
  text!: string;
}

/** The guide's footage, ready to play; every address is a same-origin API path or a short-lived storage link. */
export class PublishedFootageDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ example: 'Coupler swap, bench camera' }) title!: string;
  @ApiProperty({ type: Number, nullable: true, example: 412_000 }) durationMs!: number | null;
  @ApiProperty({ example: `${EXAMPLE_API_PATH}/video`, description: 'Redirects to a short-lived link to a progressive file (HTTP Range works)' })
  videoUrl!: string;
  @ApiProperty({ type: String, nullable: true, example: `${EXAMPLE_API_PATH}/poster` }) posterUrl!: string | null;
  @ApiProperty({ type: String, nullable: true, example: `${EXAMPLE_API_PATH}/captions.vtt`, description: 'WebVTT captions; null without a transcript' })
  captionsUrl!: string | null;
  @ApiProperty({ type: String, nullable: true, example: `${EXAMPLE_API_PATH}/hls/master.m3u8`, description: 'HLS master playlist once the web versions are made' })
  hlsUrl!: string | null;
  @ApiProperty({ type: String, nullable: true, example: `${EXAMPLE_API_PATH}/video`, description: 'The H.264 MP4 once the web versions are made' })
  mp4Url!: string | null;
  @ApiProperty({ type: String, nullable: true, example: `${EXAMPLE_API_PATH}/thumbnails.vtt`, description: 'WebVTT thumbnails track for scrub previews' })
  thumbnailsUrl!: string | null;
  @ApiProperty({ type: String, nullable: true, example: `${EXAMPLE_API_PATH}/waveform`, description: 'Audio peaks (WaveformDto)' })
  waveformUrl!: string | null;
  @ApiProperty({ type: Number, nullable: true, example: 1920, description: 'The picture as shown, after rotation' }) displayWidth!: number | null;
  @ApiProperty({ type: Number, nullable: true, example: 1080 }) displayHeight!: number | null;
}

/** A step as published (the editor's step without its marks: the guide's marks come in one list). */
export class PublishedGuideStepDto extends OmitType(GuideStepResponseDto, ['marks'] as const) {}

/** A part placed in the checklist's assembly. */
export class PublishedGuidePartDto {
  @ApiProperty({ example: 'CPL-21T-12' }) partNumber!: string;
  @ApiProperty({ example: 'Northway Drive Parts' }) maker!: string;
  @ApiProperty({ example: '21-tooth motor coupler' }) title!: string;
  @ApiProperty({ enum: PART_CATEGORIES }) category!: PartCategory;
  @ApiProperty({ example: 'motor side', description: 'Where the part sits in the assembly' }) position!: string;
}

export const PUBLISHED_EVIDENCE_KINDS = ['mark', 'measurement', 'photo'] as const;

export class PublishedCheckEvidenceDto {
  @ApiProperty({ enum: PUBLISHED_EVIDENCE_KINDS }) kind!: (typeof PUBLISHED_EVIDENCE_KINDS)[number];
  @ApiProperty({ example: 'Reading 12.02 mm' }) label!: string;
  @ApiProperty({ type: Number, nullable: true, example: 95_000, description: 'Where it is in the guide’s footage; null when elsewhere' })
  startMs!: number | null;
  @ApiPropertyOptional({ example: `${EXAMPLE_API_PATH}/evidence/7d0f3c2a-5b1e-4f7a-9c41-2e8d6b0a1f35/photo`, description: 'A photo’s address (redirects to the image); photos only' })
  photoUrl?: string;
}

export class PublishedCheckDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ example: 'Coupler spline engages the motor shaft' }) title!: string;
  @ApiProperty({ enum: FIT_CHECK_STATES, enumName: 'FitCheckState' }) state!: FitCheckState;
  @ApiProperty() required!: boolean;
  @ApiProperty({ type: String, nullable: true, example: 'Engagement 11.8 mm of 12 mm wanted' }) detail!: string | null;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) confirmedAt!: string | null;
  @ApiProperty({ type: String, nullable: true, example: 'Rowan Hale', description: 'Only where the workshop shows member names; otherwise null' })
  confirmedBy!: string | null;
  @ApiProperty({ type: [PublishedCheckEvidenceDto] }) evidence!: PublishedCheckEvidenceDto[];
}

/** The live verified-fit checklist of the guide's assembly (checks keep moving after publishing; retired ones are left out). */
export class PublishedChecklistDto {
  @ApiProperty({ example: 'Motor to gearbox coupling' }) assemblyName!: string;
  @ApiProperty({ enum: CHECKLIST_VERDICTS, enumName: 'ChecklistVerdict', description: 'The roll-up of the required checks' }) verdict!: ChecklistVerdict;
  @ApiProperty({ type: [PublishedCheckDto] }) checks!: PublishedCheckDto[];
}

export class FollowTargetRefDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ example: 'Hollow Lane Garage' }) label!: string;
}

/** What a signed-in reader may follow from the guide (POST /api/follows). */
export class GuideFollowTargetsDto {
  @ApiProperty({ type: FollowTargetRefDto }) workshop!: FollowTargetRefDto;
  @ApiProperty({ type: FollowTargetRefDto }) build!: FollowTargetRefDto;
  @ApiProperty({ type: FollowTargetRefDto, nullable: true, description: 'Null when the guide follows no assembly' }) assembly!: FollowTargetRefDto | null;
}

/** A mark in the guide's footage: on a step (as published) or evidencing a check (live). */
export class PublishedGuideMarkDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ enum: MARK_KINDS }) kind!: MarkKind;
  @ApiProperty({ example: 95_000 }) startMs!: number;
  @ApiProperty({ type: Number, nullable: true, example: 131_000 }) endMs!: number | null;
  @ApiProperty({ example: 'Clamp bolt backed off' }) label!: string;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) stepId!: string | null;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) fitCheckId!: string | null;
}

/** The follow-along content: the published revision with the live verified-fit checklist. */
export class PublishedGuideDto {
  @ApiProperty({ type: PublicWorkshopRefDto }) workshop!: PublicWorkshopRefDto;
  @ApiProperty({ type: PublishedGuideInfoDto }) guide!: PublishedGuideInfoDto;
  @ApiProperty({ type: GuidePublishedRevisionDto }) revision!: GuidePublishedRevisionDto;
  @ApiProperty({ type: [StandardCautionDto], description: 'Most severe first' }) cautions!: StandardCautionDto[];
  @ApiProperty({ example: GUIDE_DISCLAIMER }) disclaimer!: string;
  @ApiProperty({ type: PublishedFootageDto, nullable: true, description: 'Null without footage, or until it is ready' }) footage!: PublishedFootageDto | null;
  @ApiProperty({ type: [PublishedGuideStepDto], description: 'By position' }) steps!: PublishedGuideStepDto[];
  @ApiProperty({ type: [PublishedGuidePartDto] }) parts!: PublishedGuidePartDto[];
  @ApiProperty({ type: PublishedChecklistDto, nullable: true, description: 'Null when the guide follows no assembly' }) checklist!: PublishedChecklistDto | null;
  @ApiProperty({ type: GuideFollowTargetsDto }) followTargets!: GuideFollowTargetsDto;
  @ApiProperty({ type: [PublishedGuideMarkDto], description: 'By start' }) marks!: PublishedGuideMarkDto[];
}
