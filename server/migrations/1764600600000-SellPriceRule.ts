import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The buyer's sell-price rule (a preferred supplier per brand; no row means the lowest list
 * price), archiving of suppliers and fit reports, and what a fit report carries besides the
 * comparison: the vehicle as picked and the parts' prices on the day it was saved.
 */
export class SellPriceRule1764600600000 implements MigrationInterface {
  name = 'SellPriceRule1764600600000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE sell_price_rule (
        brand_id uuid PRIMARY KEY REFERENCES brand(id) ON DELETE CASCADE,
        supplier_id uuid NOT NULL REFERENCES supplier(id) ON DELETE CASCADE,
        updated_by uuid REFERENCES "user"(id) ON DELETE SET NULL,
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`ALTER TABLE supplier ADD COLUMN archived_at timestamptz`);
    await q.query(`ALTER TABLE fit_report ADD COLUMN archived_at timestamptz`);
    await q.query(`ALTER TABLE fit_report ADD COLUMN vehicle jsonb`);
    await q.query(`ALTER TABLE fit_report ADD COLUMN prices jsonb NOT NULL DEFAULT '[]'`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE fit_report DROP COLUMN prices, DROP COLUMN vehicle, DROP COLUMN archived_at`);
    await q.query(`ALTER TABLE supplier DROP COLUMN archived_at`);
    await q.query(`DROP TABLE sell_price_rule`);
  }
}
