import { Column, Entity, Index, OneToMany, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId, UpdatedAtColumn } from '../../common/database/columns';
import { PART_CATEGORIES, PART_SOURCES, type PartCategory, type PartSource } from '../part-vocabulary';
import { PartFeature } from './part-feature.entity';

@Entity('parts')
@Index(['workshopId', 'partNumberKey'], { unique: true })
export class Part {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'workshop_id', type: 'char', length: 36 })
  workshopId!: string;

  /** As the maker prints it, e.g. "HL-2107". */
  @Column({ name: 'part_number', type: 'varchar', length: 80 })
  partNumber!: string;

  /** Upper-case letters and digits only, so "hl 2107" finds "HL-2107" and duplicates are caught. */
  @Column({ name: 'part_number_key', type: 'varchar', length: 80 })
  partNumberKey!: string;

  @Column({ type: 'varchar', length: 120, default: '' })
  maker!: string;

  @Column({ type: 'varchar', length: 200 })
  title!: string;

  @Column({ type: 'enum', enum: PART_CATEGORIES })
  category!: PartCategory;

  @Column({ type: 'enum', enum: PART_SOURCES, default: 'new' })
  source!: PartSource;

  @Column({ type: 'text' })
  notes!: string;

  /** Object keys of photos in storage. */
  @Column({ name: 'photo_keys', type: 'json' })
  photoKeys!: string[];

  @OneToMany(() => PartFeature, (feature) => feature.part, { cascade: false })
  features?: PartFeature[];

  @CreatedAtColumn()
  createdAt!: Date;

  @UpdatedAtColumn()
  updatedAt!: Date;
}

export { partNumberKey } from '../part-number-key';
