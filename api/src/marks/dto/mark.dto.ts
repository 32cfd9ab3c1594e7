import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsInt, IsOptional, IsString, IsUUID, Matches, Max, MaxLength, Min, ValidateIf } from 'class-validator';
import { MAX_FOOTAGE_MS } from '../../common/http/limits';
import { QUANTITIES, INSTRUMENT_KINDS, type InstrumentKind, type Quantity } from '../../measurements/entities/measurement.entity';
import { MARK_KINDS, type MarkKind } from '../entities/mark.entity';
import { SUGGESTION_STATUSES, type SuggestionStatus } from '../entities/mark-suggestion.entity';

/** Links are optional; a given link must match the kind (a part for `part`, a fit check for `check_evidence`…). */
export class MarkLinksDto {
  @ApiPropertyOptional({ nullable: true, description: 'For kind `part`' })
  @IsOptional()
  @ValidateIf((_, value) => value !== null)
  @IsUUID()
  partId?: string | null;

  @ApiPropertyOptional({ nullable: true, description: 'For kind `measurement`' })
  @IsOptional()
  @ValidateIf((_, value) => value !== null)
  @IsUUID()
  measurementId?: string | null;

  @ApiPropertyOptional({ nullable: true, description: 'For kind `check_evidence`' })
  @IsOptional()
  @ValidateIf((_, value) => value !== null)
  @IsUUID()
  fitCheckId?: string | null;

  @ApiPropertyOptional({ nullable: true, description: 'For kind `step`: a step of one of the workshop’s guides' })
  @IsOptional()
  @ValidateIf((_, value) => value !== null)
  @IsUUID()
  guideStepId?: string | null;
}

export class CreateMarkDto extends MarkLinksDto {
  @ApiProperty({ example: 95_000, description: 'Time in the footage, ms' })
  @IsInt()
  @Min(0)
  @Max(MAX_FOOTAGE_MS, { message: '$property must be at most 86400000 (24 hours, in ms)' })
  startMs!: number;

  @ApiPropertyOptional({ example: 101_500, nullable: true, description: 'End of a span, ms (after startMs)' })
  @IsOptional()
  @ValidateIf((_, value) => value !== null)
  @IsInt()
  @Min(0)
  @Max(MAX_FOOTAGE_MS, { message: '$property must be at most 86400000 (24 hours, in ms)' })
  endMs?: number | null;

  @ApiProperty({ enum: MARK_KINDS })
  @IsIn(MARK_KINDS)
  kind!: MarkKind;

  @ApiPropertyOptional({ example: 'Coupler seats on the input shaft', default: '' })
  @IsOptional()
  @IsString()
  @MaxLength(200)
  label?: string;
}

export class UpdateMarkDto extends MarkLinksDto {
  @ApiPropertyOptional()
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(MAX_FOOTAGE_MS, { message: '$property must be at most 86400000 (24 hours, in ms)' })
  startMs?: number;

  @ApiPropertyOptional({ nullable: true })
  @IsOptional()
  @ValidateIf((_, value) => value !== null)
  @IsInt()
  @Min(0)
  @Max(MAX_FOOTAGE_MS, { message: '$property must be at most 86400000 (24 hours, in ms)' })
  endMs?: number | null;

  @ApiPropertyOptional({ enum: MARK_KINDS })
  @IsOptional()
  @IsIn(MARK_KINDS)
  kind?: MarkKind;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @MaxLength(200)
  label?: string;
}

export class ListMarksQueryDto {
  @ApiPropertyOptional({ enum: MARK_KINDS })
  @IsOptional()
  @IsIn(MARK_KINDS)
  kind?: MarkKind;
}

export class ListSuggestionsQueryDto {
  @ApiPropertyOptional({ enum: SUGGESTION_STATUSES, default: 'pending' })
  @IsOptional()
  @IsIn(SUGGESTION_STATUSES)
  status?: SuggestionStatus;
}

const READING = /^\s*-?(\d+(\.\d*)?|\.\d+)\s*$/;

/**
 * Accepting a measurement suggestion records the reading itself, so it needs what the transcript
 * cannot say: the subject (a part feature or an interface) and, optionally, the instrument.
 */
export class AcceptSuggestionDto {
  @ApiPropertyOptional({ description: 'Measurement suggestions: the part feature measured (or interfaceId)' })
  @IsOptional()
  @IsUUID()
  featureId?: string;

  @ApiPropertyOptional({ description: 'Measurement suggestions: the interface measured (or featureId)' })
  @IsOptional()
  @IsUUID()
  interfaceId?: string;

  @ApiPropertyOptional({ enum: QUANTITIES, default: 'other' })
  @IsOptional()
  @IsIn(QUANTITIES)
  quantity?: Quantity;

  @ApiPropertyOptional({ enum: INSTRUMENT_KINDS, default: 'other' })
  @IsOptional()
  @IsIn(INSTRUMENT_KINDS)
  instrumentKind?: InstrumentKind;

  @ApiPropertyOptional({ example: '0.001', description: "Defaults to one step of the last spoken digit, in the suggestion's unit" })
  @IsOptional()
  @Matches(READING, { message: 'resolution must be a decimal number such as 0.001' })
  resolution?: string;

  @ApiPropertyOptional({ description: "The mark's label (defaults to the spoken phrase)" })
  @IsOptional()
  @IsString()
  @MaxLength(200)
  label?: string;
}
