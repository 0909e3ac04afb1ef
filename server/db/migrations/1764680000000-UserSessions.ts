import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Sessions that can end: one row per sign-in (its id is the token's jti), with an absolute expiry and a
 * revocation time (sign-out, password change or reset, deactivation). Users may be asked to change a
 * temporary password set by an administrator at their next sign-in.
 */
export class UserSessions1764680000000 implements MigrationInterface {
  name = 'UserSessions1764680000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE user_sessions (
      id uuid PRIMARY KEY,
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      created_at timestamptz NOT NULL DEFAULT now(),
      expires_at timestamptz NOT NULL,
      revoked_at timestamptz)`);
    await q.query(`CREATE INDEX user_sessions_user ON user_sessions (user_id)`);
    await q.query(`ALTER TABLE users ADD COLUMN must_change_password boolean NOT NULL DEFAULT false`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE users DROP COLUMN IF EXISTS must_change_password`);
    await q.query(`DROP TABLE IF EXISTS user_sessions`);
  }
}
