/** Shapes of the footage and transcript routes (api/src/footage, api/src/transcripts; OpenAPI at /api/docs). */
import type { ApiSchema } from '@/lib/api-types';

export type FootageState = 'uploading' | 'processing' | 'ready' | 'failed';

/** The web renditions (HLS and MP4) made after probing; the footage is usable meanwhile. */
export interface Renditions {
  state: 'waiting' | 'processing' | 'ready' | 'failed';
  /** 0..100 while processing, 100 when ready. */
  percent: number | null;
  secondsLeft: number | null;
  /** Plain words when failed (the original is kept). */
  reason: string | null;
}

export interface Footage {
  id: string;
  workshopId: string;
  buildId: string;
  title: string;
  originalName: string;
  contentType: string;
  sizeBytes: number;
  state: FootageState;
  failureReason: string | null;
  durationMs: number | null;
  width: number | null;
  height: number | null;
  frameRate: number | null;
  container: string | null;
  videoCodec: string | null;
  audioCodec: string | null;
  posterUrl: string | null;
  /** Absent from an API without the media pipeline. */
  renditions?: Renditions;
  /** The picture as shown, after rotation (a portrait phone clip stays portrait). */
  displayWidth?: number | null;
  displayHeight?: number | null;
  upload: { partCount: number; completedPartCount: number; uploadedBytes: number } | null;
  transcript: { revision: number; cueCount: number } | null;
  createdAt: string;
  updatedAt: string;
}

export interface UploadState {
  partSizeBytes: number;
  partCount: number;
  sizeBytes: number;
  fileName: string;
  completedParts: { partNumber: number; etag: string }[];
}

export interface FootageLimits {
  maxBytes: number;
  types: { extension: string; mimeTypes: string[] }[];
  transcriptMaxBytes: number;
  transcriptMaxCues: number;
}

export interface Playback {
  /** The best progressive file: the MP4 rendition once ready, else the original (short-lived link). */
  url: string;
  expiresAt: string;
  contentType: string;
  /** Same-origin API paths, null until the renditions are ready (absent from an API without the media pipeline). */
  hlsUrl?: string | null;
  thumbnailsUrl?: string | null;
  waveformUrl?: string | null;
  displayWidth?: number | null;
  displayHeight?: number | null;
}

export type TranscriptFormat = 'webvtt' | 'srt' | 'timestamped';

export interface Cue {
  index: number;
  startMs: number;
  endMs: number;
  text: string;
}

export interface TranscriptRevision {
  id: string;
  footageId: string;
  revision: number;
  format: TranscriptFormat;
  sourceName: string | null;
  cueCount: number;
  isActive: boolean;
  createdAt: string;
}

export interface Transcript extends TranscriptRevision {
  cues: Cue[];
}

export interface CueMatch {
  cueIndex: number;
  startMs: number;
  endMs: number;
  text: string;
}

export interface WorkshopCueMatch extends CueMatch {
  footageId: string;
  footageTitle: string;
  buildId: string;
  buildTitle: string;
}

/** One page of search hits: `total` counts every hit, `offset` is where this page starts. */
export interface SearchResults<T> {
  terms: string[];
  total: number;
  offset: number;
  results: T[];
}

/** Where every hit of a footage's transcript search starts, in time order. */
export type HitMoments = ApiSchema<'HitMomentsResponseDto'>;
