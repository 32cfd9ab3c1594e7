import { Column, Entity, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId, UpdatedAtColumn } from '../../common/database/columns';
import { PREFERRED_UNITS, type PreferredUnits } from '../../common/types/access-context';

/** A person with an account. `email` is stored trimmed and lower-cased; the password only as an argon2id hash. */
@Entity('users')
export class User {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ type: 'varchar', length: 254, unique: true })
  email!: string;

  @Column({ name: 'password_hash', type: 'varchar', length: 255 })
  passwordHash!: string;

  @Column({ name: 'display_name', type: 'varchar', length: 80 })
  displayName!: string;

  @Column({ name: 'preferred_units', type: 'enum', enum: PREFERRED_UNITS, default: 'metric' })
  preferredUnits!: PreferredUnits;

  @Column({ name: 'email_verified_at', type: 'datetime', precision: 3, nullable: true })
  emailVerifiedAt!: Date | null;

  /** TINYINT(1) in MariaDB; TypeORM reads it as a boolean. */
  @Column({ name: 'is_admin', type: 'boolean', default: false })
  isAdmin!: boolean;

  @Column({ name: 'disabled_at', type: 'datetime', precision: 3, nullable: true })
  disabledAt!: Date | null;

  @CreatedAtColumn()
  createdAt!: Date;

  @UpdatedAtColumn()
  updatedAt!: Date;
}
