import type { DataSource } from 'typeorm';
import type { CompatSettings } from '../../../shared/compat';
import { normalizePartNumber } from '../../../shared/part-number';
import type { Role } from '../../../shared/roles';
import { AppError } from '../../errors';
import { presentPart } from '../../presenters/part.presenter';
import { presentPrice, presentStock, sellPrice } from '../../presenters/stock-price.presenter';
import { interchangeVerdict } from '../compat/interchange-verdict.service';
import { engineSpecOf, loadEngine, loadPartRows, loadPrices, loadSpecs, loadStock } from './part-loader';

interface ChainRow {
  id: string;
  part_number: string;
  superseded_by_id: string | null;
  depth: number;
}

/** The whole supersession chain through a part: what it replaced, what replaced it, and the current part. */
async function supersessionOf(ds: DataSource, id: string) {
  const up = (await ds.query(
    `WITH RECURSIVE up AS (
       SELECT id, part_number, superseded_by_id, 0 AS depth FROM part WHERE id = $1
       UNION ALL SELECT p.id, p.part_number, p.superseded_by_id, up.depth + 1 FROM part p JOIN up ON p.id = up.superseded_by_id WHERE up.depth < 20)
     SELECT * FROM up ORDER BY depth`,
    [id],
  )) as ChainRow[];
  const down = (await ds.query(
    `WITH RECURSIVE down AS (
       SELECT id, part_number, superseded_by_id, 0 AS depth FROM part WHERE superseded_by_id = $1
       UNION ALL SELECT p.id, p.part_number, p.superseded_by_id, down.depth + 1 FROM part p JOIN down ON p.superseded_by_id = down.id WHERE down.depth < 20)
     SELECT * FROM down ORDER BY depth`,
    [id],
  )) as ChainRow[];
  const current = up[up.length - 1]!;
  return {
    supersedes: down.map((r) => ({ id: r.id, partNumber: r.part_number })),
    supersededBy: up[1] ? { id: up[1].id, partNumber: up[1].part_number } : null,
    current: { id: current.id, partNumber: current.part_number },
  };
}

export async function getPartDetail(ds: DataSource, id: string, role: Role, settings: CompatSettings, engineId?: string) {
  const row = (await loadPartRows(ds, [id])).get(id);
  if (!row) throw AppError.notFound('Part');
  const spec = (await loadSpecs(ds, [id])).get(id) ?? {};
  const stock = (await loadStock(ds, [id])).get(id) ?? { onHand: 0, bin: '' };
  const prices = (await loadPrices(ds, [id])).get(id) ?? [];
  const interchange = (await ds.query(
    `SELECT i.id, i.foreign_brand AS brand, i.foreign_number AS number, i.source, i.confidence,
            (SELECT fp.id FROM part fp JOIN brand fb ON fb.id = fp.brand_id
              WHERE fp.part_number_norm = i.foreign_number_norm AND lower(fb.name) = lower(i.foreign_brand) LIMIT 1) AS original_part_id
       FROM interchange i WHERE i.part_id = $1 ORDER BY i.foreign_brand, i.foreign_number`,
    [id],
  )) as { id: string; brand: string; number: string; source: string; confidence: number; original_part_id: string | null }[];
  return {
    part: presentPart(row),
    spec: spec.coil ?? spec.plug ?? null,
    // Each claim of equivalence carries the verdict of the foreign part's own spec against ours.
    interchange: await Promise.all(
      interchange.map(async (i) => ({
        id: i.id,
        brand: i.brand,
        number: i.number,
        source: i.source,
        confidence: i.confidence,
        originalPartId: i.original_part_id,
        check: await interchangeVerdict(
          ds,
          { foreignNumberNorm: normalizePartNumber(i.number), originalPartId: i.original_part_id, partId: id },
          settings,
          engineId,
        ),
      })),
    ),
    supersession: await supersessionOf(ds, id),
    stock: presentStock(stock.onHand, stock.bin, role),
    price: sellPrice(prices, role),
    prices: prices.map((p) => presentPrice(p, role)),
  };
}

export async function getEngineDetail(ds: DataSource, id: string, role: Role) {
  const engine = await loadEngine(ds, id);
  if (!engine) throw AppError.notFound('Engine');
  const fitments = (await ds.query(`SELECT part_id, position, quantity FROM fitment WHERE engine_id = $1 ORDER BY position`, [id])) as {
    part_id: string;
    position: string;
    quantity: number;
  }[];
  const ids = fitments.map((f) => f.part_id);
  const [rows, stock, prices, specs] = await Promise.all([
    loadPartRows(ds, ids),
    loadStock(ds, ids),
    loadPrices(ds, ids),
    loadSpecs(ds, ids),
  ]);
  return {
    engine: { id: engine.id, description: engine.description, systemVoltage: engine.systemVoltage, ...engineSpecOf(engine) },
    fitments: fitments.map((f) => {
      const s = stock.get(f.part_id) ?? { onHand: 0, bin: '' };
      const spec = specs.get(f.part_id);
      return {
        part: presentPart(rows.get(f.part_id)!),
        spec: spec?.coil ?? spec?.plug ?? null,
        position: f.position,
        quantity: f.quantity,
        stock: presentStock(s.onHand, s.bin, role),
        price: sellPrice(prices.get(f.part_id) ?? [], role),
      };
    }),
  };
}
