import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Accounts and workshops: users, their sessions and e-mailed tokens, workshops, members and invitations.
 * Secrets (session tokens, e-mailed tokens) are stored only as SHA-256 hex digests.
 */
export class Accounts1764600000000 implements MigrationInterface {
  name = 'Accounts1764600000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    const timestamps = `
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)`;
    const table = 'ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci';

    await queryRunner.query(`CREATE TABLE users (
      id CHAR(36) NOT NULL PRIMARY KEY,
      email VARCHAR(254) NOT NULL,
      password_hash VARCHAR(255) NOT NULL,
      display_name VARCHAR(80) NOT NULL,
      preferred_units ENUM('metric','inch') NOT NULL DEFAULT 'metric',
      email_verified_at DATETIME(3) NULL,
      is_admin TINYINT(1) NOT NULL DEFAULT 0,
      disabled_at DATETIME(3) NULL,
      ${timestamps},
      UNIQUE KEY uq_users_email (email)
    ) ${table}`);

    await queryRunner.query(`CREATE TABLE sessions (
      id CHAR(36) NOT NULL PRIMARY KEY,
      user_id CHAR(36) NOT NULL,
      token_hash CHAR(64) NOT NULL,
      expires_at DATETIME(3) NOT NULL,
      last_seen_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      user_agent VARCHAR(255) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_sessions_token (token_hash),
      KEY idx_sessions_user (user_id),
      KEY idx_sessions_expiry (expires_at),
      CONSTRAINT fk_sessions_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE
    ) ${table}`);

    await queryRunner.query(`CREATE TABLE email_tokens (
      id CHAR(36) NOT NULL PRIMARY KEY,
      user_id CHAR(36) NOT NULL,
      purpose ENUM('verify-email','reset-password','change-email') NOT NULL,
      token_hash CHAR(64) NOT NULL,
      new_email VARCHAR(254) NULL,
      expires_at DATETIME(3) NOT NULL,
      used_at DATETIME(3) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_email_tokens_token (token_hash),
      KEY idx_email_tokens_user (user_id, purpose),
      CONSTRAINT fk_email_tokens_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE
    ) ${table}`);

    await queryRunner.query(`CREATE TABLE workshops (
      id CHAR(36) NOT NULL PRIMARY KEY,
      slug VARCHAR(60) NOT NULL,
      name VARCHAR(120) NOT NULL,
      description VARCHAR(500) NOT NULL DEFAULT '',
      logo_key VARCHAR(255) NULL,
      disabled_at DATETIME(3) NULL,
      ${timestamps},
      UNIQUE KEY uq_workshops_slug (slug)
    ) ${table}`);

    await queryRunner.query(`CREATE TABLE workshop_members (
      id CHAR(36) NOT NULL PRIMARY KEY,
      workshop_id CHAR(36) NOT NULL,
      user_id CHAR(36) NOT NULL,
      role ENUM('owner','editor') NOT NULL,
      ${timestamps},
      UNIQUE KEY uq_workshop_members (workshop_id, user_id),
      KEY idx_workshop_members_user (user_id),
      CONSTRAINT fk_workshop_members_workshop FOREIGN KEY (workshop_id) REFERENCES workshops (id) ON DELETE CASCADE,
      CONSTRAINT fk_workshop_members_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE
    ) ${table}`);

    await queryRunner.query(`CREATE TABLE invitations (
      id CHAR(36) NOT NULL PRIMARY KEY,
      workshop_id CHAR(36) NOT NULL,
      email VARCHAR(254) NOT NULL,
      role ENUM('owner','editor') NOT NULL,
      token_hash CHAR(64) NOT NULL,
      expires_at DATETIME(3) NOT NULL,
      accepted_at DATETIME(3) NULL,
      accepted_by CHAR(36) NULL,
      invited_by CHAR(36) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_invitations_token (token_hash),
      KEY idx_invitations_workshop (workshop_id, email),
      CONSTRAINT fk_invitations_workshop FOREIGN KEY (workshop_id) REFERENCES workshops (id) ON DELETE CASCADE,
      CONSTRAINT fk_invitations_inviter FOREIGN KEY (invited_by) REFERENCES users (id) ON DELETE SET NULL,
      CONSTRAINT fk_invitations_acceptor FOREIGN KEY (accepted_by) REFERENCES users (id) ON DELETE SET NULL
    ) ${table}`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const name of ['invitations', 'workshop_members', 'workshops', 'email_tokens', 'sessions', 'users']) {
      await queryRunner.query(`DROP TABLE ${name}`);
    }
  }
}
