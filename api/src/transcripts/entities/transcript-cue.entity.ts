import { Column, Entity, PrimaryColumn } from 'typeorm';

/** A timed line of a transcript revision; `text` has a FULLTEXT index for search. */
@Entity('transcript_cues')
export class TranscriptCue {
  @PrimaryColumn({ name: 'transcript_id', type: 'char', length: 36 })
  transcriptId!: string;

  /** Position in the transcript, from 0. */
  @PrimaryColumn({ name: 'cue_index', type: 'int', unsigned: true })
  cueIndex!: number;

  @Column({ name: 'start_ms', type: 'int', unsigned: true })
  startMs!: number;

  @Column({ name: 'end_ms', type: 'int', unsigned: true })
  endMs!: number;

  /** The WebVTT cue identifier, when the file gave one (kept for export). */
  @Column({ type: 'varchar', length: 255, nullable: true })
  identifier!: string | null;

  @Column({ type: 'text' })
  text!: string;
}
