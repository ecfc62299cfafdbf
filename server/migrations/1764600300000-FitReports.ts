import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Saved comparisons: the inputs, the server's own result, and an unguessable share token. */
export class FitReports1764600300000 implements MigrationInterface {
  name = 'FitReports1764600300000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE fit_report (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        kind text NOT NULL CHECK (kind IN ('coil','plug')),
        title text NOT NULL,
        notes text NOT NULL DEFAULT '',
        inputs jsonb NOT NULL,
        result jsonb NOT NULL,
        verdict text NOT NULL CHECK (verdict IN ('go','review','no-go')),
        -- 192 random bits: the link itself is the permission to read, so it is kept to show again.
        share_token text NOT NULL UNIQUE,
        created_by uuid NOT NULL REFERENCES "user"(id) ON DELETE RESTRICT,
        shop_id uuid REFERENCES shop(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX fit_report_shop_idx ON fit_report (shop_id, created_at DESC)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE fit_report`);
  }
}
