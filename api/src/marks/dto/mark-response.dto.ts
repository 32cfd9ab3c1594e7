import { ApiProperty } from '@nestjs/swagger';
import { MeasurementResponseDto } from '../../measurements/dto/measurement.dto';
import { MARK_KINDS, type MarkKind } from '../entities/mark.entity';
import { SUGGESTION_KINDS, SUGGESTION_STATUSES, type SuggestionKind, type SuggestionStatus } from '../entities/mark-suggestion.entity';

export class MarkResponseDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ format: 'uuid' }) footageId!: string;
  @ApiProperty({ example: 95_000, description: 'Where it starts in the footage, ms' }) startMs!: number;
  @ApiProperty({ type: Number, nullable: true, example: 101_500, description: 'Null for a moment rather than a span' }) endMs!: number | null;
  @ApiProperty({ enum: MARK_KINDS }) kind!: MarkKind;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) partId!: string | null;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) measurementId!: string | null;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) fitCheckId!: string | null;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) guideStepId!: string | null;
  @ApiProperty({ example: 'Pilot bore on the bore gauge' }) label!: string;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) createdBy!: string | null;
  @ApiProperty({ format: 'date-time' }) createdAt!: string;
  @ApiProperty({ format: 'date-time' }) updatedAt!: string;
}

export class MarkSuggestionResponseDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ format: 'uuid' }) footageId!: string;
  @ApiProperty({ type: String, format: 'uuid', nullable: true, description: 'The transcript revision it was mined from' })
  transcriptId!: string | null;
  @ApiProperty({ example: 12, description: 'The cue it was heard in' }) cueIndex!: number;
  @ApiProperty({ example: 95_000 }) startMs!: number;
  @ApiProperty({ example: 98_200 }) endMs!: number;
  @ApiProperty({ enum: SUGGESTION_KINDS }) kind!: SuggestionKind;
  @ApiProperty({ example: 'fifteen thousandths of an inch', description: 'What was said' }) phrase!: string;
  @ApiProperty({ type: String, nullable: true, example: '0.015', description: 'The spoken amount as decimal text in `unit`' })
  value!: string | null;
  @ApiProperty({ enum: ['mm', 'um', 'in'], nullable: true }) unit!: 'mm' | 'um' | 'in' | null;
  @ApiProperty({ type: Number, nullable: true, example: 0.381 }) millimetres!: number | null;
  @ApiProperty({ type: String, format: 'uuid', nullable: true, description: 'For kind `part`: the part whose number was said' })
  partId!: string | null;
  @ApiProperty({ enum: SUGGESTION_STATUSES }) status!: SuggestionStatus;
  @ApiProperty({ type: String, format: 'uuid', nullable: true, description: 'The mark made when it was accepted' }) markId!: string | null;
}

export class AcceptedSuggestionResponseDto {
  @ApiProperty({ type: MarkSuggestionResponseDto }) suggestion!: MarkSuggestionResponseDto;
  @ApiProperty({ type: MarkResponseDto }) mark!: MarkResponseDto;
  @ApiProperty({ type: MeasurementResponseDto, nullable: true, description: 'The reading recorded from a spoken measurement' })
  measurement!: MeasurementResponseDto | null;
}
