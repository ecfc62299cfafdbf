import type { DataSource, EntityManager } from 'typeorm';
import type { CompatSettings } from '../../../shared/compat';
import { normalizePartNumber } from '../../../shared/part-number';
import { readOnly } from '../../db/read-only';
import { AppError } from '../../errors';
import type { PartDetailRecord } from '../../presenters/part.presenter';
import type { EngineDetailRecord } from '../../presenters/vehicle.presenter';
import { engineFitments, findEngine } from '../../repositories/engines.repository';
import { claimsOfPart } from '../../repositories/interchange.repository';
import { findPartRows, supersessionDown, supersessionUp } from '../../repositories/parts.repository';
import { pricesOf } from '../../repositories/prices.repository';
import { findSpecs } from '../../repositories/specs.repository';
import { noStock, stockOf } from '../../repositories/stock.repository';
import { interchangeVerdict } from '../compat/interchange-verdict.service';
import type { Here } from '../locations.service';
import { fittedOrder } from './fitted-order';
import { getSettings } from '../settings.service';

/**
 * A part with its spec, stock, prices, interchange claims (each judged) and supersession chain,
 * read through the executor given: a replica's for GET /api/parts/:id, the primary's right after
 * an edit.
 */
export async function loadPartDetail(
  ex: EntityManager,
  id: string,
  settings: CompatSettings,
  hereId: string | null,
  engineId?: string,
): Promise<PartDetailRecord> {
  const row = (await findPartRows(ex, [id])).get(id);
  if (!row) throw AppError.notFound('Part');
  const spec = (await findSpecs(ex, [id])).get(id);
  const stock = (await stockOf(ex, [id], hereId)).get(id) ?? noStock(hereId);
  const prices = (await pricesOf(ex, [id])).get(id) ?? [];
  const claims = await claimsOfPart(ex, id);
  // Each claim of equivalence carries the verdict of the foreign part's own spec against ours.
  const interchange = await Promise.all(
    claims.map(async (claim) => ({
      claim,
      check: await interchangeVerdict(
        ex,
        { foreignNumberNorm: normalizePartNumber(claim.number), originalPartId: claim.original_part_id, partId: id },
        settings,
        engineId,
      ),
    })),
  );
  return { row, spec, stock, prices, interchange, up: await supersessionUp(ex, id), down: await supersessionDown(ex, id) };
}

/** GET /api/parts/:id: read-only work, on a replica where there is one. */
export async function getPartDetail(ds: DataSource, id: string, here: Here, engineId?: string): Promise<PartDetailRecord> {
  const { compat } = await getSettings(ds);
  return readOnly(ds, async (ex) => loadPartDetail(ex, id, compat, await here(ex), engineId));
}

/** GET /api/engines/:id: an engine with the parts it is built with, their stock and prices; on a replica where there is one. */
export function getEngineDetail(ds: DataSource, id: string, here: Here): Promise<EngineDetailRecord> {
  return readOnly(ds, async (ex) => {
    const hereId = await here(ex);
    const engine = await findEngine(ex, id);
    if (!engine) throw AppError.notFound('Engine');
    const fitments = await engineFitments(ex, id);
    const ids = fitments.map((f) => f.part_id);
    const [rows, stock, prices, specs] = await Promise.all([
      findPartRows(ex, ids),
      stockOf(ex, ids, hereId),
      pricesOf(ex, ids),
      findSpecs(ex, ids),
    ]);
    return {
      engine,
      fitments: fittedOrder(
        fitments.flatMap((f) => {
          const row = rows.get(f.part_id);
          if (!row) return [];
          return [
            {
              row,
              spec: specs.get(f.part_id),
              position: f.position,
              quantity: f.quantity,
              stock: stock.get(f.part_id) ?? noStock(hereId),
              prices: prices.get(f.part_id) ?? [],
            },
          ];
        }),
      ),
    };
  });
}
