import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';

/**
 * The most characters one extraction call reads: about two hours of speech. The scan is linear
 * (about 0.1–0.4 s for this many characters on a shared 2-core machine, done in slices that let
 * other requests run); longer text is sent in parts.
 */
export const MAX_EXTRACT_TEXT_LENGTH = 200_000;

/** A 3-hour talk-heavy video makes about 200 kB of WebVTT; five times that still parses in well under a second. */
export const MAX_TRANSCRIPT_TEXT_LENGTH = 1_000_000;

export class ExtractMeasurementsDto {
  @ApiProperty({ example: 'That leaves fifteen thousandths of an inch.', maxLength: MAX_EXTRACT_TEXT_LENGTH })
  @IsString({ message: 'text must be a string' })
  @MaxLength(MAX_EXTRACT_TEXT_LENGTH, {
    message: `text is longer than ${MAX_EXTRACT_TEXT_LENGTH.toLocaleString('en')} characters, the most one call reads; send it in parts`,
  })
  text!: string;
}

export class ParseTranscriptDto {
  @ApiProperty({ example: 'WEBVTT\n\n00:00:01.000 --> 00:00:04.000\nHello', maxLength: MAX_TRANSCRIPT_TEXT_LENGTH })
  @IsString({ message: 'text must be a string' })
  @MaxLength(MAX_TRANSCRIPT_TEXT_LENGTH, {
    message: `text is longer than ${MAX_TRANSCRIPT_TEXT_LENGTH.toLocaleString('en')} characters, the most one call reads`,
  })
  text!: string;

  @ApiPropertyOptional({ enum: ['auto', 'webvtt', 'srt', 'timestamped'], default: 'auto' })
  @IsOptional()
  @IsIn(['auto', 'webvtt', 'srt', 'timestamped'])
  format: 'auto' | 'webvtt' | 'srt' | 'timestamped' = 'auto';
}
