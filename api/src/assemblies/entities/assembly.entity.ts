import { Column, CreateDateColumn, Entity, Index, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { newId } from '../../common/database/columns';

/** A named combination of parts for a build, e.g. "27-tooth coupler with long shaft". */
@Entity('assemblies')
@Index(['workshopId', 'buildId'])
export class Assembly {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'workshop_id', type: 'char', length: 36 })
  workshopId!: string;

  @Column({ name: 'build_id', type: 'char', length: 36 })
  buildId!: string;

  @Column({ type: 'varchar', length: 200 })
  name!: string;

  @Column({ type: 'text' })
  notes!: string;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  createdAt!: Date;

  @UpdateDateColumn({
    name: 'updated_at',
    type: 'datetime',
    precision: 3,
    default: () => 'CURRENT_TIMESTAMP(3)',
    onUpdate: 'CURRENT_TIMESTAMP(3)',
  })
  updatedAt!: Date;
}
