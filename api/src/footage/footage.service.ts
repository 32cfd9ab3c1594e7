import {
  BadRequestException,
  ConflictException,
  HttpException,
  Inject,
  Injectable,
  Logger,
  NotFoundException,
  OnApplicationBootstrap,
  UnprocessableEntityException,
} from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import { In, QueryFailedError, Repository } from 'typeorm';
import { BuildsService } from '../builds/builds.service';
import { AppConfig } from '../config/app-config';
import { InjectJobQueue, type JobQueue } from '../infra/jobs/job-queue';
import { QUEUES } from '../infra/jobs/queues';
import { MultipartRefusedError, StorageUnavailableError } from '../infra/storage/storage-errors';
import { StorageService } from '../infra/storage/storage.service';
import { TRANSCRIPT_MAX_BYTES, TRANSCRIPT_MAX_CUES } from '../engine/transcript-limits';
import {
  CreateFootageDto,
  CreateFootageResponseDto,
  FootageLimitsDto,
  FootageResponseDto,
  PartUrlsResponseDto,
  PlaybackResponseDto,
  RecordPartResponseDto,
  UploadProgressDto,
  UploadStateDto,
} from './dto/footage.dto';
import { Footage } from './entities/footage.entity';
import { FootageUploadPart } from './entities/footage-upload-part.entity';
import { FootageUpload } from './entities/footage-upload.entity';
import { MEDIA_JOBS, type ProcessFootageJob, type TranscodeFootageJob } from './footage-jobs';
import { FootageMediaService } from './footage-media.service';
import { FootageRenditionsService, renditionsPrefix } from './footage-renditions.service';
import { toFootageResponse } from './footage.mapper';
import { TranscriptSummaries } from './transcript-summaries.port';
import {
  checkFileSize,
  FOOTAGE_TYPES,
  partLength,
  planParts,
  resolveFootageType,
  sanitiseFileName,
  titleFromFileName,
  UploadRuleError,
} from './upload-plan';

/** Part URLs are signed for this long; a 64 MiB part at 1 Mbit/s still starts in time. */
const PART_URL_TTL_SECONDS = 15 * 60;
/** Playback links outlive a long viewing session's seeks; the player asks again after a reload. */
const PLAYBACK_URL_TTL_SECONDS = 60 * 60;
const POSTER_URL_TTL_SECONDS = 60 * 60;

/** Footage of a build and its resumable upload: the browser sends the bytes to storage itself. */
@Injectable()
export class FootageService implements OnApplicationBootstrap {
  private readonly logger = new Logger(FootageService.name);
  private readonly maxBytes: number;

  constructor(
    @InjectRepository(Footage) private readonly footage: Repository<Footage>,
    @InjectRepository(FootageUpload) private readonly uploads: Repository<FootageUpload>,
    @InjectRepository(FootageUploadPart) private readonly parts: Repository<FootageUploadPart>,
    @Inject(BuildsService) private readonly builds: BuildsService,
    @Inject(StorageService) private readonly storage: StorageService,
    @InjectJobQueue(QUEUES.media) private readonly mediaQueue: JobQueue<ProcessFootageJob>,
    @InjectJobQueue(QUEUES.mediaTranscode) private readonly transcodeQueue: JobQueue<TranscodeFootageJob>,
    @Inject(FootageMediaService) private readonly media: FootageMediaService,
    @Inject(FootageRenditionsService) private readonly renditions: FootageRenditionsService,
    @Inject(TranscriptSummaries) private readonly transcriptSummaries: TranscriptSummaries,
    @Inject(ConfigService) config: ConfigService<AppConfig, true>,
  ) {
    this.maxBytes = config.get('footage', { infer: true }).maxBytes;
  }

  /** Footage probed before renditions existed (or whose job was lost) is queued again; job ids keep this idempotent. */
  async onApplicationBootstrap(): Promise<void> {
    try {
      await this.dropTranscodesLeftOnMediaQueue();
      const waiting = await this.footage.find({ where: { state: 'ready', renditionsState: In(['waiting', 'processing']) }, select: { id: true } });
      for (const row of waiting) await this.enqueueRenditions(row.id);
    } catch (error) {
      this.logger.warn(`could not queue waiting renditions: ${errorMessage(error)}`);
    }
  }

  /** Queues the transcode job (media processor, after probing; a retry). */
  async enqueueRenditions(footageId: string): Promise<void> {
    // A retry must run again, so a finished or failed job holding the id is replaced.
    await this.transcodeQueue.enqueue(
      MEDIA_JOBS.transcodeFootage,
      { footageId },
      { jobId: `transcode-footage-${footageId}`, replaceFinished: true, attempts: 3, backoffMs: 5000 },
    );
  }

  /**
   * Transcodes used to be queued on the media queue, which no longer has a handler for them; waiting
   * ones are removed here and queued again on media-transcode from the footage rows just after.
   */
  private async dropTranscodesLeftOnMediaQueue(): Promise<void> {
    await this.mediaQueue.removeWaiting(MEDIA_JOBS.transcodeFootage);
  }

  limits(): FootageLimitsDto {
    return {
      maxBytes: this.maxBytes,
      types: FOOTAGE_TYPES.map(({ extension, mimeTypes }) => ({ extension, mimeTypes })),
      transcriptMaxBytes: TRANSCRIPT_MAX_BYTES,
      transcriptMaxCues: TRANSCRIPT_MAX_CUES,
    };
  }

  /** Every footage lookup goes through the workshop, so another workshop's id answers 404. */
  async get(workshopId: string, footageId: string): Promise<Footage> {
    const footage = await this.footage.findOneBy({ id: footageId, workshopId });
    if (!footage) throw new NotFoundException('Footage not found');
    return footage;
  }

  async list(workshopId: string, buildId: string): Promise<FootageResponseDto[]> {
    await this.builds.get(workshopId, buildId);
    const rows = await this.footage.find({ where: { workshopId, buildId }, order: { createdAt: 'DESC' } });
    return this.describeAll(rows);
  }

  async describe(footage: Footage): Promise<FootageResponseDto> {
    return (await this.describeAll([footage]))[0];
  }

  async create(workshopId: string, buildId: string, userId: string, input: CreateFootageDto): Promise<CreateFootageResponseDto> {
    await this.builds.get(workshopId, buildId);
    const originalName = sanitiseFileName(input.fileName);
    const type = this.applyRule(() => {
      const resolved = resolveFootageType(originalName, input.contentType);
      checkFileSize(input.sizeBytes, this.maxBytes);
      return resolved;
    });
    const plan = this.applyRule(() => planParts(input.sizeBytes));

    const footage = this.footage.create({
      workshopId,
      buildId,
      title: input.title?.trim() || titleFromFileName(originalName),
      originalName,
      contentType: type.contentType,
      sizeBytes: input.sizeBytes,
      state: 'uploading',
      failureReason: null,
      createdBy: userId,
    });
    // Keys never contain the file name: only ids the server made.
    footage.objectKey = `workshops/${workshopId}/footage/${footage.id}/original.${type.extension}`;
    const uploadId = await this.storage.createMultipartUpload(footage.objectKey, type.contentType);
    const upload = this.uploads.create({
      footageId: footage.id,
      uploadId,
      partSizeBytes: plan.partSizeBytes,
      partCount: plan.partCount,
    });
    await this.footage.manager.transaction(async (manager) => {
      await manager.save(footage);
      await manager.save(upload);
    });
    const saved = await this.get(workshopId, footage.id);
    return { footage: await this.describe(saved), upload: this.uploadState(saved, upload, []) };
  }

  async rename(workshopId: string, footageId: string, title: string): Promise<FootageResponseDto> {
    const footage = await this.get(workshopId, footageId);
    footage.title = title.trim();
    return this.describe(await this.footage.save(footage));
  }

  /** What a browser needs to resume: the part plan and every part storage has confirmed. */
  async getUploadState(workshopId: string, footageId: string): Promise<UploadStateDto> {
    const { footage, upload } = await this.openUpload(workshopId, footageId);
    const parts = await this.parts.find({ where: { footageId }, order: { partNumber: 'ASC' } });
    return this.uploadState(footage, upload, parts);
  }

  async signPartUrls(workshopId: string, footageId: string, partNumbers: number[]): Promise<PartUrlsResponseDto> {
    const { footage, upload } = await this.openUpload(workshopId, footageId);
    this.requirePartNumbers(upload, partNumbers);
    const urls = await Promise.all(
      partNumbers.map(async (partNumber) => ({
        partNumber,
        url: await this.storage.presignedUploadPartUrl(footage.objectKey, upload.uploadId, partNumber, PART_URL_TTL_SECONDS),
      })),
    );
    return { expiresAt: new Date(Date.now() + PART_URL_TTL_SECONDS * 1000).toISOString(), urls };
  }

  /** Records a finished part; uploading the same part again replaces its ETag, as storage does. */
  async recordPart(workshopId: string, footageId: string, partNumber: number, etag: string): Promise<RecordPartResponseDto> {
    const { upload } = await this.openUpload(workshopId, footageId);
    this.requirePartNumbers(upload, [partNumber]);
    try {
      await this.parts.upsert({ footageId, partNumber, etag }, ['footageId', 'partNumber']);
    } catch (error) {
      // The upload completed or was cancelled between our check and the write.
      if (error instanceof QueryFailedError && (error.driverError as { errno?: number }).errno === 1452) {
        throw new ConflictException('The upload of this footage is finished');
      }
      throw error;
    }
    const completedPartCount = await this.parts.countBy({ footageId });
    return { partNumber, completedPartCount, partCount: upload.partCount };
  }

  /**
   * Assembles the object from the recorded parts and queues processing. Safe to repeat: a client
   * whose first answer was lost gets the footage as it now is.
   */
  async complete(workshopId: string, footageId: string): Promise<FootageResponseDto> {
    const footage = await this.get(workshopId, footageId);
    if (footage.state === 'processing') {
      await this.enqueueProcessing(footage.id);
      return this.describe(footage);
    }
    if (footage.state !== 'uploading') return this.describe(footage);

    const upload = await this.requireUpload(footage);
    const parts = await this.parts.find({ where: { footageId }, order: { partNumber: 'ASC' } });
    const recorded = new Set(parts.map((part) => part.partNumber));
    const missing: number[] = [];
    for (let number = 1; number <= upload.partCount; number += 1) if (!recorded.has(number)) missing.push(number);
    if (missing.length > 0) {
      const shown = missing.slice(0, 10).join(', ') + (missing.length > 10 ? ', …' : '');
      throw new ConflictException({
        message: `The upload is not finished: ${missing.length} of ${upload.partCount} parts are missing (${shown})`,
        missingParts: missing,
      });
    }

    try {
      await this.storage.completeMultipartUpload(
        footage.objectKey,
        upload.uploadId,
        parts.map(({ partNumber, etag }) => ({ partNumber, etag })),
      );
    } catch (error) {
      // Storage down: a 503 for the caller, who tries again; nothing recorded changes.
      if (error instanceof StorageUnavailableError) throw error;
      // A repeated call after storage already assembled the object finds it in place.
      const stored = await this.storage.headObject(footage.objectKey);
      if (!stored) {
        this.logger.warn(`completing upload of footage ${footage.id} failed: ${errorMessage(error)}`);
        throw await this.refusedCompletion(footage.id, parts, error);
      }
    }
    const stored = await this.storage.headObject(footage.objectKey);
    if (!stored) throw new ConflictException('Storage reports no file after assembling the upload. Start the upload again.');

    const moved = await this.footage.manager.transaction(async (manager) => {
      const result = await manager.update(
        Footage,
        { id: footage.id, state: 'uploading' },
        { state: 'processing', sizeBytes: stored.sizeBytes },
      );
      if (!result.affected) return false;
      await manager.delete(FootageUpload, { footageId: footage.id });
      return true;
    });
    if (moved) await this.enqueueProcessing(footage.id);
    return this.describe(await this.get(workshopId, footageId));
  }

  /**
   * The answer when storage would not assemble the recorded parts. A part storage does not hold as
   * recorded (never uploaded, or another ETag) is forgotten, so the upload resumes by sending that
   * part again; every other part and the upload itself stay as they were.
   */
  private async refusedCompletion(footageId: string, parts: FootageUploadPart[], error: unknown): Promise<HttpException> {
    if (!(error instanceof MultipartRefusedError)) {
      return new ConflictException(`Storage could not assemble the uploaded parts (${errorMessage(error)}). Cancel this upload and start again.`);
    }
    if (error.refusal === 'NoSuchUpload') {
      return new ConflictException({
        message: 'Storage no longer has this upload (it expired or was cancelled). Cancel it and upload the file again.',
        code: 'upload_gone',
      });
    }
    const refused = error.refusal === 'InvalidPart' ? parts.find((part) => part.partNumber === error.partNumber) : undefined;
    if (!refused) {
      const where = error.partNumber === undefined ? 'without saying which part' : `at part ${error.partNumber}`;
      return new UnprocessableEntityException({
        message: `Storage refused the recorded parts (${error.refusal}, ${where}). Cancel this upload and start again.`,
        code: 'part_invalid',
        invalidParts: [],
      });
    }
    // Conditional on the ETag, so a part recorded again meanwhile is kept.
    await this.parts.delete({ footageId, partNumber: refused.partNumber, etag: refused.etag });
    return new UnprocessableEntityException({
      message: `Storage does not hold part ${refused.partNumber} as recorded (it was not uploaded, or its ETag differs). Upload part ${refused.partNumber} again, then finish.`,
      code: 'part_invalid',
      invalidParts: [refused.partNumber],
    });
  }

  /** Cancels an unfinished upload: storage drops the parts and the footage is deleted. */
  async abort(workshopId: string, footageId: string): Promise<void> {
    const { footage, upload } = await this.openUpload(workshopId, footageId);
    await this.storage.abortMultipartUpload(footage.objectKey, upload.uploadId);
    await this.footage.delete({ id: footage.id, workshopId });
  }

  /** Deletes footage in any state, with its stored file, poster, web renditions and transcripts. */
  async remove(workshopId: string, footageId: string): Promise<void> {
    const footage = await this.get(workshopId, footageId);
    if (footage.state === 'uploading') {
      const upload = await this.uploads.findOneBy({ footageId });
      if (upload) await this.storage.abortMultipartUpload(footage.objectKey, upload.uploadId);
    }
    await this.storage.deleteObject(footage.objectKey);
    if (footage.posterKey) await this.storage.deleteObject(footage.posterKey);
    await this.footage.delete({ id: footage.id, workshopId });
    // After the row: a transcode still running finds the row gone and clears what it stored itself.
    await this.storage.deletePrefix(renditionsPrefix(footage));
  }

  async playback(workshopId: string, footageId: string): Promise<PlaybackResponseDto> {
    const footage = await this.get(workshopId, footageId);
    if (footage.state !== 'ready') {
      throw new ConflictException(`The footage cannot be played yet: it is ${footage.state}`);
    }
    const media = await this.media.playbackMedia(footage, { basePath: `/api/workshops/${workshopId}/footage/${footageId}` });
    // Once the web MP4 exists it is the progressive file every browser plays; the original may be HEVC.
    const url = media.mp4Url ?? (await this.storage.presignedGetUrl(footage.objectKey, PLAYBACK_URL_TTL_SECONDS));
    return {
      url,
      expiresAt: new Date(Date.now() + PLAYBACK_URL_TTL_SECONDS * 1000).toISOString(),
      contentType: media.mp4Url ? 'video/mp4' : footage.contentType,
      ...media,
      renditions: this.media.renditions(footage),
    };
  }

  /** Makes the web renditions again (after a failure, or to replace them); the footage stays usable meanwhile. */
  async retryRenditions(workshopId: string, footageId: string): Promise<FootageResponseDto> {
    const footage = await this.get(workshopId, footageId);
    if (footage.state !== 'ready') throw new ConflictException(`Web versions are made once the footage is ready; it is ${footage.state}`);
    if (!footage.originalKept) throw new ConflictException('The original was dropped after transcoding, so the web versions cannot be made again');
    if (footage.renditionsState === 'waiting' || footage.renditionsState === 'processing') {
      throw new ConflictException(`Web versions are already being made (${footage.renditionsState})`);
    }
    await this.footage.update(
      { id: footage.id, renditionsState: footage.renditionsState },
      { renditionsState: 'waiting', renditionsPercent: null, renditionsSecondsLeft: null, renditionsReason: null },
    );
    await this.enqueueRenditions(footage.id);
    return this.describe(await this.get(workshopId, footageId));
  }

  async mediaSettings(workshopId: string): Promise<{ keepOriginals: boolean }> {
    return { keepOriginals: await this.renditions.keepOriginals(workshopId) };
  }

  async updateMediaSettings(workshopId: string, keepOriginals: boolean): Promise<{ keepOriginals: boolean }> {
    return { keepOriginals: await this.renditions.setKeepOriginals(workshopId, keepOriginals) };
  }

  /** Adds the processing job; the job id makes a repeated call a no-op while the job exists. */
  private async enqueueProcessing(footageId: string): Promise<void> {
    await this.mediaQueue.enqueue(
      MEDIA_JOBS.processFootage,
      { footageId },
      { jobId: `process-footage-${footageId}`, timeoutMs: 10 * 60 * 1000 },
    );
  }

  private async openUpload(workshopId: string, footageId: string): Promise<{ footage: Footage; upload: FootageUpload }> {
    const footage = await this.get(workshopId, footageId);
    if (footage.state !== 'uploading') {
      throw new ConflictException(`The upload of this footage is finished (it is ${footage.state})`);
    }
    return { footage, upload: await this.requireUpload(footage) };
  }

  private async requireUpload(footage: Footage): Promise<FootageUpload> {
    const upload = await this.uploads.findOneBy({ footageId: footage.id });
    if (!upload) throw new ConflictException('This footage has no upload in progress');
    return upload;
  }

  private requirePartNumbers(upload: FootageUpload, partNumbers: number[]): void {
    const outside = partNumbers.filter((number) => number < 1 || number > upload.partCount);
    if (outside.length > 0) {
      throw new BadRequestException(
        `Part ${outside.join(', ')} is outside this upload, which has parts 1 to ${upload.partCount}`,
      );
    }
  }

  private uploadState(footage: Footage, upload: FootageUpload, parts: FootageUploadPart[]): UploadStateDto {
    return {
      partSizeBytes: upload.partSizeBytes,
      partCount: upload.partCount,
      sizeBytes: footage.sizeBytes,
      fileName: footage.originalName,
      completedParts: parts.map(({ partNumber, etag }) => ({ partNumber, etag })),
    };
  }

  private applyRule<T>(rule: () => T): T {
    try {
      return rule();
    } catch (error) {
      if (error instanceof UploadRuleError) throw new BadRequestException(error.message);
      throw error;
    }
  }

  private async describeAll(rows: Footage[]): Promise<FootageResponseDto[]> {
    if (rows.length === 0) return [];
    const ids = rows.map((row) => row.id);
    const uploading = rows.filter((row) => row.state === 'uploading').map((row) => row.id);
    const [uploads, partCounts, transcripts] = await Promise.all([
      uploading.length ? this.uploads.findBy({ footageId: In(uploading) }) : Promise.resolve([]),
      uploading.length ? this.countParts(uploading) : Promise.resolve(new Map<string, number[]>()),
      this.transcriptSummaries.activeFor(ids),
    ]);
    const uploadById = new Map(uploads.map((upload) => [upload.footageId, upload]));
    return Promise.all(
      rows.map(async (row) => {
        const upload = uploadById.get(row.id);
        let progress: UploadProgressDto | null = null;
        if (upload) {
          const done = partCounts.get(row.id) ?? [];
          const plan = { partSizeBytes: upload.partSizeBytes, partCount: upload.partCount };
          progress = {
            partCount: upload.partCount,
            completedPartCount: done.length,
            uploadedBytes: done.reduce((sum, number) => sum + partLength(plan, row.sizeBytes, number), 0),
          };
        }
        const posterUrl = row.posterKey ? await this.storage.presignedGetUrl(row.posterKey, POSTER_URL_TTL_SECONDS) : null;
        return toFootageResponse(row, {
          posterUrl,
          upload: progress,
          transcript: transcripts.get(row.id) ?? null,
          renditions: this.media.renditions(row),
        });
      }),
    );
  }

  private async countParts(footageIds: string[]): Promise<Map<string, number[]>> {
    const parts = await this.parts.find({ where: { footageId: In(footageIds) }, select: { footageId: true, partNumber: true } });
    const byFootage = new Map<string, number[]>();
    for (const part of parts) byFootage.set(part.footageId, [...(byFootage.get(part.footageId) ?? []), part.partNumber]);
    return byFootage;
  }
}

function errorMessage(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}
