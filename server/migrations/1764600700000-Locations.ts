import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * A chain of stores: each location keeps its own stock and bins, with a history of every change,
 * and stores ask each other for parts by transfer. Today's single stock row per part becomes the
 * first store's, and the store's staff get it as their home store.
 */
export class Locations1764600700000 implements MigrationInterface {
  name = 'Locations1764600700000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE location (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        name text NOT NULL UNIQUE,
        address text NOT NULL DEFAULT '',
        phone text NOT NULL DEFAULT '',
        opening_hours text NOT NULL DEFAULT '',
        created_at timestamptz NOT NULL DEFAULT clock_timestamp()
      )`);
    // A database that already holds stock or staff gets one store for them; a new one starts empty.
    await q.query(`
      INSERT INTO location (name)
      SELECT 'Main store' WHERE EXISTS (SELECT 1 FROM stock) OR EXISTS (SELECT 1 FROM "user" WHERE role <> 'technician')`);

    await q.query(`ALTER TABLE "user" ADD COLUMN home_location_id uuid REFERENCES location(id) ON DELETE RESTRICT`);
    await q.query(`UPDATE "user" SET home_location_id = (SELECT id FROM location LIMIT 1) WHERE role <> 'technician'`);

    await q.query(`ALTER TABLE stock ADD COLUMN location_id uuid REFERENCES location(id) ON DELETE CASCADE`);
    await q.query(`UPDATE stock SET location_id = (SELECT id FROM location LIMIT 1)`);
    await q.query(`ALTER TABLE stock ALTER COLUMN location_id SET NOT NULL`);
    await q.query(`ALTER TABLE stock DROP CONSTRAINT stock_pkey`);
    await q.query(`ALTER TABLE stock ADD PRIMARY KEY (location_id, part_id)`);
    await q.query(`CREATE INDEX stock_part_idx ON stock (part_id)`);

    await q.query(`
      CREATE TABLE transfer (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        part_id uuid NOT NULL REFERENCES part(id) ON DELETE RESTRICT,
        from_location_id uuid NOT NULL REFERENCES location(id) ON DELETE RESTRICT,
        to_location_id uuid NOT NULL REFERENCES location(id) ON DELETE RESTRICT,
        quantity integer NOT NULL CHECK (quantity > 0),
        state text NOT NULL DEFAULT 'requested' CHECK (state IN ('requested','picked','sent','received','refused','cancelled')),
        refusal_reason text,
        requested_by uuid NOT NULL REFERENCES "user"(id) ON DELETE RESTRICT,
        updated_by uuid REFERENCES "user"(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CHECK (from_location_id <> to_location_id),
        CHECK ((state = 'refused') = (refusal_reason IS NOT NULL))
      )`);
    await q.query(`CREATE INDEX transfer_from_idx ON transfer (from_location_id, created_at DESC)`);
    await q.query(`CREATE INDEX transfer_to_idx ON transfer (to_location_id, created_at DESC)`);

    await q.query(`
      CREATE TABLE stock_change (
        id bigserial PRIMARY KEY,
        location_id uuid NOT NULL REFERENCES location(id) ON DELETE CASCADE,
        part_id uuid NOT NULL REFERENCES part(id) ON DELETE CASCADE,
        delta integer NOT NULL,
        on_hand_after integer NOT NULL CHECK (on_hand_after >= 0),
        reason text NOT NULL,
        transfer_id uuid REFERENCES transfer(id) ON DELETE SET NULL,
        actor_id uuid REFERENCES "user"(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX stock_change_part_idx ON stock_change (part_id, location_id, created_at DESC)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE stock_change`);
    await q.query(`DROP TABLE transfer`);
    // Back to one row per part: the stores' counts add up, the first store's bin stays.
    await q.query(`
      CREATE TABLE stock_one AS
      SELECT DISTINCT ON (s.part_id) s.part_id,
             (SELECT sum(x.on_hand)::int FROM stock x WHERE x.part_id = s.part_id) AS on_hand, s.bin
        FROM stock s JOIN location l ON l.id = s.location_id ORDER BY s.part_id, l.created_at`);
    await q.query(`DELETE FROM stock`);
    await q.query(`DROP INDEX stock_part_idx`);
    await q.query(`ALTER TABLE stock DROP CONSTRAINT stock_pkey`);
    await q.query(`ALTER TABLE stock DROP COLUMN location_id`);
    await q.query(`ALTER TABLE stock ADD PRIMARY KEY (part_id)`);
    await q.query(`INSERT INTO stock (part_id, on_hand, bin) SELECT part_id, on_hand, bin FROM stock_one`);
    await q.query(`DROP TABLE stock_one`);
    await q.query(`ALTER TABLE "user" DROP COLUMN home_location_id`);
    await q.query(`DROP TABLE location`);
  }
}
