import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Keys for the store's other systems: only the SHA-256 of each key is kept, and a prefix to recognise it by. */
export class ApiKeys1764600510000 implements MigrationInterface {
  name = 'ApiKeys1764600510000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE api_key (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        name text NOT NULL,
        scope text NOT NULL CHECK (scope IN ('read','write')),
        key_hash text NOT NULL UNIQUE,
        prefix text NOT NULL,
        created_by uuid NOT NULL REFERENCES "user"(id) ON DELETE RESTRICT,
        created_at timestamptz NOT NULL DEFAULT now(),
        last_used_at timestamptz,
        revoked_at timestamptz
      )`);
    // The audit log names a key's calls by its name: two live keys may not share one.
    await q.query(`CREATE UNIQUE INDEX api_key_live_name_idx ON api_key (lower(name)) WHERE revoked_at IS NULL`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE api_key`);
  }
}
