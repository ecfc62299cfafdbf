import type { EntityManager } from 'typeorm';
import { prepareCoilComparison, preparePlugComparison, type CompatSettings, type Verdict } from '../../../shared/compat';
import type { CheckRow } from '../../../shared/schemas/compat';
import type { InterchangeVerdict } from '../../presenters/part.presenter';
import { findEngine, fittedPartId } from '../../repositories/engines.repository';
import { referenceEngineId } from '../../repositories/interchange.repository';
import { findSpecs } from '../../repositories/specs.repository';
import { engineLabel } from './resolve';

/**
 * Checks an interchange claim: the foreign part's own spec (where the catalog has it) as the
 * original, ours as the substitute, on the reference engine (where the parts it is said to equal
 * are fitted, the most trusted claim first) or the one the clerk picked.
 * Null when there is nothing to compute from: no foreign spec, or no engine.
 */
export async function interchangeVerdict(
  ex: EntityManager,
  row: { foreignNumberNorm: string; originalPartId: string | null; partId: string },
  settings: CompatSettings,
  engineId?: string,
): Promise<InterchangeVerdict | null> {
  if (!row.originalPartId) return null;
  const specs = await findSpecs(ex, [row.originalPartId, row.partId]);
  const o = specs.get(row.originalPartId);
  const s = specs.get(row.partId);
  const eid = engineId ?? (await referenceEngineId(ex, row.foreignNumberNorm));
  const engine = eid ? await findEngine(ex, eid) : null;
  if (!o || !s || !engine) return null;
  let checks: CheckRow[];
  let verdict: Verdict;
  if (o.coil && s.coil) {
    const r = prepareCoilComparison({ original: o.coil, engine: engine.spec, settings }).compare(s.coil, { curves: false });
    [checks, verdict] = [r.checks, r.verdict];
  } else if (o.plug && s.plug) {
    const coilId = await fittedPartId(ex, engine.id, 'coil');
    const coil = coilId ? (await findSpecs(ex, [coilId])).get(coilId)?.coil : undefined;
    if (!coil) return null;
    const r = preparePlugComparison({ original: o.plug, engine: engine.spec, coil, settings }).compare(s.plug);
    [checks, verdict] = [r.checks, r.verdict];
  } else {
    return null;
  }
  return { verdict, concerns: checks.filter((c) => c.verdict !== 'go'), engine: engineLabel(engine.spec) };
}
