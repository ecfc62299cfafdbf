import type { DataSource } from 'typeorm';
import { prepareCoilComparison, preparePlugComparison, rankAlternates, type CompatSettings, type Verdict } from '../../../shared/compat';
import type { Check } from '../../../shared/compat';
import type { CoilSpec, ResolvedPlugSpec } from '../../../shared/schemas/specs';
import { AppError } from '../../errors';
import type { AlternatesRecord } from '../../presenters/alternates.presenter';
import { sellPriceRow } from '../../presenters/stock-price.presenter';
import { engineSpecOf, loadEngine, loadPartRows, loadPrices, loadSpecs, loadStock } from '../catalog/part-loader';
import { asBadRequest } from './compare.service';
import { fittedPartId } from './resolve';

/** Our current parts of a kind that carry a spec: the candidates a clerk could offer. */
async function candidateIds(ds: DataSource, kind: 'coil' | 'plug', exceptId: string): Promise<string[]> {
  const specTable = kind === 'coil' ? 'coil_spec' : 'plug_spec';
  const rows = (await ds.query(
    `SELECT p.id FROM part p JOIN brand b ON b.id = p.brand_id AND b.ours JOIN ${specTable} s ON s.part_id = p.id
      WHERE p.kind = $1 AND p.superseded_by_id IS NULL AND p.status = 'active' AND p.id <> $2`,
    [kind, exceptId],
  )) as { id: string }[];
  return rows.map((r) => r.id);
}

/**
 * The alternates for an engine's fitted coil or plug, ranked as compat-model.md §7 says: every
 * candidate judged against the fitted part on this engine, no-go ones only on request.
 */
export async function engineAlternates(
  ds: DataSource,
  engineId: string,
  kind: 'coil' | 'plug',
  includeNoGo: boolean,
  settings: CompatSettings,
): Promise<AlternatesRecord> {
  const engine = await loadEngine(ds, engineId);
  if (!engine) throw AppError.notFound('Engine');
  const engineSpec = engineSpecOf(engine);
  const originalId = await fittedPartId(ds, engineId, kind);
  if (!originalId) return { original: null, alternates: [] };
  const ids = await candidateIds(ds, kind, originalId);
  const specs = await loadSpecs(ds, [originalId, ...ids]);
  const originalSpec = specs.get(originalId);
  const [rows, stock, prices] = await Promise.all([loadPartRows(ds, [originalId, ...ids]), loadStock(ds, ids), loadPrices(ds, ids)]);
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
    const coilId = await fittedPartId(ds, engineId, 'coil');
    const coil = coilId ? (await loadSpecs(ds, [coilId])).get(coilId)?.coil : undefined;
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
    return [{ id, result, inStock: (stock.get(id)?.onHand ?? 0) > 0, priceCents: sellPriceRow(partPrices)?.listCents ?? null, partPrices }];
  });
  const ranked = rankAlternates(candidates, { includeNoGo });
  return {
    original,
    alternates: ranked.map((c) => ({
      row: rows.get(c.id)!,
      verdict: c.result.verdict,
      deviation: c.result.deviation,
      checks: explain(c.id),
      inStock: c.inStock,
      prices: c.partPrices,
    })),
  };
}
