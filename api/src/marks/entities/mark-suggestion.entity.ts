import { Column, Entity, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, decimalTransformer, newId } from '../../common/database/columns';

export const SUGGESTION_KINDS = ['measurement', 'part'] as const;
export type SuggestionKind = (typeof SUGGESTION_KINDS)[number];
export const SUGGESTION_STATUSES = ['pending', 'accepted', 'dismissed'] as const;
export type SuggestionStatus = (typeof SUGGESTION_STATUSES)[number];

/** A mark the transcript miner proposes; a person accepts (making the mark) or dismisses it. */
@Entity('mark_suggestions')
export class MarkSuggestion {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'workshop_id', type: 'char', length: 36 })
  workshopId!: string;

  @Column({ name: 'footage_id', type: 'char', length: 36 })
  footageId!: string;

  @Column({ name: 'transcript_id', type: 'char', length: 36, nullable: true })
  transcriptId!: string | null;

  @Column({ name: 'cue_index', type: 'int', unsigned: true })
  cueIndex!: number;

  @Column({ name: 'start_ms', type: 'int', unsigned: true })
  startMs!: number;

  @Column({ name: 'end_ms', type: 'int', unsigned: true })
  endMs!: number;

  @Column({ type: 'enum', enum: SUGGESTION_KINDS })
  kind!: SuggestionKind;

  @Column({ type: 'varchar', length: 300 })
  phrase!: string;

  /** The spoken amount as decimal text in `unit`, so it becomes a measurement without float drift. */
  @Column({ type: 'varchar', length: 40, nullable: true })
  value!: string | null;

  @Column({ type: 'varchar', length: 8, nullable: true })
  unit!: 'mm' | 'um' | 'in' | null;

  @Column({ type: 'decimal', precision: 16, scale: 6, nullable: true, transformer: decimalTransformer })
  millimetres!: number | null;

  @Column({ name: 'part_id', type: 'char', length: 36, nullable: true })
  partId!: string | null;

  /** SHA-256 (hex) of the miner's stable suggestion key. */
  @Column({ name: 'key_hash', type: 'char', length: 64 })
  keyHash!: string;

  @Column({ type: 'enum', enum: SUGGESTION_STATUSES, default: 'pending' })
  status!: SuggestionStatus;

  @Column({ name: 'mark_id', type: 'char', length: 36, nullable: true })
  markId!: string | null;

  @Column({ name: 'decided_by', type: 'char', length: 36, nullable: true })
  decidedBy!: string | null;

  @Column({ name: 'decided_at', type: 'datetime', precision: 3, nullable: true })
  decidedAt!: Date | null;

  @CreatedAtColumn()
  createdAt!: Date;
}
