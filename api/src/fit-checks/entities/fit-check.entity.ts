import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId, UpdatedAtColumn } from '../../common/database/columns';
import type { CheckOutcome, FitCheckState } from '../../engine/checklist';

export const CHECK_KINDS = ['spline_match', 'fit', 'length_window', 'manual'] as const;
export type CheckKind = (typeof CHECK_KINDS)[number];

/** One line of an assembly's verified-fit checklist. Derived checks belong to an interface; manual ones do not. */
@Entity('fit_checks')
@Index(['assemblyId'])
@Index(['interfaceId'], { unique: true })
export class FitCheck {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'workshop_id', type: 'char', length: 36 })
  workshopId!: string;

  @Column({ name: 'assembly_id', type: 'char', length: 36 })
  assemblyId!: string;

  @Column({ name: 'interface_id', type: 'char', length: 36, nullable: true })
  interfaceId!: string | null;

  @Column({ type: 'enum', enum: CHECK_KINDS })
  kind!: CheckKind;

  @Column({ type: 'varchar', length: 200 })
  title!: string;

  @Column({ type: 'boolean', default: true })
  required!: boolean;

  @Column({ type: 'enum', enum: ['open', 'bench_pass', 'confirmed', 'no_fit', 'retired'], default: 'open' })
  state!: FitCheckState;

  /** The engine's last verdict for a derived check, and its readable detail. */
  @Column({ type: 'enum', enum: ['pass', 'fail', 'unknown'], nullable: true })
  outcome!: CheckOutcome | null;

  @Column({ type: 'json', nullable: true })
  detail!: Record<string, unknown> | null;

  @Column({ type: 'varchar', length: 500, default: '' })
  reason!: string;

  @Column({ name: 'confirmed_by', type: 'char', length: 36, nullable: true })
  confirmedBy!: string | null;

  @Column({ name: 'confirmed_at', type: 'datetime', precision: 3, nullable: true })
  confirmedAt!: Date | null;

  @CreatedAtColumn()
  createdAt!: Date;

  @UpdatedAtColumn()
  updatedAt!: Date;
}
