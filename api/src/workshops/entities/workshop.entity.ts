import { Column, Entity, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId, UpdatedAtColumn } from '../../common/database/columns';

/** A creator's publication: its builds, guides and members hang off it. */
@Entity('workshops')
export class Workshop {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  /** The workshop's name in URLs: lower-case letters, digits and single hyphens. */
  @Column({ type: 'varchar', length: 60, unique: true })
  slug!: string;

  @Column({ type: 'varchar', length: 120 })
  name!: string;

  @Column({ type: 'varchar', length: 500, default: '' })
  description!: string;

  /** Object key of the logo image in storage. */
  @Column({ name: 'logo_key', type: 'varchar', length: 255, nullable: true })
  logoKey!: string | null;

  /** Whether members' names may appear on public pages (who confirmed a fit); off unless the workshop turns it on. */
  @Column({ name: 'show_member_names', type: 'boolean', default: false })
  showMemberNames!: boolean;

  /** Set by a site admin; members can still read, nobody can change anything. */
  @Column({ name: 'disabled_at', type: 'datetime', precision: 3, nullable: true })
  disabledAt!: Date | null;

  @CreatedAtColumn()
  createdAt!: Date;

  @UpdatedAtColumn()
  updatedAt!: Date;
}
