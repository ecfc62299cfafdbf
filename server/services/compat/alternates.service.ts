import type { DataSource, EntityManager } from 'typeorm';
import { prepareCoilComparison, preparePlugComparison, rankAlternates, type CompatSettings, type Verdict } from '../../../shared/compat';
import type { Check } from '../../../shared/compat';
import type { AlternatesQuery } from '../../../shared/schemas/alternates';
import type { CoilSpec, ResolvedPlugSpec } from '../../../shared/schemas/specs';
import { readOnly } from '../../db/read-only';
import { AppError } from '../../errors';
import type { AlternatesRecord } from '../../presenters/alternates.presenter';
import { sellPriceRow } from '../../presenters/stock-price.presenter';
import { findEngine, fittedPartId } from '../../repositories/engines.repository';
import { currentSpecPartIds, findPartRows } from '../../repositories/parts.repository';
import { pricesOf } from '../../repositories/prices.repository';
import { findSpecs } from '../../repositories/specs.repository';
import { inStockHere, noStock, stockOf } from '../../repositories/stock.repository';
import type { Here } from '../locations.service';
import { getSettings } from '../settings.service';
import { asBadRequest } from './compare.service';

/**
 * GET /api/engines/:id/alternates: the alternates for an engine's fitted coil or plug, ranked as
 * compat-model.md §7 says — every candidate judged against the fitted part on this engine, no-go
 * ones only on request (`all`). Read-only work, on a replica where there is one.
 */
export async function engineAlternates(ds: DataSource, engineId: string, query: AlternatesQuery, here: Here): Promise<AlternatesRecord> {
  const { compat } = await getSettings(ds);
  const includeNoGo = query.all === '1' || query.all === 'true';
  return readOnly(ds, async (ex) => rankFor(ex, engineId, query.kind, includeNoGo, compat, await here(ex)));
}

async function rankFor(
  ex: EntityManager,
  engineId: string,
  kind: 'coil' | 'plug',
  includeNoGo: boolean,
  settings: CompatSettings,
  hereId: string | null,
): Promise<AlternatesRecord> {
  const engine = await findEngine(ex, engineId);
  if (!engine) throw AppError.notFound('Engine');
  const engineSpec = engine.spec;
  const originalId = await fittedPartId(ex, engineId, kind);
  if (!originalId) return { original: null, alternates: [] };
  const ids = await currentSpecPartIds(ex, kind, originalId);
  const specs = await findSpecs(ex, [originalId, ...ids]);
  const originalSpec = specs.get(originalId);
  const [rows, stock, prices] = await Promise.all([findPartRows(ex, [originalId, ...ids]), stockOf(ex, ids, hereId), pricesOf(ex, ids)]);
  const original = rows.get(originalId)!;
  if (!originalSpec?.coil && !originalSpec?.plug) return { original, alternates: [] };

  type Judged = { verdict: Verdict; deviation: number };
  let judge: (id: string) => Judged | null;
  let explain: (id: string) => Check[];
  if (kind === 'coil') {
    const comparer = asBadRequest(() => prepareCoilComparison({ original: originalSpec.coil as CoilSpec, engine: engineSpec, settings }));
    judge = (id) => {
      const s = specs.get(id)?.coil;
      return s ? comparer.judge(s) : null;
    };
    explain = (id) => comparer.compare(specs.get(id)!.coil!, { curves: false }).checks;
  } else {
    const coilId = await fittedPartId(ex, engineId, 'coil');
    const coil = coilId ? (await findSpecs(ex, [coilId])).get(coilId)?.coil : undefined;
    if (!coil) return { original, alternates: [] };
    const comparer = asBadRequest(() =>
      preparePlugComparison({ original: originalSpec.plug as ResolvedPlugSpec, engine: engineSpec, coil, settings }),
    );
    judge = (id) => {
      const s = specs.get(id)?.plug;
      return s ? comparer.judge(s) : null;
    };
    explain = (id) => comparer.compare(specs.get(id)!.plug!).checks;
  }

  const candidates = ids.flatMap((id) => {
    const result = judge(id);
    if (!result) return [];
    const partPrices = prices.get(id) ?? [];
    // "In stock" for the ranking is on the shelf here: of two equal alternates, the one the clerk can hand over now.
    return [
      {
        id,
        result,
        inStock: inStockHere(stock.get(id) ?? noStock(hereId)),
        priceCents: sellPriceRow(partPrices)?.listCents ?? null,
        partPrices,
      },
    ];
  });
  const ranked = rankAlternates(candidates, { includeNoGo });
  return {
    original,
    alternates: ranked.map((c) => ({
      row: rows.get(c.id)!,
      verdict: c.result.verdict,
      deviation: c.result.deviation,
      checks: explain(c.id),
      stock: stock.get(c.id) ?? noStock(hereId),
      prices: c.partPrices,
    })),
  };
}
