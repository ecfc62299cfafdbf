import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Supplier price-list intake: the upload and its history (price_list), the file's valid rows
 * staged for the preview and kept as the record of what a commit changed (price_list_row), the
 * rejected lines (price_list_row_error) and the uploaded bytes, kept until the list is
 * committed or discarded so a new mapping can re-read them (price_list_file_chunk).
 */
export class PriceLists1764600200000 implements MigrationInterface {
  name = 'PriceLists1764600200000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE price_list (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        supplier_id uuid NOT NULL REFERENCES supplier(id) ON DELETE CASCADE,
        file_name text NOT NULL,
        sha256 text NOT NULL CHECK (sha256 ~ '^[0-9a-f]{64}$'),
        size_bytes bigint NOT NULL CHECK (size_bytes >= 0),
        encoding text,
        delimiter text,
        columns jsonb NOT NULL DEFAULT '[]',
        mapping jsonb NOT NULL DEFAULT '{}',
        mapping_source text NOT NULL DEFAULT 'guessed' CHECK (mapping_source IN ('given','remembered','guessed')),
        status text NOT NULL DEFAULT 'processing' CHECK (status IN ('processing','staged','committed','discarded','failed')),
        stale boolean NOT NULL DEFAULT false,
        data_lines integer,
        counts jsonb,
        flagged integer NOT NULL DEFAULT 0,
        flag_threshold_pct double precision,
        progress jsonb NOT NULL DEFAULT '{}',
        applied jsonb,
        created_by uuid REFERENCES "user"(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        committed_by uuid REFERENCES "user"(id) ON DELETE SET NULL,
        committed_at timestamptz,
        discarded_by uuid REFERENCES "user"(id) ON DELETE SET NULL,
        discarded_at timestamptz
      )`);
    await q.query(`CREATE INDEX price_list_supplier_idx ON price_list (supplier_id, created_at DESC)`);
    // The same file committed twice for one supplier is refused by the service; this is the backstop.
    await q.query(`CREATE UNIQUE INDEX price_list_committed_file_uq ON price_list (supplier_id, sha256) WHERE status = 'committed'`);

    // No foreign key to price_list: its check would run once per COPY row and cost more than the
    // COPY itself. The service deletes a list's rows with the list. Pages half full, so the diff's
    // update of every row stays on its page (a HOT update, no index entry written again).
    await q.query(`
      CREATE TABLE price_list_row (
        price_list_id uuid NOT NULL,
        line integer NOT NULL,
        brand text NOT NULL,
        brand_norm text NOT NULL,
        brand_id uuid,
        part_number text NOT NULL,
        part_number_norm text NOT NULL,
        description text,
        cost_cents integer NOT NULL,
        list_cents integer NOT NULL,
        core_cents integer,
        pack_qty integer,
        gtin text,
        supersedes text,
        supersedes_norm text,
        kind text CHECK (kind IN ('coil','plug')),
        coil jsonb,
        plug jsonb,
        retracted boolean NOT NULL DEFAULT false,
        change text CHECK (change IN ('new','changed','unchanged','rejected')),
        reject_field text,
        reject_message text,
        part_id uuid,
        part_kind text,
        old_cost_cents integer,
        old_list_cents integer,
        old_core_cents integer,
        old_pack_qty integer,
        cost_change_pct double precision,
        list_change_pct double precision,
        flagged boolean NOT NULL DEFAULT false,
        supersedes_part_id uuid,
        supersession text CHECK (supersession IN ('link','already','not-found','kind-mismatch','conflict','loop')),
        PRIMARY KEY (price_list_id, line)
      ) WITH (fillfactor = 50)`);

    await q.query(`
      CREATE TABLE price_list_row_error (
        id bigserial PRIMARY KEY,
        price_list_id uuid NOT NULL REFERENCES price_list(id) ON DELETE CASCADE,
        line integer NOT NULL,
        "column" text,
        field text,
        message text NOT NULL,
        raw jsonb,
        source text NOT NULL DEFAULT 'file' CHECK (source IN ('file','catalog'))
      )`);
    await q.query(`CREATE INDEX price_list_row_error_list_idx ON price_list_row_error (price_list_id, line, id)`);

    await q.query(`
      CREATE TABLE price_list_file_chunk (
        price_list_id uuid NOT NULL REFERENCES price_list(id) ON DELETE CASCADE,
        seq integer NOT NULL,
        data bytea NOT NULL,
        PRIMARY KEY (price_list_id, seq)
      )`);
    // Stored as is: compressing megabytes of CSV on every upload costs more than the disk it saves.
    await q.query(`ALTER TABLE price_list_file_chunk ALTER COLUMN data SET STORAGE EXTERNAL`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const t of ['price_list_file_chunk', 'price_list_row_error', 'price_list_row', 'price_list']) {
      await q.query(`DROP TABLE ${t}`);
    }
  }
}
