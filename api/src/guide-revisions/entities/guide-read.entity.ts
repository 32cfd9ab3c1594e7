import { Column, Entity, PrimaryColumn } from 'typeorm';

/** The published revision of a guide a signed-in reader last opened (the reader's own record; never public). */
@Entity('guide_reads')
export class GuideRead {
  @PrimaryColumn({ name: 'user_id', type: 'char', length: 36 })
  userId!: string;

  @PrimaryColumn({ name: 'guide_id', type: 'char', length: 36 })
  guideId!: string;

  @Column({ name: 'revision_number', type: 'int', unsigned: true })
  revisionNumber!: number;

  @Column({ name: 'read_at', type: 'datetime', precision: 3 })
  readAt!: Date;
}
