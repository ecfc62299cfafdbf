import type { DataSource, EntityManager } from 'typeorm';
import { In } from 'typeorm';
import type { CoilSpec, EngineSpec, ResolvedPlugSpec } from '../../../shared/schemas/specs';
import { CoilSpecEntity, EngineEntity, PlugSpecEntity } from '../../entities';
import type { PartRow } from '../../presenters/part.presenter';
import { presentCoilSpec, presentPlugSpec } from '../../presenters/part.presenter';
import type { PriceRow } from '../../presenters/stock-price.presenter';

type Db = DataSource | EntityManager;

export const PART_ROW_SQL = `
  SELECT p.id, b.name AS brand, b.ours, p.part_number, p.kind, p.description, p.gtin, p.status, p.superseded_by_id,
         (EXISTS (SELECT 1 FROM coil_spec c WHERE c.part_id = p.id) OR EXISTS (SELECT 1 FROM plug_spec s WHERE s.part_id = p.id)) AS has_spec
    FROM part p JOIN brand b ON b.id = p.brand_id`;

export async function loadPartRows(db: Db, ids: string[]): Promise<Map<string, PartRow>> {
  if (!ids.length) return new Map();
  const rows = (await db.query(`${PART_ROW_SQL} WHERE p.id = ANY($1::uuid[])`, [ids])) as PartRow[];
  return new Map(rows.map((r) => [r.id, r]));
}

export interface PartSpec {
  coil?: CoilSpec;
  plug?: ResolvedPlugSpec;
}

/** Specs of the given parts; a plug whose heat code its brand's table does not map has no usable spec. */
export async function loadSpecs(db: Db, ids: string[]): Promise<Map<string, PartSpec>> {
  const out = new Map<string, PartSpec>();
  if (!ids.length) return out;
  const coils = await db.getRepository(CoilSpecEntity).findBy({ partId: In(ids) });
  for (const c of coils) out.set(c.partId, { coil: presentCoilSpec(c) });
  const plugs = await db.getRepository(PlugSpecEntity).findBy({ partId: In(ids) });
  if (plugs.length) {
    const steps = (await db.query(
      `SELECT ps.part_id, hc.heat_step FROM plug_spec ps JOIN part p ON p.id = ps.part_id
         JOIN brand_heat_code hc ON hc.brand_id = p.brand_id AND hc.code = ps.heat_code WHERE ps.part_id = ANY($1::uuid[])`,
      [ids],
    )) as { part_id: string; heat_step: number }[];
    const stepOf = new Map(steps.map((s) => [s.part_id, s.heat_step]));
    for (const p of plugs) {
      const step = stepOf.get(p.partId);
      if (step !== undefined) out.set(p.partId, { plug: presentPlugSpec(p, step) });
    }
  }
  return out;
}

export async function loadStock(db: Db, ids: string[]): Promise<Map<string, { onHand: number; bin: string }>> {
  if (!ids.length) return new Map();
  const rows = (await db.query(`SELECT part_id, on_hand, bin FROM stock WHERE part_id = ANY($1::uuid[])`, [ids])) as {
    part_id: string;
    on_hand: number;
    bin: string;
  }[];
  return new Map(rows.map((r) => [r.part_id, { onHand: r.on_hand, bin: r.bin }]));
}

export async function loadPrices(db: Db, ids: string[]): Promise<Map<string, PriceRow[]>> {
  const out = new Map<string, PriceRow[]>();
  if (!ids.length) return out;
  const rows = (await db.query(
    `SELECT sp.part_id, s.id AS supplier_id, s.name AS supplier, sp.cost_cents, sp.list_cents, sp.core_cents, sp.pack_qty,
            to_char(sp.effective_date, 'YYYY-MM-DD') AS effective_date
       FROM supplier_price sp JOIN supplier s ON s.id = sp.supplier_id WHERE sp.part_id = ANY($1::uuid[]) ORDER BY s.name`,
    [ids],
  )) as {
    part_id: string;
    supplier_id: string;
    supplier: string;
    cost_cents: number;
    list_cents: number;
    core_cents: number;
    pack_qty: number;
    effective_date: string;
  }[];
  for (const r of rows) {
    const list = out.get(r.part_id) ?? [];
    list.push({
      supplierId: r.supplier_id,
      supplier: r.supplier,
      costCents: r.cost_cents,
      listCents: r.list_cents,
      coreCents: r.core_cents,
      packQty: r.pack_qty,
      effectiveDate: r.effective_date,
    });
    out.set(r.part_id, list);
  }
  return out;
}

export function engineSpecOf(e: EngineEntity): EngineSpec {
  return {
    code: e.code,
    displacementL: e.displacementL,
    cylinders: e.cylinders,
    compressionRatio: e.compressionRatio,
    aspiration: e.aspiration,
    peakBoostKpa: e.peakBoostKpa,
    rodRatio: e.rodRatio,
    specGapMm: e.specGapMm,
    dwellMs: e.dwellMs,
    crankingDwellMs: e.crankingDwellMs,
    driverCurrentLimitA: e.driverCurrentLimitA,
  };
}

export async function loadEngine(db: Db, id: string): Promise<EngineEntity | null> {
  return db.getRepository(EngineEntity).findOneBy({ id });
}
