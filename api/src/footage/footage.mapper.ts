import { FootageResponseDto, RenditionsDto, TranscriptSummaryDto, UploadProgressDto } from './dto/footage.dto';
import { Footage } from './entities/footage.entity';

export interface FootageExtras {
  posterUrl: string | null;
  upload: UploadProgressDto | null;
  transcript: TranscriptSummaryDto | null;
  renditions: RenditionsDto;
}

export function toFootageResponse(footage: Footage, extras: FootageExtras): FootageResponseDto {
  return {
    id: footage.id,
    workshopId: footage.workshopId,
    buildId: footage.buildId,
    title: footage.title,
    originalName: footage.originalName,
    contentType: footage.contentType,
    sizeBytes: footage.sizeBytes,
    state: footage.state,
    failureReason: footage.failureReason,
    durationMs: footage.durationMs,
    width: footage.width,
    height: footage.height,
    frameRate: footage.frameRate,
    container: footage.container,
    videoCodec: footage.videoCodec,
    audioCodec: footage.audioCodec,
    posterUrl: extras.posterUrl,
    upload: extras.upload,
    transcript: extras.transcript,
    displayWidth: footage.displayWidth,
    displayHeight: footage.displayHeight,
    renditions: extras.renditions,
    originalKept: footage.originalKept,
    createdAt: footage.createdAt.toISOString(),
    updatedAt: footage.updatedAt.toISOString(),
  };
}
