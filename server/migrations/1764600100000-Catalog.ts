import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The catalog: brands and their heat tables, parts and specs, engines, vehicles, fitment, interchange, stock, suppliers, prices. */
export class Catalog1764600100000 implements MigrationInterface {
  name = 'Catalog1764600100000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE brand (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        name text NOT NULL,
        name_norm text NOT NULL UNIQUE,
        ours boolean NOT NULL DEFAULT false,
        heat_code_note text,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`
      CREATE TABLE brand_heat_code (
        brand_id uuid NOT NULL REFERENCES brand(id) ON DELETE CASCADE,
        code text NOT NULL,
        heat_step smallint NOT NULL CHECK (heat_step BETWEEN 1 AND 15),
        PRIMARY KEY (brand_id, code)
      )`);
    await q.query(`
      CREATE TABLE part (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        brand_id uuid NOT NULL REFERENCES brand(id) ON DELETE RESTRICT,
        part_number text NOT NULL,
        part_number_norm text NOT NULL,
        kind text NOT NULL CHECK (kind IN ('coil','plug')),
        description text NOT NULL DEFAULT '',
        gtin text,
        status text NOT NULL DEFAULT 'active' CHECK (status IN ('active','discontinued')),
        superseded_by_id uuid REFERENCES part(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT part_brand_number_uq UNIQUE (brand_id, part_number_norm),
        CONSTRAINT part_not_self_superseded CHECK (superseded_by_id IS NULL OR superseded_by_id <> id)
      )`);
    await q.query(`CREATE INDEX part_number_norm_idx ON part (part_number_norm)`);
    await q.query(`CREATE INDEX part_gtin_idx ON part (gtin) WHERE gtin IS NOT NULL`);
    await q.query(`CREATE INDEX part_superseded_by_idx ON part (superseded_by_id) WHERE superseded_by_id IS NOT NULL`);
    await q.query(`
      CREATE TABLE coil_spec (
        part_id uuid PRIMARY KEY REFERENCES part(id) ON DELETE CASCADE,
        architecture text NOT NULL CHECK (architecture IN ('coil-on-plug','pencil','coil-pack','canister')),
        driver text NOT NULL CHECK (driver IN ('integrated','external')),
        outputs smallint NOT NULL CHECK (outputs > 0),
        connector_pins smallint NOT NULL CHECK (connector_pins > 0),
        connector_key text NOT NULL,
        primary_ohm_min double precision NOT NULL CHECK (primary_ohm_min > 0),
        primary_ohm_max double precision NOT NULL CHECK (primary_ohm_max >= primary_ohm_min),
        primary_inductance_mh double precision NOT NULL CHECK (primary_inductance_mh > 0),
        secondary_kohm_min double precision,
        secondary_kohm_max double precision,
        turns_ratio double precision NOT NULL CHECK (turns_ratio > 0),
        available_kv double precision,
        peak_current_a double precision NOT NULL CHECK (peak_current_a > 0),
        CHECK ((secondary_kohm_min IS NULL) = (secondary_kohm_max IS NULL)),
        CHECK (secondary_kohm_max IS NULL OR secondary_kohm_max >= secondary_kohm_min)
      )`);
    await q.query(`
      CREATE TABLE plug_spec (
        part_id uuid PRIMARY KEY REFERENCES part(id) ON DELETE CASCADE,
        thread_mm double precision NOT NULL,
        thread_pitch_mm double precision NOT NULL,
        reach_mm double precision NOT NULL,
        seat text NOT NULL CHECK (seat IN ('flat','taper')),
        hex_mm double precision NOT NULL,
        heat_code text NOT NULL,
        gap_mm double precision NOT NULL,
        regappable boolean NOT NULL,
        resistor boolean NOT NULL,
        resistor_kohm double precision,
        projected_tip boolean NOT NULL,
        electrode text NOT NULL
      )`);
    await q.query(`
      CREATE TABLE engine (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        code text NOT NULL UNIQUE,
        description text NOT NULL DEFAULT '',
        displacement_l double precision NOT NULL,
        cylinders smallint NOT NULL,
        compression_ratio double precision NOT NULL,
        aspiration text NOT NULL CHECK (aspiration IN ('natural','turbo','supercharged')),
        peak_boost_kpa double precision NOT NULL DEFAULT 0,
        rod_ratio double precision NOT NULL DEFAULT 3.5,
        spec_gap_mm double precision NOT NULL,
        dwell_ms double precision NOT NULL,
        cranking_dwell_ms double precision NOT NULL,
        driver_current_limit_a double precision,
        system_voltage double precision NOT NULL DEFAULT 12
      )`);
    await q.query(`
      CREATE TABLE vehicle (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        year smallint NOT NULL,
        make text NOT NULL,
        model text NOT NULL,
        trim text NOT NULL DEFAULT '',
        engine_id uuid NOT NULL REFERENCES engine(id) ON DELETE RESTRICT,
        CONSTRAINT vehicle_uq UNIQUE (year, make, model, trim, engine_id)
      )`);
    await q.query(`CREATE INDEX vehicle_lookup_idx ON vehicle (year, make, model)`);
    await q.query(`
      CREATE TABLE fitment (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        part_id uuid NOT NULL REFERENCES part(id) ON DELETE CASCADE,
        engine_id uuid NOT NULL REFERENCES engine(id) ON DELETE CASCADE,
        position text NOT NULL,
        quantity smallint NOT NULL CHECK (quantity > 0),
        CONSTRAINT fitment_uq UNIQUE (engine_id, position, part_id)
      )`);
    await q.query(`CREATE INDEX fitment_part_idx ON fitment (part_id)`);
    await q.query(`
      CREATE TABLE interchange (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        foreign_brand text NOT NULL,
        foreign_number text NOT NULL,
        foreign_number_norm text NOT NULL,
        part_id uuid NOT NULL REFERENCES part(id) ON DELETE CASCADE,
        source text NOT NULL DEFAULT 'manual',
        confidence real NOT NULL DEFAULT 1 CHECK (confidence BETWEEN 0 AND 1),
        created_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT interchange_uq UNIQUE (foreign_number_norm, foreign_brand, part_id)
      )`);
    await q.query(`CREATE INDEX interchange_part_idx ON interchange (part_id)`);
    await q.query(`
      CREATE TABLE stock (
        part_id uuid PRIMARY KEY REFERENCES part(id) ON DELETE CASCADE,
        on_hand integer NOT NULL DEFAULT 0 CHECK (on_hand >= 0),
        bin text NOT NULL DEFAULT ''
      )`);
    await q.query(`
      CREATE TABLE supplier (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        key text NOT NULL UNIQUE,
        name text NOT NULL UNIQUE,
        contact_email text,
        phone text,
        mapping jsonb,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`
      CREATE TABLE supplier_price (
        supplier_id uuid NOT NULL REFERENCES supplier(id) ON DELETE CASCADE,
        part_id uuid NOT NULL REFERENCES part(id) ON DELETE CASCADE,
        cost_cents integer NOT NULL CHECK (cost_cents >= 0),
        list_cents integer NOT NULL CHECK (list_cents >= 0),
        core_cents integer NOT NULL DEFAULT 0 CHECK (core_cents >= 0),
        pack_qty integer NOT NULL DEFAULT 1 CHECK (pack_qty > 0),
        effective_date date NOT NULL DEFAULT current_date,
        price_list_id uuid,
        updated_at timestamptz NOT NULL DEFAULT now(),
        PRIMARY KEY (supplier_id, part_id)
      )`);
    await q.query(`CREATE INDEX supplier_price_part_idx ON supplier_price (part_id)`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const t of [
      'supplier_price',
      'supplier',
      'stock',
      'interchange',
      'fitment',
      'vehicle',
      'engine',
      'plug_spec',
      'coil_spec',
      'part',
      'brand_heat_code',
      'brand',
    ]) {
      await q.query(`DROP TABLE ${t}`);
    }
  }
}
