import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId, UpdatedAtColumn } from '../../common/database/columns';

export const BUILD_STATUSES = ['planning', 'in_progress', 'verified', 'archived'] as const;
export type BuildStatus = (typeof BUILD_STATUSES)[number];

/** A workshop's project: the home of its footage, parts, assemblies and guides. */
@Entity('builds')
@Index(['workshopId', 'createdAt'])
export class Build {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'workshop_id', type: 'char', length: 36 })
  workshopId!: string;

  @Column({ type: 'varchar', length: 200 })
  title!: string;

  /** The vehicle or machine being built. */
  @Column({ type: 'varchar', length: 200, default: '' })
  vehicle!: string;

  @Column({ type: 'text' })
  goal!: string;

  @Column({ type: 'enum', enum: BUILD_STATUSES, default: 'planning' })
  status!: BuildStatus;

  @Column({ name: 'created_by', type: 'char', length: 36, nullable: true })
  createdBy!: string | null;

  @CreatedAtColumn()
  createdAt!: Date;

  @UpdatedAtColumn()
  updatedAt!: Date;
}
