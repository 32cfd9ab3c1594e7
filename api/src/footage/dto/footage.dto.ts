import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  ArrayMaxSize,
  ArrayMinSize,
  ArrayUnique,
  IsArray,
  IsInt,
  IsOptional,
  IsString,
  Length,
  Matches,
  Max,
  MaxLength,
  Min,
} from 'class-validator';
import { FOOTAGE_STATES, type FootageState } from '../entities/footage.entity';
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
  @ApiProperty({ description: 'Presigned GET URL; supports HTTP Range requests for seeking' }) url!: string;
  @ApiProperty() expiresAt!: string;
  @ApiProperty() contentType!: string;
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
