import { Column, Entity, Index, PrimaryColumn, ValueTransformer } from 'typeorm';
import { CreatedAtColumn, newId, UpdatedAtColumn } from '../../common/database/columns';

export const FOOTAGE_STATES = ['uploading', 'processing', 'ready', 'failed'] as const;
export type FootageState = (typeof FOOTAGE_STATES)[number];

/** The web renditions' progress: waiting (queued, or the footage is not probed yet), processing, ready, failed. */
export const RENDITION_STATES = ['waiting', 'processing', 'ready', 'failed'] as const;
export type RenditionState = (typeof RENDITION_STATES)[number];

/** What the transcode job made, kept as JSON beside the footage (storage keys follow from the footage's folder). */
export interface RenditionsMedia {
  /** Highest first; `bandwidth` in bit/s as the master playlist declares it. */
  variants: { width: number; height: number; bandwidth: number }[];
  sprites: {
    intervalSeconds: number;
    tileWidth: number;
    tileHeight: number;
    columns: number;
    rows: number;
    count: number;
    sheets: number;
  };
  hasAudio: boolean;
  /** Constant output frame rate. */
  frameRate: number;
}

const jsonTransformer: ValueTransformer = {
  to: (value: RenditionsMedia | null | undefined) => (value === undefined ? undefined : value === null ? null : JSON.stringify(value)),
  from: (value: string | RenditionsMedia | null) => (typeof value === 'string' ? (JSON.parse(value) as RenditionsMedia) : value),
};

/** BIGINT and DECIMAL columns come back from mysql2 as strings; sizes stay far below 2^53. */
const numberTransformer: ValueTransformer = {
  to: (value: number | null | undefined) => value,
  from: (value: string | number | null) => (value === null ? null : Number(value)),
};

/** A video of a build, stored in S3; the browser uploads it straight to storage. */
@Entity('footage')
@Index('idx_footage_build', ['workshopId', 'buildId', 'createdAt'])
@Index('uq_footage_object', ['objectKey'], { unique: true })
export class Footage {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'workshop_id', type: 'char', length: 36 })
  workshopId!: string;

  @Column({ name: 'build_id', type: 'char', length: 36 })
  buildId!: string;

  @Column({ type: 'varchar', length: 200 })
  title!: string;

  /** The uploaded file's name, sanitised; shown only, never used as a storage key. */
  @Column({ name: 'original_name', type: 'varchar', length: 255 })
  originalName!: string;

  @Column({ name: 'content_type', type: 'varchar', length: 100 })
  contentType!: string;

  @Column({ name: 'size_bytes', type: 'bigint', unsigned: true, transformer: numberTransformer })
  sizeBytes!: number;

  @Column({ name: 'object_key', type: 'varchar', length: 300 })
  objectKey!: string;

  @Column({ type: 'enum', enum: FOOTAGE_STATES, default: 'uploading' })
  state!: FootageState;

  @Column({ name: 'failure_reason', type: 'varchar', length: 500, nullable: true })
  failureReason!: string | null;

  @Column({ name: 'duration_ms', type: 'int', unsigned: true, nullable: true })
  durationMs!: number | null;

  @Column({ type: 'int', unsigned: true, nullable: true })
  width!: number | null;

  @Column({ type: 'int', unsigned: true, nullable: true })
  height!: number | null;

  @Column({ name: 'frame_rate', type: 'decimal', precision: 9, scale: 3, nullable: true, transformer: numberTransformer })
  frameRate!: number | null;

  @Column({ type: 'varchar', length: 40, nullable: true })
  container!: string | null;

  @Column({ name: 'video_codec', type: 'varchar', length: 40, nullable: true })
  videoCodec!: string | null;

  @Column({ name: 'audio_codec', type: 'varchar', length: 40, nullable: true })
  audioCodec!: string | null;

  @Column({ name: 'poster_key', type: 'varchar', length: 300, nullable: true })
  posterKey!: string | null;

  /** Size as players show it, after the stream's rotation (a portrait phone clip is taller than wide). */
  @Column({ name: 'display_width', type: 'int', unsigned: true, nullable: true })
  displayWidth!: number | null;

  @Column({ name: 'display_height', type: 'int', unsigned: true, nullable: true })
  displayHeight!: number | null;

  @Column({ name: 'renditions_state', type: 'enum', enum: RENDITION_STATES, default: 'waiting' })
  renditionsState!: RenditionState;

  @Column({ name: 'renditions_percent', type: 'decimal', precision: 4, scale: 1, nullable: true, transformer: numberTransformer })
  renditionsPercent!: number | null;

  @Column({ name: 'renditions_seconds_left', type: 'int', unsigned: true, nullable: true })
  renditionsSecondsLeft!: number | null;

  @Column({ name: 'renditions_reason', type: 'varchar', length: 500, nullable: true })
  renditionsReason!: string | null;

  /** When the job last stored its progress; a stalled job shows here. */
  @Column({ name: 'renditions_progress_at', type: 'datetime', precision: 3, nullable: true })
  renditionsProgressAt!: Date | null;

  @Column({ name: 'renditions_media', type: 'longtext', nullable: true, transformer: jsonTransformer })
  renditionsMedia!: RenditionsMedia | null;

  /** False once the workshop's "drop originals" setting removed the upload after transcoding. */
  @Column({ name: 'original_kept', type: 'boolean', default: true })
  originalKept!: boolean;

  @Column({ name: 'created_by', type: 'char', length: 36, nullable: true })
  createdBy!: string | null;

  @Column({ name: 'processed_at', type: 'datetime', precision: 3, nullable: true })
  processedAt!: Date | null;

  @CreatedAtColumn()
  createdAt!: Date;

  @UpdatedAtColumn()
  updatedAt!: Date;
}
