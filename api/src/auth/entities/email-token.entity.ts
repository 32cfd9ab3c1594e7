import { Column, Entity, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId } from '../../common/database/columns';

export const EMAIL_TOKEN_PURPOSES = ['verify-email', 'reset-password', 'change-email'] as const;
export type EmailTokenPurpose = (typeof EMAIL_TOKEN_PURPOSES)[number];

/** A single-use, expiring secret sent by e-mail. Only its SHA-256 is stored. */
@Entity('email_tokens')
export class EmailToken {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'user_id', type: 'char', length: 36 })
  userId!: string;

  @Column({ type: 'enum', enum: EMAIL_TOKEN_PURPOSES })
  purpose!: EmailTokenPurpose;

  @Column({ name: 'token_hash', type: 'char', length: 64, unique: true })
  tokenHash!: string;

  /** For `change-email`: the address the link was sent to. */
  @Column({ name: 'new_email', type: 'varchar', length: 254, nullable: true })
  newEmail!: string | null;

  @Column({ name: 'expires_at', type: 'datetime', precision: 3 })
  expiresAt!: Date;

  @Column({ name: 'used_at', type: 'datetime', precision: 3, nullable: true })
  usedAt!: Date | null;

  @CreatedAtColumn()
  createdAt!: Date;
}
