import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsInt, IsOptional, IsString, Matches, Max, MaxLength, Min } from 'class-validator';
import { NullableFootageTime, NullableUuid, OptionalUuid } from '../../common/decorators/nullable-fields.decorator';
import { NumberFromText } from '../../common/decorators/number-from-text.decorator';
import { MAX_FOOTAGE_MS } from '../../common/http/limits';
import { QUANTITIES, INSTRUMENT_KINDS, type InstrumentKind, type Quantity } from '../../measurements/entities/measurement.entity';
import { MARK_KINDS, type MarkKind } from '../entities/mark.entity';
import { SUGGESTION_STATUSES, type SuggestionStatus } from '../entities/mark-suggestion.entity';

/** Links are optional; a given link must match the kind (a part for `part`, a fit check for `check_evidence`…). */
export class MarkLinksDto {
  @NullableUuid('For kind `part`')
  partId?: string | null;

  @NullableUuid('For kind `measurement`')
  measurementId?: string | null;

  @NullableUuid('For kind `check_evidence`')
  fitCheckId?: string | null;

  @NullableUuid('For kind `step`: a step of one of the workshop’s guides')
  guideStepId?: string | null;
}

export class CreateMarkDto extends MarkLinksDto {
  @ApiProperty({ example: 95_000, description: 'Time in the footage, ms' })
  @IsInt()
  @Min(0)
  @Max(MAX_FOOTAGE_MS, { message: '$property must be at most 86400000 (24 hours, in ms)' })
  startMs!: number;

  @NullableFootageTime('End of a span, ms (after startMs)', 101_500)
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

  @NullableFootageTime('End of a span, ms (after startMs); null makes it a moment')
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

/** Longest page of marks or suggestions; without `limit` a list answers whole, as it always has. */
export const MARKS_PAGE_MAX = 500;

/** Optional paging, in time order; the answer's `X-Total-Count` header says how many there are in all. */
export class PageQueryDto {
  @ApiPropertyOptional({ minimum: 1, maximum: MARKS_PAGE_MAX, description: 'At most this many (all when absent)' })
  @IsOptional()
  @NumberFromText()
  @IsInt()
  @Min(1)
  @Max(MARKS_PAGE_MAX)
  limit?: number;

  @ApiPropertyOptional({ minimum: 0, maximum: 100_000, default: 0, description: 'How many to skip: the next page starts at offset + limit' })
  @IsOptional()
  @NumberFromText()
  @IsInt()
  @Min(0)
  @Max(100_000)
  offset?: number;
}

export class ListMarksQueryDto extends PageQueryDto {
  @ApiPropertyOptional({ enum: MARK_KINDS })
  @IsOptional()
  @IsIn(MARK_KINDS)
  kind?: MarkKind;
}

export class ListSuggestionsQueryDto extends PageQueryDto {
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
  @OptionalUuid('Measurement suggestions: the part feature measured (or interfaceId)')
  featureId?: string;

  @OptionalUuid('Measurement suggestions: the interface measured (or featureId)')
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
