import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';

/** Transcripts of a few hours run to a few hundred kilobytes; this leaves room and still bounds the work. */
export const MAX_TEXT_LENGTH = 2_000_000;

export class ExtractMeasurementsDto {
  @ApiProperty({ example: 'That leaves fifteen thousandths of an inch.' })
  @IsString()
  @MaxLength(MAX_TEXT_LENGTH)
  text!: string;
}

export class ParseTranscriptDto {
  @ApiProperty({ example: 'WEBVTT\n\n00:00:01.000 --> 00:00:04.000\nHello' })
  @IsString()
  @MaxLength(MAX_TEXT_LENGTH)
  text!: string;

  @ApiPropertyOptional({ enum: ['auto', 'webvtt', 'srt', 'timestamped'], default: 'auto' })
  @IsOptional()
  @IsIn(['auto', 'webvtt', 'srt', 'timestamped'])
  format: 'auto' | 'webvtt' | 'srt' | 'timestamped' = 'auto';
}
