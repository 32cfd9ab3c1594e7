import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsOptional, IsString, Length, Max, MaxLength, Min } from 'class-validator';
import { TRANSCRIPT_FORMATS, type StoredTranscriptFormat } from '../entities/transcript.entity';
import { TRANSCRIPT_MAX_BYTES } from '../../engine/transcript-limits';
import { NumberFromText } from '../../common/decorators/number-from-text.decorator';

const FORMAT_CHOICES = ['auto', ...TRANSCRIPT_FORMATS] as const;
export type TranscriptFormatChoice = (typeof FORMAT_CHOICES)[number];

export class AttachTranscriptDto {
  @ApiProperty({
    example: 'WEBVTT\n\n00:00:01.000 --> 00:00:04.000\nThe spline counts twenty-one teeth.',
    description: 'WebVTT, SubRip or timestamped lines ("[1:02] text"); at most 2 MB',
  })
  @IsString()
  @MaxLength(TRANSCRIPT_MAX_BYTES, { message: 'text must be at most 2 MB' })
  text!: string;

  @ApiPropertyOptional({ enum: FORMAT_CHOICES, default: 'auto' })
  @IsOptional()
  @IsIn(FORMAT_CHOICES)
  format: TranscriptFormatChoice = 'auto';
}

/** The other fields of a multipart transcript upload (the file itself is the `file` field). */
export class AttachTranscriptFileDto {
  @ApiPropertyOptional({ enum: FORMAT_CHOICES, default: 'auto' })
  @IsOptional()
  @IsIn(FORMAT_CHOICES)
  format: TranscriptFormatChoice = 'auto';
}

export class TranscriptQueryDto {
  @ApiPropertyOptional({ description: 'A revision number; the active revision when absent' })
  @IsOptional()
  @NumberFromText()
  @IsInt()
  @Min(1)
  @Max(1_000_000)
  revision?: number;
}

export class ExportQueryDto extends TranscriptQueryDto {
  @ApiPropertyOptional({ description: 'Ask the browser to save the file instead of showing it' })
  @IsOptional()
  @Transform(({ value }) => value === true || value === 'true' || value === '1')
  @IsBoolean()
  download?: boolean;
}

export class SearchQueryDto {
  @ApiProperty({ example: 'pilot bearing', description: 'Words to find; each must appear (words of three letters or more)' })
  @IsString()
  @Length(1, 200)
  q!: string;

  @ApiPropertyOptional({ default: 50, minimum: 1, maximum: 200 })
  @IsOptional()
  @NumberFromText()
  @IsInt()
  @Min(1)
  @Max(200)
  limit: number = 50;

  @ApiPropertyOptional({ default: 0, minimum: 0, maximum: 100000, description: 'How many hits to skip: the next page starts at offset + limit' })
  @IsOptional()
  @NumberFromText()
  @IsInt()
  @Min(0)
  @Max(100000)
  offset: number = 0;
}

export class CueDto {
  @ApiProperty({ description: 'Position in the transcript, from 0' }) index!: number;
  @ApiProperty() startMs!: number;
  @ApiProperty() endMs!: number;
  @ApiProperty() text!: string;
}

export class TranscriptRevisionDto {
  @ApiProperty() id!: string;
  @ApiProperty() footageId!: string;
  @ApiProperty() revision!: number;
  @ApiProperty({ enum: TRANSCRIPT_FORMATS }) format!: StoredTranscriptFormat;
  @ApiProperty({ type: String, nullable: true, description: 'The attached file name; null when pasted' })
  sourceName!: string | null;
  @ApiProperty() cueCount!: number;
  @ApiProperty() isActive!: boolean;
  @ApiProperty() createdAt!: string;
}

export class TranscriptDto extends TranscriptRevisionDto {
  @ApiProperty({ type: [CueDto] }) cues!: CueDto[];
}

export class CueMatchDto {
  @ApiProperty() cueIndex!: number;
  @ApiProperty() startMs!: number;
  @ApiProperty() endMs!: number;
  @ApiProperty() text!: string;
}

export class FootageSearchResponseDto {
  @ApiProperty({ description: 'The words searched for' }) terms!: string[];
  @ApiProperty({ description: 'How many cues match in all; results holds at most `limit` of them' }) total!: number;
  @ApiProperty({ description: 'Where this page starts among all the hits' }) offset!: number;
  @ApiProperty({ type: [CueMatchDto], description: 'Matching cues of the active transcript, in time order' })
  results!: CueMatchDto[];
}

export class WorkshopCueMatchDto extends CueMatchDto {
  @ApiProperty() footageId!: string;
  @ApiProperty() footageTitle!: string;
  @ApiProperty() buildId!: string;
  @ApiProperty() buildTitle!: string;
}

export class WorkshopSearchResponseDto {
  @ApiProperty() terms!: string[];
  @ApiProperty({ description: 'How many cues match in all; results holds at most `limit` of them' }) total!: number;
  @ApiProperty({ description: 'Where this page starts among all the hits' }) offset!: number;
  @ApiProperty({ type: [WorkshopCueMatchDto], description: "Matching cues of the workshop's active transcripts, best first" })
  results!: WorkshopCueMatchDto[];
}

/** Every hit's moment at once, for drawing where hits gather along the footage (the marking timeline). */
export class HitMomentsQueryDto {
  @ApiProperty({ example: 'spline', description: 'Words to find; each must appear (words of three letters or more)' })
  @IsString()
  @Length(1, 200)
  q!: string;
}

export class HitMomentsResponseDto {
  @ApiProperty({ description: 'The words searched for' }) terms!: string[];
  @ApiProperty({ description: 'How many cues match' }) total!: number;
  @ApiProperty({ type: [Number], description: 'Start of every matching cue of the active transcript, ms, in time order' })
  startMs!: number[];
}

/** Longest stretch of cues one window answer holds: a screenful and more, never the whole transcript. */
export const CUE_WINDOW_MAX = 500;

/**
 * A window of a transcript's cues: by time (`fromMs`, `toMs`: the cues playing in that stretch, to follow playback)
 * or by position (`fromIndex`, `limit`: the rows a scrolled list shows). Give one pair.
 */
export class CueWindowQueryDto {
  @ApiPropertyOptional({ minimum: 0, maximum: 86_400_000, description: 'Cues still playing at or after this time, ms' })
  @IsOptional()
  @NumberFromText()
  @IsInt()
  @Min(0)
  @Max(86_400_000)
  fromMs?: number;

  @ApiPropertyOptional({ minimum: 0, maximum: 86_400_000, description: 'Cues starting before this time, ms (after fromMs)' })
  @IsOptional()
  @NumberFromText()
  @IsInt()
  @Min(0)
  @Max(86_400_000)
  toMs?: number;

  @ApiPropertyOptional({ minimum: 0, maximum: 100_000, description: 'First cue by position, from 0' })
  @IsOptional()
  @NumberFromText()
  @IsInt()
  @Min(0)
  @Max(100_000)
  fromIndex?: number;

  @ApiPropertyOptional({ minimum: 1, maximum: CUE_WINDOW_MAX, default: 100, description: 'How many cues from fromIndex' })
  @IsOptional()
  @NumberFromText()
  @IsInt()
  @Min(1)
  @Max(CUE_WINDOW_MAX)
  limit?: number;
}

export class CueWindowResponseDto {
  @ApiProperty({ description: 'How many cues the whole transcript has (to size a list before its rows arrive)' }) total!: number;
  @ApiProperty({ type: [CueDto], description: `The cues in the window, in order (at most ${CUE_WINDOW_MAX})` }) cues!: CueDto[];
}
