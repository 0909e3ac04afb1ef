import type { MigrationInterface, QueryRunner } from 'typeorm';

export class Foundation1764633600000 implements MigrationInterface {
  name = 'Foundation1764633600000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE EXTENSION IF NOT EXISTS pgcrypto`);
    await q.query(`CREATE TABLE users (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      email text NOT NULL UNIQUE,
      name text NOT NULL,
      role text NOT NULL CHECK (role IN ('admin','process-engineer','internals-specialist','inspector','viewer')),
      password_hash text NOT NULL,
      active boolean NOT NULL DEFAULT true,
      unit_system text NOT NULL DEFAULT 'SI' CHECK (unit_system IN ('SI','US')),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      version integer NOT NULL DEFAULT 1)`);
    await q.query(`CREATE TABLE sites (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      name text NOT NULL UNIQUE,
      location text NOT NULL DEFAULT '',
      created_at timestamptz NOT NULL DEFAULT now(),
      version integer NOT NULL DEFAULT 1)`);
    await q.query(`CREATE TABLE site_members (
      site_id uuid NOT NULL REFERENCES sites(id) ON DELETE CASCADE,
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      granted_at timestamptz NOT NULL DEFAULT now(),
      PRIMARY KEY (site_id, user_id))`);
    await q.query(`CREATE TABLE process_units (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      site_id uuid NOT NULL REFERENCES sites(id) ON DELETE RESTRICT,
      name text NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      version integer NOT NULL DEFAULT 1,
      UNIQUE (site_id, name))`);
    await q.query(`CREATE TABLE columns (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      unit_id uuid NOT NULL REFERENCES process_units(id) ON DELETE RESTRICT,
      tag text NOT NULL,
      service text NOT NULL DEFAULT '',
      numbering text NOT NULL DEFAULT 'top-down' CHECK (numbering IN ('top-down','bottom-up')),
      tray_count integer NOT NULL CHECK (tray_count > 0),
      engineer_id uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      version integer NOT NULL DEFAULT 1,
      UNIQUE (unit_id, tag))`);
    await q.query(`CREATE TABLE audit_log (
      id bigserial PRIMARY KEY,
      at timestamptz NOT NULL DEFAULT now(),
      user_id uuid REFERENCES users(id) ON DELETE SET NULL,
      action text NOT NULL,
      entity text NOT NULL,
      entity_id text NOT NULL,
      changes jsonb)`);
    await q.query(`CREATE INDEX audit_log_entity ON audit_log (entity, entity_id)`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const t of ['audit_log', 'columns', 'process_units', 'site_members', 'sites', 'users'])
      await q.query(`DROP TABLE IF EXISTS ${t}`);
  }
}
