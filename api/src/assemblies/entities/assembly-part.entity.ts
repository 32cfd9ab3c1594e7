import { Column, Entity, PrimaryColumn } from 'typeorm';

/** A part's place in an assembly, e.g. "input side", "shaft", "output side". */
@Entity('assembly_parts')
export class AssemblyPart {
  @PrimaryColumn({ name: 'assembly_id', type: 'char', length: 36 })
  assemblyId!: string;

  @PrimaryColumn({ name: 'part_id', type: 'char', length: 36 })
  partId!: string;

  @Column({ type: 'varchar', length: 80 })
  position!: string;

  @Column({ name: 'sort_order', type: 'int', default: 0 })
  sortOrder!: number;
}
