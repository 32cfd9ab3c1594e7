import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId } from '../../common/database/columns';

/** An address that asked for no more workshop invitations; inviting it is refused until it allows them again. */
@Entity('invitation_opt_outs')
export class InvitationOptOut {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  /** Normalised as invitations store it. */
  @Index({ unique: true })
  @Column({ type: 'varchar', length: 254 })
  email!: string;

  /** When the address stopped invitations. */
  @CreatedAtColumn()
  createdAt!: Date;
}

/**
 * The "stop invitations to this address" link in one invitation mail: a token of its own per mail (kept
 * as its SHA-256), so the link keeps working after that invitation is replaced, accepted or revoked.
 */
@Entity('invitation_opt_out_links')
export class InvitationOptOutLink {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ type: 'varchar', length: 254 })
  email!: string;

  @Column({ name: 'token_hash', type: 'char', length: 64, unique: true })
  tokenHash!: string;

  @CreatedAtColumn()
  createdAt!: Date;
}
