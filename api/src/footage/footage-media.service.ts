import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import { thumbnailsTrack } from '../engine/media-renditions';
import { StorageService } from '../infra/storage/storage.service';
import { RenditionsDto, WaveformDto } from './dto/footage.dto';
import { Footage } from './entities/footage.entity';
import { RENDITION_FILES, renditionsPrefix, type WaveformFile } from './footage-renditions.service';
import { playlistUris, rewritePlaylist, variantIndexFromName, variantIndexOf } from './hls-playlist';

/** Segment, sprite and download links last this long; players fetch the playlist again after a reload. */
export const MEDIA_LINK_TTL_SECONDS = 60 * 60;

/** Where the players fetch a footage's media: the studio's private paths or a published guide's public ones. */
export interface MediaPaths {
  /** e.g. `/api/workshops/:w/footage/:id` or `/api/guides/:ws/:gs` */
  basePath: string;
}

export interface PlaybackMedia {
  hlsUrl: string | null;
  mp4Url: string | null;
  thumbnailsUrl: string | null;
  waveformUrl: string | null;
  displayWidth: number | null;
  displayHeight: number | null;
}

/**
 * Serves the web renditions from the private bucket: playlists pass through the API, which
 * replaces every URI in them (variant playlists by API paths, segments by short-lived storage links).
 */
@Injectable()
export class FootageMediaService {
  constructor(@Inject(StorageService) private readonly storage: StorageService) {}

  renditions(footage: Footage): RenditionsDto {
    return {
      state: footage.renditionsState,
      percent: footage.renditionsPercent,
      secondsLeft: footage.renditionsState === 'processing' ? footage.renditionsSecondsLeft : null,
      reason: footage.renditionsReason,
      variants: footage.renditionsState === 'ready' ? (footage.renditionsMedia?.variants ?? []) : [],
    };
  }

  /** The media links a player needs; null where the renditions are not ready. `mp4Path` is the public redirect, if any. */
  async playbackMedia(footage: Footage, paths: MediaPaths, mp4Path?: string): Promise<PlaybackMedia> {
    const ready = footage.renditionsState === 'ready' && footage.renditionsMedia !== null;
    return {
      hlsUrl: ready ? `${paths.basePath}/hls/master.m3u8` : null,
      mp4Url: ready ? (mp4Path ?? (await this.downloadUrl(footage))) : null,
      thumbnailsUrl: ready ? `${paths.basePath}/thumbnails.vtt` : null,
      waveformUrl: ready ? `${paths.basePath}/waveform` : null,
      displayWidth: footage.displayWidth,
      displayHeight: footage.displayHeight,
    };
  }

  /** A short-lived storage link to the download MP4. */
  async downloadUrl(footage: Footage): Promise<string> {
    this.requireReady(footage);
    return this.storage.presignedGetUrl(`${renditionsPrefix(footage)}${RENDITION_FILES.download}`, MEDIA_LINK_TTL_SECONDS);
  }

  async masterPlaylist(footage: Footage, paths: MediaPaths): Promise<string> {
    this.requireReady(footage);
    const stored = await this.read(footage, RENDITION_FILES.master);
    return rewritePlaylist(stored, (uri) => {
      const index = variantIndexOf(uri);
      if (index === null) throw new Error(`unexpected URI in the stored master playlist: ${uri}`);
      return `${paths.basePath}/hls/v${index}.m3u8`;
    });
  }

  /** `name` is the path's last part, `v<N>.m3u8`. */
  async variantPlaylist(footage: Footage, name: string): Promise<string> {
    const media = this.requireReady(footage);
    const index = variantIndexFromName(name);
    if (index === null || index >= media.variants.length) {
      throw new NotFoundException(`This footage has renditions v0 to v${media.variants.length - 1}`);
    }
    const folder = `${renditionsPrefix(footage)}v${index}/`;
    const stored = await this.read(footage, RENDITION_FILES.variantPlaylist(index));
    const links = new Map<string, string>();
    // ffmpeg names segments plainly (seg-00001.m4s, init_0.mp4); anything else is not ours to sign.
    const uris = playlistUris(stored).filter((uri) => /^[\w.-]+$/u.test(uri));
    await Promise.all(uris.map(async (uri) => links.set(uri, await this.storage.presignedGetUrl(`${folder}${uri}`, MEDIA_LINK_TTL_SECONDS))));
    return rewritePlaylist(stored, (uri) => {
      const link = links.get(uri);
      if (!link) throw new Error(`unexpected URI in a stored variant playlist: ${uri}`);
      return link;
    });
  }

  async thumbnails(footage: Footage): Promise<string> {
    const media = this.requireReady(footage);
    const prefix = renditionsPrefix(footage);
    const sheets = await Promise.all(
      Array.from({ length: media.sprites.sheets }, (_unused, sheet) =>
        this.storage.presignedGetUrl(`${prefix}${RENDITION_FILES.spriteSheet(sheet)}`, MEDIA_LINK_TTL_SECONDS),
      ),
    );
    return thumbnailsTrack(media.sprites, footage.durationMs ?? 0, (sheet) => sheets[sheet]);
  }

  async waveform(footage: Footage): Promise<WaveformDto> {
    this.requireReady(footage);
    const stored = JSON.parse((await this.storage.getObject(`${renditionsPrefix(footage)}${RENDITION_FILES.waveform}`)).body.toString('utf8')) as WaveformFile;
    return { durationMs: stored.durationMs, peaksPerSecond: stored.peaksPerSecond, hasAudio: stored.hasAudio, peaks: stored.peaks };
  }

  private requireReady(footage: Footage) {
    if (footage.renditionsState !== 'ready' || !footage.renditionsMedia) {
      throw new NotFoundException(`The web versions of this footage are not ready (they are ${footage.renditionsState})`);
    }
    return footage.renditionsMedia;
  }

  private async read(footage: Footage, file: string): Promise<string> {
    return (await this.storage.getObject(`${renditionsPrefix(footage)}${file}`)).body.toString('utf8');
  }
}
