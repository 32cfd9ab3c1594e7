import { Inject, Injectable, Logger } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { MediaInfo, NotAVideoError, posterTimeMs } from '../infra/media/media-probe';
import { MediaToolsService } from '../infra/media/media-tools.service';
import { StorageService } from '../infra/storage/storage.service';
import { Footage } from './entities/footage.entity';
import { extensionOf } from './upload-plan';

/** ffprobe and ffmpeg read the object through a link valid this long. */
const TOOL_URL_TTL_SECONDS = 15 * 60;

export type ProcessingOutcome = 'ready' | 'rejected' | 'skipped';

/**
 * What the media job does for one uploaded footage: probe it, keep the facts, store a poster
 * frame, move it to `ready`; or mark it `failed` with a reason and remove a file that is not a video.
 * Errors other than "not a video" are thrown, so the queue retries them with backoff.
 */
@Injectable()
export class FootageProcessingService {
  private readonly logger = new Logger(FootageProcessingService.name);

  constructor(
    @InjectRepository(Footage) private readonly footage: Repository<Footage>,
    @Inject(StorageService) private readonly storage: StorageService,
    @Inject(MediaToolsService) private readonly media: MediaToolsService,
  ) {}

  async process(footageId: string): Promise<ProcessingOutcome> {
    const footage = await this.footage.findOneBy({ id: footageId });
    if (!footage) return 'skipped';
    // An earlier attempt made it ready but its process may have stopped before the transcode was queued
    // (an API shut down mid-job): answer ready again so the caller queues it (the job id keeps that single).
    if (footage.state === 'ready' && footage.renditionsState === 'waiting') return 'ready';
    // Already handled by an earlier attempt.
    if (footage.state !== 'processing') return 'skipped';

    const stored = await this.storage.headObject(footage.objectKey);
    if (!stored) {
      await this.markFailed(footage.id, 'The uploaded file is missing from storage. Upload it again.');
      return 'rejected';
    }
    const url = await this.storage.internalGetUrl(footage.objectKey, TOOL_URL_TTL_SECONDS);
    let info: MediaInfo;
    try {
      info = await this.media.probe(url, extensionOf(footage.objectKey));
    } catch (error) {
      if (!(error instanceof NotAVideoError)) throw error;
      await this.storage.deleteObject(footage.objectKey);
      await this.markFailed(footage.id, `${error.reason} The file was removed.`);
      this.logger.log(`footage ${footage.id} rejected: ${error.reason}`);
      return 'rejected';
    }

    const poster = await this.media.posterFrame(url, posterTimeMs(info.durationMs));
    const posterKey = footage.objectKey.replace(/\/[^/]+$/u, '/poster.jpg');
    await this.storage.putObject(posterKey, poster, 'image/jpeg');

    const result = await this.footage.update(
      { id: footage.id, state: 'processing' },
      {
        state: 'ready',
        failureReason: null,
        durationMs: info.durationMs,
        width: info.width,
        height: info.height,
        frameRate: info.frameRate,
        container: info.container,
        videoCodec: info.videoCodec,
        audioCodec: info.audioCodec,
        posterKey,
        processedAt: new Date(),
      },
    );
    if (!result.affected) {
      // Deleted while we worked: leave nothing behind.
      await this.storage.deleteObject(posterKey);
      return 'skipped';
    }
    return 'ready';
  }

  /** Moves processing footage to `failed`; used for rejections and when the queue gives up retrying. */
  async markFailed(footageId: string, reason: string): Promise<void> {
    await this.footage.update(
      { id: footageId, state: 'processing' },
      { state: 'failed', failureReason: reason.slice(0, 500), processedAt: new Date() },
    );
  }
}
