import { Column, Entity, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn } from '../../common/database/columns';

/** A part the browser finished uploading: its number and the ETag storage answered with. */
@Entity('footage_upload_parts')
export class FootageUploadPart {
  @PrimaryColumn({ name: 'footage_id', type: 'char', length: 36 })
  footageId!: string;

  @PrimaryColumn({ name: 'part_number', type: 'smallint', unsigned: true })
  partNumber!: number;

  @Column({ type: 'varchar', length: 200 })
  etag!: string;

  @CreatedAtColumn()
  createdAt!: Date;
}
