import { ApiProperty } from '@nestjs/swagger';
import { CAUTION_LEVELS, SAFETY_TOPICS, type CautionLevel, type SafetyTopic } from '../../engine/safety-topics';
import { SKILL_LEVELS, type SkillLevel } from '../../engine/guide-effort';
import { MarkResponseDto } from '../../marks/dto/mark-response.dto';

export class GuidePublishedRevisionDto {
  @ApiProperty({ example: 2 }) number!: number;
  @ApiProperty({ format: 'date-time' }) publishedAt!: string;
  @ApiProperty({ example: 'Added the boot clamp step' }) note!: string;
}

/** Where a guide stands: draft or published, and whether the draft has moved on since. */
class GuidePublicationDto {
  @ApiProperty({ enum: ['draft', 'published'] }) status!: 'draft' | 'published';
  @ApiProperty({ description: 'The draft differs from the published revision' }) hasUnpublishedChanges!: boolean;
  @ApiProperty({ type: GuidePublishedRevisionDto, nullable: true }) publishedRevision!: GuidePublishedRevisionDto | null;
  @ApiProperty({ type: String, nullable: true, example: '/guides/hollow-lane-garage/swapping-the-motor-coupler' })
  publicPath!: string | null;
}

export class GuideSummaryDto extends GuidePublicationDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ format: 'uuid' }) buildId!: string;
  @ApiProperty({ example: 'Swapping the motor coupler' }) title!: string;
  @ApiProperty({ example: 'swapping-the-motor-coupler' }) slug!: string;
  @ApiProperty({ example: 6 }) stepCount!: number;
  @ApiProperty({ enum: SKILL_LEVELS, nullable: true }) skillLevel!: SkillLevel | null;
  @ApiProperty({ type: Number, nullable: true, example: 90 }) estimatedMinutes!: number | null;
  @ApiProperty({ format: 'date-time' }) updatedAt!: string;
}

export class GuideCautionDto {
  @ApiProperty({ enum: CAUTION_LEVELS }) level!: CautionLevel;
  @ApiProperty({ example: 'Support the shaft before pulling the coupler; it drops when it clears the spline.' }) text!: string;
}

export class GuideStepResponseDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ example: 1 }) position!: number;
  @ApiProperty({ example: 'Pull the old coupler' }) title!: string;
  @ApiProperty({ example: '<p>Back off the clamp bolt two turns.</p>', description: 'Cleaned rich text (HTML)' }) body!: string;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) footageId!: string | null;
  @ApiProperty({ type: Number, nullable: true, example: 95_000 }) startMs!: number | null;
  @ApiProperty({ type: Number, nullable: true, example: 131_000 }) endMs!: number | null;
  @ApiProperty({ type: GuideCautionDto, nullable: true }) caution!: GuideCautionDto | null;
  @ApiProperty({ type: Number, nullable: true, example: 15 }) estimatedMinutes!: number | null;
  @ApiProperty({ type: [MarkResponseDto], description: 'Marks tied to this step' }) marks!: MarkResponseDto[];
}

export class GuideResponseDto extends GuidePublicationDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ format: 'uuid' }) workshopId!: string;
  @ApiProperty({ format: 'uuid' }) buildId!: string;
  @ApiProperty({ example: 'Swapping the motor coupler' }) title!: string;
  @ApiProperty({ example: 'swapping-the-motor-coupler' }) slug!: string;
  @ApiProperty({ example: 'Fit a 21-tooth coupler to the motor shaft and check it engages fully.' }) summary!: string;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) footageId!: string | null;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) assemblyId!: string | null;
  @ApiProperty({ enum: SAFETY_TOPICS, isArray: true, description: 'Chosen by the creator' }) safetyTopics!: SafetyTopic[];
  @ApiProperty({ enum: SAFETY_TOPICS, isArray: true, description: "Found in the guide's text, for the creator to consider" })
  detectedSafetyTopics!: SafetyTopic[];
  @ApiProperty({ type: [String], example: ['13 mm socket', 'soft-faced mallet'] }) tools!: string[];
  @ApiProperty({ type: [String], example: ['anti-seize'] }) consumables!: string[];
  @ApiProperty({ enum: SKILL_LEVELS, nullable: true }) skillLevel!: SkillLevel | null;
  @ApiProperty({ type: Number, nullable: true, example: 90 }) estimatedMinutes!: number | null;
  @ApiProperty({ type: [GuideStepResponseDto], description: 'By position' }) steps!: GuideStepResponseDto[];
  @ApiProperty({ format: 'date-time' }) createdAt!: string;
  @ApiProperty({ format: 'date-time' }) updatedAt!: string;
}

export class GuideStepChoiceDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ format: 'uuid' }) guideId!: string;
  @ApiProperty({ example: 'Swapping the motor coupler' }) guideTitle!: string;
  @ApiProperty({ example: 1 }) position!: number;
  @ApiProperty({ example: 'Pull the old coupler' }) title!: string;
  @ApiProperty({ type: Number, nullable: true, example: 95_000 }) startMs!: number | null;
}

export class GuideRevisionPublisherDto {
  @ApiProperty({ example: 'Rowan Hale' }) displayName!: string;
}

export class GuideRevisionResponseDto {
  @ApiProperty({ example: 2 }) number!: number;
  @ApiProperty({ example: 'Added the boot clamp step' }) note!: string;
  @ApiProperty({ format: 'date-time' }) publishedAt!: string;
  @ApiProperty({ type: GuideRevisionPublisherDto, nullable: true, description: 'Null when the publisher has no account any more, and in the answer to publishing' })
  publishedBy!: GuideRevisionPublisherDto | null;
}
