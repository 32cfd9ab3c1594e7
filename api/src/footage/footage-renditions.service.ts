import { Inject, Injectable, Logger } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { createReadStream } from 'node:fs';
import { mkdir, mkdtemp, readdir, rm, stat, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { In, Repository } from 'typeorm';
import {
  constantFrameRate,
  displaySize,
  PeakAccumulator,
  renditionLadder,
  samplesPerPeak,
  spriteLayout,
  WAVEFORM_SAMPLE_RATE,
} from '../engine/media-renditions';
import { MediaToolsService, UnreadableSourceError } from '../infra/media/media-tools.service';
import { TRANSCODE_OUTPUTS, type TranscodePlan } from '../infra/media/transcode-command';
import { StorageService } from '../infra/storage/storage.service';
import { Footage, type RenditionsMedia } from './entities/footage.entity';
import { WorkshopMediaSettings } from './entities/workshop-media-settings.entity';
import { RenditionProgress } from './rendition-progress';
import { extensionOf } from './upload-plan';

/** ffmpeg reads the original through a link valid this long; long footage takes a while. */
const TOOL_URL_TTL_SECONDS = 6 * 60 * 60;
/** Fewer frames than this share of the expected ones means the source ends early (a cut-short upload). */
const MIN_FRAME_SHARE = 0.9;

export type RenditionOutcome = 'ready' | 'failed' | 'skipped';

/** Where a footage's web renditions live: a folder next to its original. */
export function renditionsPrefix(footage: Pick<Footage, 'objectKey'>): string {
  return footage.objectKey.replace(/\/[^/]+$/u, '/web/');
}

export const RENDITION_FILES = {
  master: TRANSCODE_OUTPUTS.master,
  download: 'download.mp4',
  waveform: 'waveform.json',
  variantPlaylist: TRANSCODE_OUTPUTS.variantPlaylist,
  spriteSheet: TRANSCODE_OUTPUTS.spriteSheet,
} as const;

export interface WaveformFile {
  durationMs: number;
  peaksPerSecond: number;
  hasAudio: boolean;
  peaks: number[];
}

const CONTENT_TYPES: Record<string, string> = {
  m3u8: 'application/vnd.apple.mpegurl',
  m4s: 'video/iso.segment',
  mp4: 'video/mp4',
  jpg: 'image/jpeg',
  json: 'application/json',
};

/**
 * The transcode job for one footage: one ffmpeg run makes H.264/AAC renditions cut for HLS, the
 * sprite sheets and the waveform's PCM; the top rendition is remuxed into a faststart MP4; all of
 * it goes to storage under `<footage folder>/web/`. Re-running first clears that folder, so a retry
 * replaces partial outputs and never doubles them.
 */
@Injectable()
export class FootageRenditionsService {
  private readonly logger = new Logger(FootageRenditionsService.name);

  constructor(
    @InjectRepository(Footage) private readonly footage: Repository<Footage>,
    @InjectRepository(WorkshopMediaSettings) private readonly settings: Repository<WorkshopMediaSettings>,
    @Inject(StorageService) private readonly storage: StorageService,
    @Inject(MediaToolsService) private readonly media: MediaToolsService,
  ) {}

  async transcode(footageId: string): Promise<RenditionOutcome> {
    const footage = await this.footage.findOneBy({ id: footageId });
    if (!footage || footage.state !== 'ready' || !footage.originalKept || footage.renditionsState === 'ready') return 'skipped';
    const claimed = await this.footage.update(
      { id: footage.id, renditionsState: In(['waiting', 'processing', 'failed']) },
      { renditionsState: 'processing', renditionsPercent: 0, renditionsSecondsLeft: null, renditionsReason: null, renditionsProgressAt: new Date() },
    );
    if (!claimed.affected) return 'skipped';

    const prefix = renditionsPrefix(footage);
    const progress = new RenditionProgress((percent, secondsLeft) =>
      this.footage
        .update(
          { id: footage.id, renditionsState: 'processing' },
          // updated_at stays: progress is the studio's alone, and every public guide tag reads footage.updated_at.
          { renditionsPercent: percent, renditionsSecondsLeft: secondsLeft, renditionsProgressAt: new Date(), updatedAt: () => 'updated_at' },
        )
        .catch((error: unknown) => this.logger.warn(`progress of ${footage.id} not stored: ${String(error)}`)),
    );
    progress.start();
    let workDir: string | undefined;
    try {
      // Whatever an interrupted attempt stored goes first, so nothing is ever doubled.
      await this.storage.deletePrefix(prefix);
      progress.reach('starting', 1 / 3);
      workDir = await mkdtemp(join(tmpdir(), 'fitwright-transcode-'));
      const media = await this.makeRenditions(footage, workDir, progress);
      await this.storeFolder(workDir, prefix, (share) => progress.report('storing', share));
      progress.stop();
      await progress.settled();
      // Ready and "original dropped" are one change, so no reader sees ready footage still claiming its original.
      const dropOriginal = !(await this.keepOriginals(footage.workshopId));
      const finished = await this.footage.update(
        { id: footage.id, renditionsState: 'processing' },
        {
          renditionsState: 'ready',
          renditionsPercent: 100,
          renditionsSecondsLeft: 0,
          renditionsReason: null,
          renditionsProgressAt: new Date(),
          renditionsMedia: media,
          ...(dropOriginal ? { originalKept: false } : {}),
        },
      );
      if (!finished.affected) {
        // Deleted (or retried elsewhere) while we worked: leave nothing behind.
        await this.storage.deletePrefix(prefix);
        return 'skipped';
      }
      if (dropOriginal) await this.deleteOriginal(footage);
      return 'ready';
    } catch (error) {
      progress.stop();
      if (!(error instanceof UnreadableSourceError)) throw error;
      await this.storage.deletePrefix(prefix);
      await this.markFailed(footage.id, `${error.reason} The original is kept.`);
      this.logger.log(`footage ${footage.id}: renditions failed: ${error.reason}`);
      return 'failed';
    } finally {
      progress.stop();
      if (workDir) await rm(workDir, { recursive: true, force: true });
    }
  }

  async markFailed(footageId: string, reason: string): Promise<void> {
    await this.footage.update(
      { id: footageId, renditionsState: In(['waiting', 'processing']) },
      { renditionsState: 'failed', renditionsReason: reason.slice(0, 500), renditionsSecondsLeft: null, renditionsProgressAt: new Date() },
    );
  }

  async keepOriginals(workshopId: string): Promise<boolean> {
    return (await this.settings.findOneBy({ workshopId }))?.keepOriginals ?? true;
  }

  async setKeepOriginals(workshopId: string, keepOriginals: boolean): Promise<boolean> {
    await this.settings.upsert({ workshopId, keepOriginals }, ['workshopId']);
    return keepOriginals;
  }

  private async makeRenditions(footage: Footage, workDir: string, progress: RenditionProgress): Promise<RenditionsMedia> {
    const input = await this.storage.internalGetUrl(footage.objectKey, TOOL_URL_TTL_SECONDS);
    const info = await this.media.probe(input, extensionOf(footage.objectKey));
    progress.reach('starting', 2 / 3);
    const display = displaySize(info.width, info.height, info.rotation);
    await this.footage.update({ id: footage.id }, { displayWidth: display.width, displayHeight: display.height });

    const renditions = renditionLadder(display);
    const frameRate = constantFrameRate(info.frameRate);
    const sprites = spriteLayout(info.durationMs, display);
    const hasAudio = info.audioCodec !== null;
    for (let index = 0; index < renditions.length; index += 1) await mkdir(join(workDir, `v${index}`));
    const plan: TranscodePlan = { input, outputDir: workDir, renditions, frameRate, hasAudio, durationMs: info.durationMs, sprites };

    const expectedFrames = Math.max(1, Math.round((info.durationMs / 1000) * frameRate.value));
    let framesWritten = 0;
    let reading = false;
    await this.media.transcode(plan, ({ frames }) => {
      framesWritten = frames;
      // ffmpeg's first report: it opened the source and is converting (no frame may be counted yet).
      if (!reading) progress.reach('converting', frames / expectedFrames);
      else progress.report('converting', frames / expectedFrames);
      reading = true;
    });
    if (framesWritten < expectedFrames * MIN_FRAME_SHARE) {
      const readSeconds = (framesWritten / frameRate.value).toFixed(1);
      throw new UnreadableSourceError(
        `The video ends early: only ${readSeconds} s of its ${(info.durationMs / 1000).toFixed(1)} s could be read (the upload may be cut short).`,
      );
    }

    progress.reach('packing');
    await this.media.tileSprites(workDir, sprites);
    for (const file of await readdir(workDir)) if (file.startsWith('thumb-')) await rm(join(workDir, file));
    progress.reach('packing', 1 / 3);
    await this.media.remuxFaststart(join(workDir, RENDITION_FILES.variantPlaylist(0)), join(workDir, RENDITION_FILES.download));
    progress.reach('packing', 2 / 3);
    const waveform = await this.waveform(join(workDir, TRANSCODE_OUTPUTS.pcm), info.durationMs, hasAudio);
    await writeFile(join(workDir, RENDITION_FILES.waveform), JSON.stringify(waveform));
    await rm(join(workDir, TRANSCODE_OUTPUTS.pcm), { force: true });
    progress.reach('storing');

    return {
      variants: renditions.map((size) => ({
        width: size.width,
        height: size.height,
        // As ffmpeg declares BANDWIDTH in the master playlist: (video cap + 128 kbit/s audio) × 1.1.
        bandwidth: Math.round((size.maxKbits + 128) * 1000 * 1.1),
      })),
      sprites,
      hasAudio,
      frameRate: Math.round(frameRate.value * 1000) / 1000,
    };
  }

  private async waveform(pcmPath: string, durationMs: number, hasAudio: boolean): Promise<WaveformFile> {
    const perPeak = samplesPerPeak(durationMs);
    const accumulator = new PeakAccumulator(perPeak);
    for await (const chunk of createReadStream(pcmPath)) accumulator.push(chunk as Buffer);
    return {
      durationMs,
      peaksPerSecond: Math.round((WAVEFORM_SAMPLE_RATE / perPeak) * 1000) / 1000,
      hasAudio,
      peaks: accumulator.finish(),
    };
  }

  /**
   * Uploads every file under `folder`, a few at a time; playlists last so no playlist names a missing
   * segment. Reports the share of bytes stored as each file lands.
   */
  private async storeFolder(folder: string, prefix: string, onStored: (share: number) => void): Promise<void> {
    const entries = (await readdir(folder, { recursive: true, withFileTypes: true })).filter((entry) => entry.isFile());
    const files = await Promise.all(
      entries.map(async (entry) => {
        const path = join(entry.parentPath, entry.name);
        return { name: relative(folder, path), path, bytes: (await stat(path)).size };
      }),
    );
    const totalBytes = Math.max(1, files.reduce((sum, file) => sum + file.bytes, 0));
    let storedBytes = 0;
    const put = async (file: (typeof files)[number]) => {
      await this.storage.putFile(`${prefix}${file.name}`, file.path, CONTENT_TYPES[file.name.split('.').pop() ?? ''] ?? 'application/octet-stream');
      storedBytes += file.bytes;
      onStored(storedBytes / totalBytes);
    };
    await runLimited(
      files.filter((file) => !file.name.endsWith('.m3u8')),
      4,
      put,
    );
    await runLimited(
      files.filter((file) => file.name.endsWith('.m3u8')),
      4,
      put,
    );
  }

  /** After the row says the original is gone: a failed delete leaves an object no row points to, never a row pointing at nothing. */
  private async deleteOriginal(footage: Footage): Promise<void> {
    try {
      await this.storage.deleteObject(footage.objectKey);
    } catch (error: unknown) {
      this.logger.warn(`footage ${footage.id}: the original ${footage.objectKey} was not deleted: ${String(error)}`);
    }
  }
}

async function runLimited<T>(items: T[], limit: number, work: (item: T) => Promise<void>): Promise<void> {
  let next = 0;
  const workers = Array.from({ length: Math.min(limit, items.length) }, async () => {
    while (next < items.length) {
      const item = items[next];
      next += 1;
      await work(item);
    }
  });
  await Promise.all(workers);
}
