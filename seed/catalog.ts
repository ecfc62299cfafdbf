import type { EntityManager } from 'typeorm';
import { z } from 'zod';
import { normalizePartNumber } from '../shared/part-number';
import { queryCount, queryIds, queryRows } from '../server/db/executor';
import { writeCoilSpec, writePlugSpec } from '../server/repositories/specs.repository';
import { brands, engines, fitments, interchange, parts, stock, supersessions, supplierPrices, suppliers, vehicles } from './data';

export interface CatalogCounts {
  parts: number;
  engines: number;
  vehicles: number;
  interchange: number;
}

const brandNorm = (name: string) => name.trim().toLowerCase();
const keyedRow = z.object({ id: z.string(), key: z.string() });

/**
 * Loads the invented demo catalog. Every insert is ON CONFLICT DO NOTHING, so a second run changes
 * nothing and a buyer's later edits (prices, specs) are never overwritten by the demo data.
 */
export async function seedCatalog(m: EntityManager): Promise<CatalogCounts> {
  const count = (table: string): Promise<number> => queryCount(m, `SELECT count(*)::int AS n FROM ${table}`);
  /** Ids by a natural key: the query answers `id` and `key`. */
  const idsBy = async (sql: string): Promise<Map<string, string>> => new Map((await queryRows(m, keyedRow, sql)).map((r) => [r.key, r.id]));
  const before = {
    parts: await count('part'),
    engines: await count('engine'),
    vehicles: await count('vehicle'),
    interchange: await count('interchange'),
  };

  for (const b of brands) {
    await m.query(`INSERT INTO brand (name, name_norm, ours, heat_code_note) VALUES ($1, $2, $3, $4) ON CONFLICT (name_norm) DO NOTHING`, [
      b.name,
      brandNorm(b.name),
      b.ours,
      b.heatCodeNote,
    ]);
    for (const h of b.heatCodes) {
      await m.query(
        `INSERT INTO brand_heat_code (brand_id, code, heat_step) SELECT id, $2, $3 FROM brand WHERE name_norm = $1 ON CONFLICT DO NOTHING`,
        [brandNorm(b.name), h.code, h.heatStep],
      );
    }
  }
  const brandIds = await idsBy(`SELECT id, name_norm AS key FROM brand`);

  for (const e of engines) {
    await m.query(
      `INSERT INTO engine (code, description, displacement_l, cylinders, compression_ratio, aspiration, peak_boost_kpa, rod_ratio,
         spec_gap_mm, dwell_ms, cranking_dwell_ms, driver_current_limit_a, system_voltage)
       VALUES ($1,$2,$3,$4,$5,$6,$7,$8,$9,$10,$11,$12,$13) ON CONFLICT (code) DO NOTHING`,
      [
        e.code,
        e.description,
        e.displacementL,
        e.cylinders,
        e.compressionRatio,
        e.aspiration,
        e.peakBoostKpa ?? 0,
        e.rodRatio ?? 3.5,
        e.specGapMm,
        e.dwellMs,
        e.crankingDwellMs,
        e.driverCurrentLimitA ?? null,
        e.systemVoltage,
      ],
    );
  }
  const engineIds = await idsBy(`SELECT id, code AS key FROM engine`);

  for (const p of parts) {
    const brandId = brandIds.get(brandNorm(p.brand));
    if (!brandId) throw new Error(`seed: unknown brand ${p.brand}`);
    const [id] = await queryIds(
      m,
      `INSERT INTO part (brand_id, part_number, part_number_norm, kind, description, gtin, status)
       VALUES ($1,$2,$3,$4,$5,$6,$7) ON CONFLICT (brand_id, part_number_norm) DO NOTHING RETURNING id`,
      [brandId, p.partNumber, normalizePartNumber(p.partNumber), p.kind, p.description, p.gtin, p.status],
    );
    if (!id) continue;
    // The same writers as the catalog's edits: one definition of how a spec is stored.
    if (p.kind === 'coil') await writeCoilSpec(m, id, p.spec);
    else await writePlugSpec(m, id, p.spec);
  }
  const partIds = await idsBy(`SELECT id, part_number_norm AS key FROM part`);
  const partId = (printed: string): string => {
    const id = partIds.get(normalizePartNumber(printed));
    if (!id) throw new Error(`seed: unknown part ${printed}`);
    return id;
  };

  for (const s of supersessions) {
    await m.query(`UPDATE part SET superseded_by_id = $2 WHERE id = $1 AND superseded_by_id IS NULL`, [
      partId(s.partNumber),
      partId(s.supersededBy),
    ]);
  }
  for (const v of vehicles) {
    await m.query(`INSERT INTO vehicle (year, make, model, trim, engine_id) VALUES ($1,$2,$3,$4,$5) ON CONFLICT DO NOTHING`, [
      v.year,
      v.make,
      v.model,
      v.trim,
      engineIds.get(v.engineCode),
    ]);
  }
  for (const f of fitments) {
    await m.query(`INSERT INTO fitment (part_id, engine_id, position, quantity) VALUES ($1,$2,$3,$4) ON CONFLICT DO NOTHING`, [
      partId(f.partNumber),
      engineIds.get(f.engineCode),
      f.position,
      f.quantity,
    ]);
  }
  for (const i of interchange) {
    await m.query(
      `INSERT INTO interchange (foreign_brand, foreign_number, foreign_number_norm, part_id, source, confidence) VALUES ($1,$2,$3,$4,$5,$6) ON CONFLICT DO NOTHING`,
      [i.foreignBrand, i.foreignNumber, normalizePartNumber(i.foreignNumber), partId(i.ourPartNumber), i.source, i.confidence],
    );
  }
  const locationIds = await idsBy(`SELECT id, name AS key FROM location`);
  for (const s of stock) {
    await m.query(`INSERT INTO stock (location_id, part_id, on_hand, bin) VALUES ($1,$2,$3,$4) ON CONFLICT DO NOTHING`, [
      locationIds.get(s.location),
      partId(s.partNumber),
      s.onHand,
      s.bin,
    ]);
  }
  for (const s of suppliers) {
    await m.query(`INSERT INTO supplier (key, name, contact_email, phone) VALUES ($1,$2,$3,$4) ON CONFLICT DO NOTHING`, [
      s.key,
      s.name,
      s.contactEmail,
      s.phone,
    ]);
  }
  const supplierIds = await idsBy(`SELECT id, key FROM supplier`);
  for (const p of supplierPrices) {
    await m.query(
      `INSERT INTO supplier_price (supplier_id, part_id, cost_cents, list_cents, core_cents, pack_qty, effective_date) VALUES ($1,$2,$3,$4,$5,$6,$7) ON CONFLICT DO NOTHING`,
      [supplierIds.get(p.supplierKey), partId(p.partNumber), p.costCents, p.listCents, p.coreChargeCents, p.packQty, p.effectiveDate],
    );
  }
  return {
    parts: (await count('part')) - before.parts,
    engines: (await count('engine')) - before.engines,
    vehicles: (await count('vehicle')) - before.vehicles,
    interchange: (await count('interchange')) - before.interchange,
  };
}
