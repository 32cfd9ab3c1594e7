import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayUnique,
  IsArray,
  IsIn,
  IsInt,
  IsOptional,
  IsString,
  IsUUID,
  Length,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { NullableFootageTime, NullableUuid, OptionalUuid } from '../../common/decorators/nullable-fields.decorator';
import { GUIDE_MINUTES_MAX, SKILL_LEVELS, STEP_MINUTES_MAX, type SkillLevel } from '../../engine/guide-effort';
import { CAUTION_LEVELS, SAFETY_TOPICS, type CautionLevel, type SafetyTopic } from '../../engine/safety-topics';

/** Rich text arrives as Tiptap HTML; the server keeps only the allowed tags (see rich-text.ts). */
const RICH_TEXT_MAX = 100_000;
const LIST_ITEM_MAX = 120;
const LIST_MAX = 50;

export class GuideFieldsDto {
  @ApiPropertyOptional({ example: '<p>How the 21-tooth coupler stack goes together.</p>', description: 'HTML (sanitised)' })
  @IsOptional()
  @IsString()
  @MaxLength(RICH_TEXT_MAX)
  summary?: string;

  @NullableUuid('The footage viewers follow (a footage of the same build)')
  footageId?: string | null;

  @NullableUuid('Its checklist and parts go in the guide (an assembly of the same build)')
  assemblyId?: string | null;

  @ApiPropertyOptional({ enum: SAFETY_TOPICS, isArray: true })
  @IsOptional()
  @IsArray()
  @ArrayUnique()
  @IsIn(SAFETY_TOPICS, { each: true })
  safetyTopics?: SafetyTopic[];

  @ApiPropertyOptional({ type: [String], example: ['Torque wrench, 20–100 N·m', 'Outside micrometer 25–50 mm'] })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(LIST_MAX)
  @IsString({ each: true })
  @Length(1, LIST_ITEM_MAX, { each: true })
  tools?: string[];

  @ApiPropertyOptional({ type: [String], example: ['Anti-seize compound', 'Medium-strength thread locker'] })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(LIST_MAX)
  @IsString({ each: true })
  @Length(1, LIST_ITEM_MAX, { each: true })
  consumables?: string[];

  @ApiPropertyOptional({ enum: SKILL_LEVELS, nullable: true, description: 'What the reader should already be able to do; null clears it' })
  @IsOptional()
  @IsIn(SKILL_LEVELS, { message: `skillLevel must be one of ${SKILL_LEVELS.join(', ')}` })
  skillLevel?: SkillLevel | null;

  @ApiPropertyOptional({ type: Number, nullable: true, example: 180, description: `Estimated time of the whole job, whole minutes (1–${GUIDE_MINUTES_MAX}); null clears it` })
  @IsOptional()
  @IsInt({ message: 'estimatedMinutes must be a whole number of minutes' })
  @Min(1, { message: 'estimatedMinutes must be at least 1 minute' })
  @Max(GUIDE_MINUTES_MAX, { message: `estimatedMinutes must be at most ${GUIDE_MINUTES_MAX} minutes (100 hours)` })
  estimatedMinutes?: number | null;
}

export class CreateGuideDto extends GuideFieldsDto {
  @ApiProperty({ example: 'Fitting the 21-tooth coupler stack' })
  @IsString()
  @Length(1, 200)
  title!: string;
}

export class UpdateGuideDto extends GuideFieldsDto {
  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @Length(1, 200)
  title?: string;
}

export class StepCautionDto {
  @ApiProperty({ enum: CAUTION_LEVELS, description: 'ANSI Z535 signal word' })
  @IsIn(CAUTION_LEVELS)
  level!: CautionLevel;

  @ApiProperty({ example: 'Support the truck on stands before going underneath.' })
  @IsString()
  @Length(1, 1000)
  text!: string;
}

export class StepFieldsDto {
  @ApiPropertyOptional({ description: 'HTML (sanitised)' })
  @IsOptional()
  @IsString()
  @MaxLength(RICH_TEXT_MAX)
  body?: string;

  @NullableUuid('A footage of the guide’s build; defaults to the guide’s footage when a time is given')
  footageId?: string | null;

  @NullableFootageTime('The step’s moment in the footage, ms', 42_000)
  startMs?: number | null;

  @NullableFootageTime('End of the step’s span, ms (after startMs)')
  endMs?: number | null;

  @ApiPropertyOptional({ type: StepCautionDto, nullable: true })
  @IsOptional()
  @ValidateNested()
  @Type(() => StepCautionDto)
  caution?: StepCautionDto | null;

  @ApiPropertyOptional({ type: Number, nullable: true, example: 20, description: `Estimated time of this step, whole minutes (1–${STEP_MINUTES_MAX}); null clears it` })
  @IsOptional()
  @IsInt({ message: 'estimatedMinutes must be a whole number of minutes' })
  @Min(1, { message: 'estimatedMinutes must be at least 1 minute' })
  @Max(STEP_MINUTES_MAX, { message: `estimatedMinutes must be at most ${STEP_MINUTES_MAX} minutes (24 hours)` })
  estimatedMinutes?: number | null;
}

export class CreateStepDto extends StepFieldsDto {
  @ApiProperty({ example: 'Seat the coupler on the motor shaft' })
  @IsString()
  @Length(1, 200)
  title!: string;
}

export class UpdateStepDto extends StepFieldsDto {
  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @Length(1, 200)
  title?: string;
}

export class ReorderStepsDto {
  @ApiProperty({ type: [String], description: 'Every step of the guide exactly once, in the new order' })
  @IsArray()
  @ArrayUnique()
  @IsUUID('all', { each: true })
  stepIds!: string[];
}

export class PublishRevisionDto {
  @ApiPropertyOptional({ example: 'Added the runout reading to step 3.' })
  @IsOptional()
  @IsString()
  @MaxLength(500)
  note?: string;
}

export class GuideStepsQueryDto {
  @OptionalUuid('Only steps anchored in this footage')
  footageId?: string;
}
