import { Column, Entity, PrimaryColumn } from 'typeorm';
import { UpdatedAtColumn } from '../../common/database/columns';

/** A workshop's media choices; no row means the defaults (keep originals). */
@Entity('workshop_media_settings')
export class WorkshopMediaSettings {
  @PrimaryColumn({ name: 'workshop_id', type: 'char', length: 36 })
  workshopId!: string;

  /** Keep the uploaded original after web renditions are made (default), or delete it to save storage. */
  @Column({ name: 'keep_originals', type: 'boolean', default: true })
  keepOriginals!: boolean;

  @UpdatedAtColumn()
  updatedAt!: Date;
}
