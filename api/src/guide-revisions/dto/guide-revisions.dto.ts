import { ApiProperty } from '@nestjs/swagger';
import { IsInt, IsString, Max, MaxLength, Min } from 'class-validator';
import { NumberFromText } from '../../common/decorators/number-from-text.decorator';
import { FIT_CHECK_STATES, type FitCheckState } from '../../engine/checklist';
import { SKILL_LEVELS, type SkillLevel } from '../../engine/guide-effort';
import { CAUTION_LEVELS, type CautionLevel } from '../../engine/safety-topics';
import type { GuideField, PieceChange, StepField } from '../../guides/revision-diff';

/** Revision numbers count from 1; the ceiling only keeps the number a number. */
const MAX_REVISION = 1_000_000;

export class PublishedGuideParamsDto {
  @ApiProperty() @IsString() @MaxLength(200) workshopSlug!: string;
  @ApiProperty() @IsString() @MaxLength(200) guideSlug!: string;
}

export class PublishedRevisionParamsDto extends PublishedGuideParamsDto {
  @ApiProperty({ example: 2, minimum: 1 })
  @NumberFromText()
  @IsInt({ message: 'number must be a whole revision number' })
  @Min(1)
  @Max(MAX_REVISION)
  number!: number;
}

export class RevisionCompareQueryDto {
  @ApiProperty({ example: 1, minimum: 1, description: 'The older revision (any published revision number)' })
  @NumberFromText()
  @IsInt({ message: 'from must be a whole revision number' })
  @Min(1)
  @Max(MAX_REVISION)
  from!: number;

  @ApiProperty({ example: 2, minimum: 1, description: 'The newer revision' })
  @NumberFromText()
  @IsInt({ message: 'to must be a whole revision number' })
  @Min(1)
  @Max(MAX_REVISION)
  to!: number;
}

export class PublicRevisionSummaryDto {
  @ApiProperty({ example: 2 }) number!: number;
  @ApiProperty({ format: 'date-time' }) publishedAt!: string;
  @ApiProperty({ example: 'Added the boot clamp step' }) note!: string;
  @ApiProperty({ description: 'The revision readers see today' }) current!: boolean;
}

export class PublicRevisionGuideRefDto {
  @ApiProperty() workshopName!: string;
  @ApiProperty() workshopSlug!: string;
  @ApiProperty() guideSlug!: string;
  @ApiProperty({ description: 'The title of the revision readers see today' }) title!: string;
}

export class PublicRevisionListDto {
  @ApiProperty({ type: PublicRevisionGuideRefDto }) guide!: PublicRevisionGuideRefDto;
  @ApiProperty({ example: 4 }) currentRevision!: number;
  @ApiProperty({ type: [PublicRevisionSummaryDto], description: 'Newest first; never a revision newer than the one published' })
  revisions!: PublicRevisionSummaryDto[];
}

export class RevisionCautionDto {
  @ApiProperty({ enum: CAUTION_LEVELS }) level!: CautionLevel;
  @ApiProperty() text!: string;
}

export class PublicRevisionStepDto {
  @ApiProperty({ format: 'uuid', description: 'Stable across revisions' }) id!: string;
  @ApiProperty({ example: 1, description: 'Counted from 1 in reading order' }) number!: number;
  @ApiProperty() title!: string;
  @ApiProperty({ description: 'Sanitized rich text as published' }) body!: string;
  @ApiProperty({ type: RevisionCautionDto, nullable: true }) caution!: RevisionCautionDto | null;
  @ApiProperty({ type: Number, nullable: true }) startMs!: number | null;
  @ApiProperty({ type: Number, nullable: true }) endMs!: number | null;
  @ApiProperty({ type: Number, nullable: true }) estimatedMinutes!: number | null;
}

export class RevisionCheckDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty() title!: string;
  @ApiProperty() required!: boolean;
  @ApiProperty({ enum: FIT_CHECK_STATES, enumName: 'FitCheckState', description: 'The state when this revision was published' })
  state!: FitCheckState;
}

export class PublicRevisionDto {
  @ApiProperty({ example: 2 }) number!: number;
  @ApiProperty({ format: 'date-time' }) publishedAt!: string;
  @ApiProperty() note!: string;
  @ApiProperty({ example: 4, description: 'The revision readers see today; also how many revisions there are' }) currentRevision!: number;
  @ApiProperty({ type: PublicRevisionGuideRefDto }) guide!: PublicRevisionGuideRefDto;
  @ApiProperty({ description: 'The title this revision had' }) title!: string;
  @ApiProperty() summary!: string;
  @ApiProperty({ type: [String] }) tools!: string[];
  @ApiProperty({ type: [String] }) consumables!: string[];
  @ApiProperty({ enum: SKILL_LEVELS, nullable: true }) skillLevel!: SkillLevel | null;
  @ApiProperty({ type: Number, nullable: true }) estimatedMinutes!: number | null;
  @ApiProperty({ type: [PublicRevisionStepDto] }) steps!: PublicRevisionStepDto[];
  @ApiProperty({ type: [RevisionCheckDto], description: 'The verified-fit checklist as it stood when this revision was published (retired checks left out)' })
  checklist!: RevisionCheckDto[];
}

const PIECE_CHANGES = ['same', 'added', 'removed'] as const satisfies readonly PieceChange[];
const STEP_FIELDS = ['title', 'body', 'caution', 'moment', 'time'] as const satisfies readonly StepField[];
const GUIDE_FIELDS = ['title', 'summary', 'tools', 'consumables'] as const satisfies readonly GuideField[];

export class TextPieceDto {
  @ApiProperty({ enum: PIECE_CHANGES, enumName: 'TextPieceChange', description: 'Words both revisions have, or only the newer (added) or the older (removed)' })
  change!: PieceChange;
  @ApiProperty() text!: string;
}

export class StepFieldChangeDto {
  @ApiProperty({ enum: STEP_FIELDS, enumName: 'RevisionStepField', description: 'moment: where the step starts in the video; time: its estimate' })
  field!: StepField;
  @ApiProperty({ description: 'Plain text in the older revision' }) before!: string;
  @ApiProperty() after!: string;
  @ApiProperty({ type: [TextPieceDto] }) pieces!: TextPieceDto[];
}

export class GuideFieldChangeDto {
  @ApiProperty({ enum: GUIDE_FIELDS, enumName: 'RevisionGuideField' }) field!: GuideField;
  @ApiProperty() before!: string;
  @ApiProperty() after!: string;
  @ApiProperty({ type: [TextPieceDto], description: 'For tools and consumables: one piece per item' }) pieces!: TextPieceDto[];
}

export class PlacedStepDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty() title!: string;
  @ApiProperty({ description: 'Its number in the revision that has it' }) number!: number;
}

export class MovedStepDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty() title!: string;
  @ApiProperty() fromNumber!: number;
  @ApiProperty() toNumber!: number;
}

export class ChangedStepDto extends MovedStepDto {
  @ApiProperty({ type: [StepFieldChangeDto] }) changes!: StepFieldChangeDto[];
}

export class ChecklistStateChangeDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty() title!: string;
  @ApiProperty() required!: boolean;
  @ApiProperty({ enum: FIT_CHECK_STATES, enumName: 'FitCheckState', nullable: true, description: 'Null when the check was not on the checklist then' })
  before!: FitCheckState | null;
  @ApiProperty({ enum: FIT_CHECK_STATES, enumName: 'FitCheckState', nullable: true }) after!: FitCheckState | null;
  @ApiProperty() changed!: boolean;
}

export class RevisionRefDto {
  @ApiProperty() number!: number;
  @ApiProperty({ format: 'date-time' }) publishedAt!: string;
  @ApiProperty() note!: string;
}

export class RevisionCompareDto {
  @ApiProperty({ type: PublicRevisionGuideRefDto }) guide!: PublicRevisionGuideRefDto;
  @ApiProperty() currentRevision!: number;
  @ApiProperty({ type: RevisionRefDto }) from!: RevisionRefDto;
  @ApiProperty({ type: RevisionRefDto }) to!: RevisionRefDto;
  @ApiProperty({ type: [GuideFieldChangeDto], description: 'The guide’s own title, summary, tools and consumables' }) guideChanges!: GuideFieldChangeDto[];
  @ApiProperty({ type: [PlacedStepDto] }) added!: PlacedStepDto[];
  @ApiProperty({ type: [PlacedStepDto] }) removed!: PlacedStepDto[];
  @ApiProperty({ type: [MovedStepDto], description: 'Steps taken out of their order (the fewest that explain the new order)' }) moved!: MovedStepDto[];
  @ApiProperty({ type: [ChangedStepDto] }) changed!: ChangedStepDto[];
  @ApiProperty({ description: 'Steps in both, in order, with the same words' }) unchangedCount!: number;
  @ApiProperty({ type: [ChecklistStateChangeDto], description: 'Each check’s state when each revision was published' })
  checklist!: ChecklistStateChangeDto[];
}

export class GuideReadingDto {
  @ApiProperty({ example: 4 }) currentRevision!: number;
  @ApiProperty({ type: Number, nullable: true, description: 'The revision this reader last opened; null if never' }) lastReadRevision!: number | null;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) lastReadAt!: string | null;
}
