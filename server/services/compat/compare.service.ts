import type { DataSource } from 'typeorm';
import { compareCoils, comparePlugs, CompatInputError, type CompatSettings } from '../../../shared/compat';
import { CAUTIONS, type CoilCompareBody, type CompatResult, type PlugCompareBody } from '../../../shared/schemas/compat';
import type { CoilSpec } from '../../../shared/schemas/specs';
import { AppError } from '../../errors';
import { fittedPartId, resolveCoil, resolveEngine, resolvePlug } from './resolve';

/** The model's own input guard, as the API's 400 naming the field. */
export function asBadRequest<T>(fn: () => T): T {
  try {
    return fn();
  } catch (err) {
    if (err instanceof CompatInputError) throw AppError.badRequest(err.message, [{ field: err.field, message: err.message }]);
    throw err;
  }
}

export async function compareCoilRequest(ds: DataSource, body: CoilCompareBody, settings: CompatSettings): Promise<CompatResult> {
  const [original, substitute, engine] = await Promise.all([
    resolveCoil(ds, body.original, 'original'),
    resolveCoil(ds, body.substitute, 'substitute'),
    resolveEngine(ds, body.engine),
  ]);
  const r = asBadRequest(() => compareCoils({ original: original.spec, substitute: substitute.spec, engine: engine.spec, settings }));
  return {
    kind: 'coil',
    verdict: r.verdict,
    checks: r.checks,
    loadPoints: r.loadPoints,
    originalLoadPoints: r.originalLoadPoints,
    currents: r.currents,
    crankingCurrents: r.crankingCurrents,
    energyMj: r.energyMj,
    driverLimitA: substitute.spec.driver === 'external' ? (engine.spec.driverCurrentLimitA ?? null) : null,
    dwellMs: engine.spec.dwellMs,
    crankingDwellMs: engine.spec.crankingDwellMs,
    original: { label: original.label, partId: original.partId },
    substitute: { label: substitute.label, partId: substitute.partId },
    engine: { label: engine.label, engineId: engine.engineId },
    cautions: [...CAUTIONS],
  };
}

/** The coil that supplies the plug's voltage: the one given, else the engine's fitted coil. */
async function voltageCoil(ds: DataSource, body: PlugCompareBody, engineId: string | null): Promise<CoilSpec> {
  if (body.coil) return (await resolveCoil(ds, body.coil, 'coil')).spec;
  const fitted = engineId ? await fittedPartId(ds, engineId, 'coil') : null;
  if (!fitted)
    throw AppError.badRequest('coil: the engine has no fitted coil on file; give the coil that supplies the voltage', [
      { field: 'coil', message: 'required' },
    ]);
  return (await resolveCoil(ds, { partId: fitted }, 'coil')).spec;
}

export async function comparePlugRequest(ds: DataSource, body: PlugCompareBody, settings: CompatSettings): Promise<CompatResult> {
  const [original, substitute, engine] = await Promise.all([
    resolvePlug(ds, body.original, 'original'),
    resolvePlug(ds, body.substitute, 'substitute'),
    resolveEngine(ds, body.engine),
  ]);
  const coil = await voltageCoil(ds, body, engine.engineId);
  const r = asBadRequest(() => comparePlugs({ original: original.spec, substitute: substitute.spec, engine: engine.spec, coil, settings }));
  return {
    kind: 'plug',
    verdict: r.verdict,
    checks: r.checks,
    loadPoints: r.loadPoints,
    originalLoadPoints: r.originalLoadPoints,
    original: { label: original.label, partId: original.partId },
    substitute: { label: substitute.label, partId: substitute.partId },
    engine: { label: engine.label, engineId: engine.engineId },
    cautions: [...CAUTIONS],
  };
}
