import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId } from '../../common/database/columns';

export const EVIDENCE_KINDS = ['measurement', 'mark', 'photo'] as const;
export type EvidenceKind = (typeof EVIDENCE_KINDS)[number];

/** What proves a check: a measurement, a mark in the footage, or a photo in storage. */
@Entity('fit_check_evidence')
@Index(['fitCheckId'])
export class FitCheckEvidence {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'fit_check_id', type: 'char', length: 36 })
  fitCheckId!: string;

  @Column({ type: 'enum', enum: EVIDENCE_KINDS })
  kind!: EvidenceKind;

  @Column({ name: 'measurement_id', type: 'char', length: 36, nullable: true })
  measurementId!: string | null;

  @Column({ name: 'mark_id', type: 'char', length: 36, nullable: true })
  markId!: string | null;

  @Column({ name: 'photo_key', type: 'varchar', length: 300, nullable: true })
  photoKey!: string | null;

  @Column({ type: 'varchar', length: 500, default: '' })
  note!: string;

  @Column({ name: 'added_by', type: 'char', length: 36, nullable: true })
  addedBy!: string | null;

  @CreatedAtColumn()
  createdAt!: Date;
}
