import type { MigrationInterface, QueryRunner } from 'typeorm';

export class Foundation1764600000000 implements MigrationInterface {
  name = 'Foundation1764600000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE EXTENSION IF NOT EXISTS pgcrypto`);
    await q.query(`
      CREATE TABLE shop (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        name text NOT NULL UNIQUE,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`
      CREATE TABLE "user" (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        email text NOT NULL UNIQUE,
        name text NOT NULL,
        role text NOT NULL CHECK (role IN ('clerk','technician','buyer','admin')),
        password_hash text,
        disabled boolean NOT NULL DEFAULT false,
        shop_id uuid REFERENCES shop(id) ON DELETE RESTRICT,
        created_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT technician_has_shop CHECK (role <> 'technician' OR shop_id IS NOT NULL)
      )`);
    await q.query(`
      CREATE TABLE invitation (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        user_id uuid NOT NULL REFERENCES "user"(id) ON DELETE CASCADE,
        token_hash text NOT NULL UNIQUE,
        expires_at timestamptz NOT NULL,
        used_at timestamptz,
        invited_by uuid REFERENCES "user"(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`
      CREATE TABLE audit_log (
        id bigserial PRIMARY KEY,
        actor_id uuid REFERENCES "user"(id) ON DELETE SET NULL,
        action text NOT NULL,
        entity_type text NOT NULL,
        entity_id text,
        data jsonb NOT NULL DEFAULT '{}'::jsonb,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX audit_log_entity_idx ON audit_log (entity_type, entity_id)`);
    await q.query(`
      CREATE TABLE setting (
        key text PRIMARY KEY,
        value jsonb NOT NULL,
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    // The session store's table, in connect-pg-simple's layout.
    await q.query(`
      CREATE TABLE session (
        sid varchar NOT NULL PRIMARY KEY,
        sess json NOT NULL,
        expire timestamp(6) NOT NULL
      )`);
    await q.query(`CREATE INDEX session_expire_idx ON session (expire)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE session`);
    await q.query(`DROP TABLE setting`);
    await q.query(`DROP TABLE audit_log`);
    await q.query(`DROP TABLE invitation`);
    await q.query(`DROP TABLE "user"`);
    await q.query(`DROP TABLE shop`);
  }
}
