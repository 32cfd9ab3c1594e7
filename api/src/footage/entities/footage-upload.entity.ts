import { Column, Entity, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, UpdatedAtColumn } from '../../common/database/columns';

/** The multipart upload behind footage in state `uploading`; gone once the upload completes or is aborted. */
@Entity('footage_uploads')
export class FootageUpload {
  @PrimaryColumn({ name: 'footage_id', type: 'char', length: 36 })
  footageId!: string;

  /** The storage's multipart upload id. */
  @Column({ name: 'upload_id', type: 'varchar', length: 1024 })
  uploadId!: string;

  @Column({ name: 'part_size_bytes', type: 'int', unsigned: true })
  partSizeBytes!: number;

  @Column({ name: 'part_count', type: 'smallint', unsigned: true })
  partCount!: number;

  @CreatedAtColumn()
  createdAt!: Date;

  @UpdatedAtColumn()
  updatedAt!: Date;
}
