import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  ArrayMaxSize,
  ArrayMinSize,
  ArrayUnique,
  IsArray,
  IsBoolean,
  IsInt,
  IsOptional,
  IsString,
  Length,
  Matches,
  Max,
  MaxLength,
  Min,
} from 'class-validator';
import { FOOTAGE_STATES, type FootageState, RENDITION_STATES, type RenditionState } from '../entities/footage.entity';
import { MAX_PARTS } from '../upload-plan';

export class CreateFootageDto {
  @ApiProperty({ example: 'coupler-spline-check.mp4', description: 'The file name as the browser gives it; sanitised before it is stored' })
  @IsString()
  @Length(1, 1000)
  fileName!: string;

  @ApiProperty({ example: 'video/mp4', description: "The browser's MIME type for the file (may be empty when it does not know)" })
  @IsString()
  @MaxLength(200)
  contentType!: string;

  @ApiProperty({ example: 734003200, description: 'File size in bytes' })
  @IsInt()
  @Min(1)
  @Max(Number.MAX_SAFE_INTEGER)
  sizeBytes!: number;

  @ApiPropertyOptional({ example: 'Coupler spline check', description: 'Defaults to the file name without its extension' })
  @IsOptional()
  @IsString()
  @Length(1, 200)
  title?: string;
}

export class UpdateFootageDto {
  @ApiProperty({ example: 'Coupler spline check' })
  @IsString()
  @Length(1, 200)
  title!: string;
}

export class PartUrlsRequestDto {
  @ApiProperty({ example: [1, 2, 3, 4], description: 'Part numbers to sign (1-based), at most 100 per request' })
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(100)
  @ArrayUnique()
  @IsInt({ each: true })
  @Min(1, { each: true })
  @Max(MAX_PARTS, { each: true })
  partNumbers!: number[];
}

export class RecordPartDto {
  @ApiProperty({
    example: '"9b2cf535f27731c974343645a3985328"',
    description: "The ETag header storage answered the part upload with: a part's MD5 in hex, quoted or bare",
  })
  @IsString()
  // S3 gives every uploaded part (plain, SSE-S3 or SSE-KMS) a 32-hex-digit ETag; anything else was never a part's.
  @Matches(/^(?:"[0-9a-fA-F]{32}"|[0-9a-fA-F]{32})$/u, {
    message: 'etag must be the ETag storage answered for the part: 32 hexadecimal digits, bare or in double quotes',
  })
  etag!: string;
}

export class UploadedPartDto {
  @ApiProperty() partNumber!: number;
  @ApiProperty() etag!: string;
}

export class UploadStateDto {
  @ApiProperty({ description: 'Bytes in every part but the last' }) partSizeBytes!: number;
  @ApiProperty() partCount!: number;
  @ApiProperty() sizeBytes!: number;
  @ApiProperty({ description: 'The file name the upload was started with (sanitised)' }) fileName!: string;
  @ApiProperty({ type: [UploadedPartDto], description: 'Parts storage has confirmed, in part order' })
  completedParts!: UploadedPartDto[];
}

export class UploadProgressDto {
  @ApiProperty() partCount!: number;
  @ApiProperty() completedPartCount!: number;
  @ApiProperty() uploadedBytes!: number;
}

export class TranscriptSummaryDto {
  @ApiProperty() revision!: number;
  @ApiProperty() cueCount!: number;
}

export class RenditionVariantDto {
  @ApiProperty({ example: 1920 }) width!: number;
  @ApiProperty({ example: 1080 }) height!: number;
  @ApiProperty({ example: 5640800, description: 'Peak bit rate as the master playlist declares it (bit/s)' }) bandwidth!: number;
}

export class RenditionsDto {
  @ApiProperty({ enum: RENDITION_STATES, description: 'waiting: queued (or the footage is not probed yet)' }) state!: RenditionState;
  @ApiProperty({ type: Number, nullable: true, example: 42.5, description: 'Percent done while processing; 100 when ready' })
  percent!: number | null;
  @ApiProperty({ type: Number, nullable: true, example: 37, description: 'Estimated seconds left while processing' })
  secondsLeft!: number | null;
  @ApiProperty({ type: String, nullable: true, description: 'Why the web versions could not be made, in plain words' })
  reason!: string | null;
  @ApiProperty({ type: [RenditionVariantDto], description: 'The renditions made, highest first; empty until ready' })
  variants!: RenditionVariantDto[];
}

export class WaveformDto {
  @ApiProperty() durationMs!: number;
  @ApiProperty({ example: 20, description: 'Peaks per second of footage' }) peaksPerSecond!: number;
  @ApiProperty({ description: 'False when the source had no audio (the renditions carry silence)' }) hasAudio!: boolean;
  @ApiProperty({ type: [Number], description: 'Largest absolute sample of each slice, 0..1 of full scale' }) peaks!: number[];
}

export class MediaSettingsDto {
  @ApiProperty({ description: 'Keep the uploaded original after web versions are made (default true)' })
  @IsBoolean()
  keepOriginals!: boolean;
}

export class FootageResponseDto {
  @ApiProperty() id!: string;
  @ApiProperty() workshopId!: string;
  @ApiProperty() buildId!: string;
  @ApiProperty() title!: string;
  @ApiProperty() originalName!: string;
  @ApiProperty() contentType!: string;
  @ApiProperty() sizeBytes!: number;
  @ApiProperty({ enum: FOOTAGE_STATES }) state!: FootageState;
  @ApiProperty({ type: String, nullable: true, description: 'Why processing failed, in words for the creator' })
  failureReason!: string | null;
  @ApiProperty({ type: Number, nullable: true }) durationMs!: number | null;
  @ApiProperty({ type: Number, nullable: true }) width!: number | null;
  @ApiProperty({ type: Number, nullable: true }) height!: number | null;
  @ApiProperty({ type: Number, nullable: true }) frameRate!: number | null;
  @ApiProperty({ type: String, nullable: true }) container!: string | null;
  @ApiProperty({ type: String, nullable: true }) videoCodec!: string | null;
  @ApiProperty({ type: String, nullable: true }) audioCodec!: string | null;
  @ApiProperty({ type: String, nullable: true, description: 'Short-lived link to the poster frame' })
  posterUrl!: string | null;
  @ApiProperty({ type: UploadProgressDto, nullable: true, description: 'Only while uploading' })
  upload!: UploadProgressDto | null;
  @ApiProperty({ type: TranscriptSummaryDto, nullable: true, description: 'The active transcript, if any' })
  transcript!: TranscriptSummaryDto | null;
  @ApiProperty({ type: Number, nullable: true, description: 'Width as displayed (after rotation); known once renditions start' })
  displayWidth!: number | null;
  @ApiProperty({ type: Number, nullable: true }) displayHeight!: number | null;
  @ApiProperty({ type: RenditionsDto, description: 'The web renditions (HLS, MP4, scrub previews, waveform)' })
  renditions!: RenditionsDto;
  @ApiProperty({ description: 'False once the workshop setting dropped the original after transcoding' }) originalKept!: boolean;
  @ApiProperty() createdAt!: string;
  @ApiProperty() updatedAt!: string;
}

export class CreateFootageResponseDto {
  @ApiProperty({ type: FootageResponseDto }) footage!: FootageResponseDto;
  @ApiProperty({ type: UploadStateDto }) upload!: UploadStateDto;
}

export class PartUrlDto {
  @ApiProperty() partNumber!: number;
  @ApiProperty({ description: 'Presigned PUT URL; send the part bytes as the body, no credentials' }) url!: string;
}

export class PartUrlsResponseDto {
  @ApiProperty() expiresAt!: string;
  @ApiProperty({ type: [PartUrlDto] }) urls!: PartUrlDto[];
}

export class RecordPartResponseDto {
  @ApiProperty() partNumber!: number;
  @ApiProperty() completedPartCount!: number;
  @ApiProperty() partCount!: number;
}

export class PlaybackResponseDto {
  @ApiProperty({ description: 'Presigned GET URL of a progressive file (the MP4 rendition once ready, else the original); HTTP Range works' })
  url!: string;
  @ApiProperty() expiresAt!: string;
  @ApiProperty() contentType!: string;
  @ApiProperty({ type: String, nullable: true, example: '/api/workshops/…/footage/…/hls/master.m3u8', description: 'HLS master playlist (API path) once renditions are ready' })
  hlsUrl!: string | null;
  @ApiProperty({ type: String, nullable: true, description: 'Presigned link to the faststart H.264/AAC MP4 once ready' })
  mp4Url!: string | null;
  @ApiProperty({ type: String, nullable: true, description: 'WebVTT thumbnails track (API path); cue texts are sprite links with #xywh=' })
  thumbnailsUrl!: string | null;
  @ApiProperty({ type: String, nullable: true, description: 'Waveform peaks (API path, WaveformDto)' })
  waveformUrl!: string | null;
  @ApiProperty({ type: Number, nullable: true }) displayWidth!: number | null;
  @ApiProperty({ type: Number, nullable: true }) displayHeight!: number | null;
  @ApiProperty({ type: RenditionsDto }) renditions!: RenditionsDto;
}

export class FootageTypeDto {
  @ApiProperty({ example: 'mp4' }) extension!: string;
  @ApiProperty({ example: ['video/mp4'] }) mimeTypes!: string[];
}

export class FootageLimitsDto {
  @ApiProperty({ example: 20_000_000_000 }) maxBytes!: number;
  @ApiProperty({ type: [FootageTypeDto] }) types!: FootageTypeDto[];
  @ApiProperty({ description: 'Largest transcript file or pasted text, in bytes' }) transcriptMaxBytes!: number;
  @ApiProperty() transcriptMaxCues!: number;
}
