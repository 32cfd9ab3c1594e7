import { Column, Entity, PrimaryColumn, ValueTransformer } from 'typeorm';
import { CreatedAtColumn, newId } from '../../common/database/columns';

export const TRANSCRIPT_FORMATS = ['webvtt', 'srt', 'timestamped'] as const;
export type StoredTranscriptFormat = (typeof TRANSCRIPT_FORMATS)[number];

const activeFlag: ValueTransformer = {
  to: (value: boolean | undefined) => (value === undefined ? undefined : value ? 1 : null),
  from: (value: number | null) => value === 1,
};

/**
 * One revision of a footage's transcript. Replacing a transcript adds a revision and makes it the
 * active one; earlier revisions (with their source text and cues) are kept.
 */
@Entity('transcripts')
export class Transcript {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'workshop_id', type: 'char', length: 36 })
  workshopId!: string;

  @Column({ name: 'footage_id', type: 'char', length: 36 })
  footageId!: string;

  @Column({ type: 'int', unsigned: true })
  revision!: number;

  @Column({ type: 'enum', enum: TRANSCRIPT_FORMATS })
  format!: StoredTranscriptFormat;

  /** The attached file's name (sanitised), or null when the text was pasted. */
  @Column({ name: 'source_name', type: 'varchar', length: 255, nullable: true })
  sourceName!: string | null;

  /** The text exactly as it arrived, so a revision can be reviewed or exported as given. */
  @Column({ name: 'source_text', type: 'mediumtext', select: false })
  sourceText!: string;

  @Column({ name: 'cue_count', type: 'int', unsigned: true })
  cueCount!: number;

  /** Stored as 1 or NULL so a unique key allows one active revision per footage. */
  @Column({ name: 'is_active', type: 'tinyint', nullable: true, default: 1, transformer: activeFlag })
  isActive!: boolean;

  @Column({ name: 'created_by', type: 'char', length: 36, nullable: true })
  createdBy!: string | null;

  @CreatedAtColumn()
  createdAt!: Date;
}
