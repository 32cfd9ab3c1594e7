import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId, UpdatedAtColumn } from '../../common/database/columns';

export const MARK_KINDS = ['part', 'measurement', 'check_evidence', 'step', 'caution', 'note'] as const;
export type MarkKind = (typeof MARK_KINDS)[number];

/**
 * A moment (or span) of a footage tied to what it shows. It points at the footage, not at a
 * transcript cue, so replacing the transcript leaves its time alone.
 */
@Entity('marks')
@Index(['workshopId', 'footageId', 'startMs'])
export class Mark {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'workshop_id', type: 'char', length: 36 })
  workshopId!: string;

  @Column({ name: 'footage_id', type: 'char', length: 36 })
  footageId!: string;

  @Column({ name: 'start_ms', type: 'int', unsigned: true })
  startMs!: number;

  @Column({ name: 'end_ms', type: 'int', unsigned: true, nullable: true })
  endMs!: number | null;

  @Column({ type: 'enum', enum: MARK_KINDS })
  kind!: MarkKind;

  @Column({ name: 'part_id', type: 'char', length: 36, nullable: true })
  partId!: string | null;

  @Column({ name: 'measurement_id', type: 'char', length: 36, nullable: true })
  measurementId!: string | null;

  @Column({ name: 'fit_check_id', type: 'char', length: 36, nullable: true })
  fitCheckId!: string | null;

  @Column({ name: 'guide_step_id', type: 'char', length: 36, nullable: true })
  guideStepId!: string | null;

  @Column({ type: 'varchar', length: 200, default: '' })
  label!: string;

  @Column({ name: 'created_by', type: 'char', length: 36, nullable: true })
  createdBy!: string | null;

  @CreatedAtColumn()
  createdAt!: Date;

  @UpdatedAtColumn()
  updatedAt!: Date;
}
