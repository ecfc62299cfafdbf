import type { DataSource } from 'typeorm';
import type { CompatSettings } from '../../../shared/compat';
import { normalizePartNumber } from '../../../shared/part-number';
import { AppError } from '../../errors';
import type { ChainRecord, InterchangeRecord, PartDetailRecord } from '../../presenters/part.presenter';
import type { EngineDetailRecord, FitmentRecord } from '../../presenters/vehicle.presenter';
import { interchangeVerdict } from '../compat/interchange-verdict.service';
import { loadEngine, loadPartRows, loadPrices, loadSpecs, loadStock } from './part-loader';

/** The whole supersession chain through a part: up to the current part, and down through what it replaced. */
async function supersessionOf(ds: DataSource, id: string): Promise<{ up: ChainRecord[]; down: ChainRecord[] }> {
  const up = (await ds.query(
    `WITH RECURSIVE up AS (
       SELECT id, part_number, superseded_by_id, 0 AS depth FROM part WHERE id = $1
       UNION ALL SELECT p.id, p.part_number, p.superseded_by_id, up.depth + 1 FROM part p JOIN up ON p.id = up.superseded_by_id WHERE up.depth < 20)
     SELECT id, part_number FROM up ORDER BY depth`,
    [id],
  )) as ChainRecord[];
  const down = (await ds.query(
    `WITH RECURSIVE down AS (
       SELECT id, part_number, superseded_by_id, 0 AS depth FROM part WHERE superseded_by_id = $1
       UNION ALL SELECT p.id, p.part_number, p.superseded_by_id, down.depth + 1 FROM part p JOIN down ON p.superseded_by_id = down.id WHERE down.depth < 20)
     SELECT id, part_number FROM down ORDER BY depth`,
    [id],
  )) as ChainRecord[];
  return { up, down };
}

/** A part with its spec, stock, prices, interchange claims (each judged) and supersession chain. */
export async function getPartDetail(ds: DataSource, id: string, settings: CompatSettings, engineId?: string): Promise<PartDetailRecord> {
  const row = (await loadPartRows(ds, [id])).get(id);
  if (!row) throw AppError.notFound('Part');
  const spec = (await loadSpecs(ds, [id])).get(id);
  const stock = (await loadStock(ds, [id])).get(id) ?? { onHand: 0, bin: '' };
  const prices = (await loadPrices(ds, [id])).get(id) ?? [];
  const claims = (await ds.query(
    `SELECT i.id, i.foreign_brand AS brand, i.foreign_number AS number, i.source, i.confidence,
            (SELECT fp.id FROM part fp JOIN brand fb ON fb.id = fp.brand_id
              WHERE fp.part_number_norm = i.foreign_number_norm AND lower(fb.name) = lower(i.foreign_brand) LIMIT 1) AS original_part_id
       FROM interchange i WHERE i.part_id = $1 ORDER BY i.foreign_brand, i.foreign_number`,
    [id],
  )) as InterchangeRecord[];
  // Each claim of equivalence carries the verdict of the foreign part's own spec against ours.
  const interchange = await Promise.all(
    claims.map(async (claim) => ({
      claim,
      check: await interchangeVerdict(
        ds,
        { foreignNumberNorm: normalizePartNumber(claim.number), originalPartId: claim.original_part_id, partId: id },
        settings,
        engineId,
      ),
    })),
  );
  return { row, spec, stock, prices, interchange, ...(await supersessionOf(ds, id)) };
}

/** An engine with the parts it is built with, their stock and prices. */
export async function getEngineDetail(ds: DataSource, id: string): Promise<EngineDetailRecord> {
  const engine = await loadEngine(ds, id);
  if (!engine) throw AppError.notFound('Engine');
  const fitments = (await ds.query(`SELECT part_id, position, quantity FROM fitment WHERE engine_id = $1 ORDER BY position`, [id])) as {
    part_id: string;
    position: FitmentRecord['position'];
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
    engine,
    fitments: fitments.map((f) => ({
      row: rows.get(f.part_id)!,
      spec: specs.get(f.part_id),
      position: f.position,
      quantity: f.quantity,
      stock: stock.get(f.part_id) ?? { onHand: 0, bin: '' },
      prices: prices.get(f.part_id) ?? [],
    })),
  };
}
