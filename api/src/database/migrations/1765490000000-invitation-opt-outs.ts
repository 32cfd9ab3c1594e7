import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * "Stop invitations to this address": each invitation mail carries a link with a token of its own (kept as
 * its SHA-256, tied to the address, not to the invitation, so it outlives a replaced or revoked invitation),
 * and an address that used it is listed until it allows invitations again.
 */
export class InvitationOptOuts1765490000000 implements MigrationInterface {
  name = 'InvitationOptOuts1765490000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE invitation_opt_outs (
      id CHAR(36) NOT NULL,
      email VARCHAR(254) NOT NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      UNIQUE KEY uq_invitation_opt_outs_email (email)
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await queryRunner.query(`CREATE TABLE invitation_opt_out_links (
      id CHAR(36) NOT NULL,
      email VARCHAR(254) NOT NULL,
      token_hash CHAR(64) NOT NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      UNIQUE KEY uq_invitation_opt_out_links_token (token_hash),
      KEY idx_invitation_opt_out_links_email (email)
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE invitation_opt_out_links');
    await queryRunner.query('DROP TABLE invitation_opt_outs');
  }
}
