import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, nanometresTransformer, newId, UpdatedAtColumn } from '../../common/database/columns';

export const INTERFACE_KINDS = ['spline', 'bore_shaft', 'length_window'] as const;
export type InterfaceKind = (typeof INTERFACE_KINDS)[number];

/**
 * Where two parts mate. spline: an internal and an external spline feature; bore_shaft: a hole and a
 * shaft diameter feature; length_window: one length feature against the installed window below.
 */
@Entity('assembly_interfaces')
@Index(['assemblyId'])
export class AssemblyInterface {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'assembly_id', type: 'char', length: 36 })
  assemblyId!: string;

  @Column({ type: 'enum', enum: INTERFACE_KINDS })
  kind!: InterfaceKind;

  @Column({ type: 'varchar', length: 160 })
  name!: string;

  @Column({ name: 'feature_a_id', type: 'char', length: 36 })
  featureAId!: string;

  @Column({ name: 'feature_b_id', type: 'char', length: 36, nullable: true })
  featureBId!: string | null;

  /** length_window only: the installed length at its extremes (e.g. full droop and full bump). */
  @Column({ name: 'installed_min_nm', type: 'bigint', nullable: true, transformer: nanometresTransformer })
  installedMinNm!: number | null;

  @Column({ name: 'installed_max_nm', type: 'bigint', nullable: true, transformer: nanometresTransformer })
  installedMaxNm!: number | null;

  /** The creator's rule: travel that must remain each way (length window) or minimum clearance (bore/shaft). */
  @Column({ name: 'margin_nm', type: 'bigint', nullable: true, transformer: nanometresTransformer })
  marginNm!: number | null;

  @CreatedAtColumn()
  createdAt!: Date;

  @UpdatedAtColumn()
  updatedAt!: Date;
}
