import type { DataSource } from 'typeorm';
import { prepareCoilComparison, preparePlugComparison, type CompatSettings, type Verdict } from '../../../shared/compat';
import type { CheckRow } from '../../../shared/schemas/compat';
import { engineSpecOf, loadEngine, loadSpecs } from '../catalog/part-loader';
import { engineLabel, fittedPartId } from './resolve';

export interface InterchangeVerdict {
  verdict: Verdict;
  /** The rows that are not go, with their reasons: why a claimed equivalent is doubtful or wrong. */
  concerns: CheckRow[];
  engine: string;
}

/**
 * The engine a foreign number is judged on: where the parts it is said to equal are fitted,
 * the most trusted claim first — the engine the original part came off, as near as the catalog knows.
 */
async function referenceEngineId(ds: DataSource, foreignNorm: string): Promise<string | null> {
  const rows = (await ds.query(
    `SELECT f.engine_id FROM interchange i JOIN fitment f ON f.part_id = i.part_id
      WHERE i.foreign_number_norm = $1 ORDER BY i.confidence DESC, f.engine_id LIMIT 1`,
    [foreignNorm],
  )) as { engine_id: string }[];
  return rows[0]?.engine_id ?? null;
}

/**
 * Checks an interchange claim: the foreign part's own spec (where the catalog has it) as the
 * original, ours as the substitute, on the reference engine or the one the clerk picked.
 * Null when there is nothing to compute from: no foreign spec, or no engine.
 */
export async function interchangeVerdict(
  ds: DataSource,
  row: { foreignNumberNorm: string; originalPartId: string | null; partId: string },
  settings: CompatSettings,
  engineId?: string,
): Promise<InterchangeVerdict | null> {
  if (!row.originalPartId) return null;
  const specs = await loadSpecs(ds, [row.originalPartId, row.partId]);
  const o = specs.get(row.originalPartId);
  const s = specs.get(row.partId);
  const eid = engineId ?? (await referenceEngineId(ds, row.foreignNumberNorm));
  const engine = eid ? await loadEngine(ds, eid) : null;
  if (!o || !s || !engine) return null;
  const engineSpec = engineSpecOf(engine);
  let checks: CheckRow[];
  let verdict: Verdict;
  if (o.coil && s.coil) {
    const r = prepareCoilComparison({ original: o.coil, engine: engineSpec, settings }).compare(s.coil, { curves: false });
    [checks, verdict] = [r.checks, r.verdict];
  } else if (o.plug && s.plug) {
    const coilId = await fittedPartId(ds, engine.id, 'coil');
    const coil = coilId ? (await loadSpecs(ds, [coilId])).get(coilId)?.coil : undefined;
    if (!coil) return null;
    const r = preparePlugComparison({ original: o.plug, engine: engineSpec, coil, settings }).compare(s.plug);
    [checks, verdict] = [r.checks, r.verdict];
  } else {
    return null;
  }
  return { verdict, concerns: checks.filter((c) => c.verdict !== 'go'), engine: engineLabel(engineSpec) };
}
