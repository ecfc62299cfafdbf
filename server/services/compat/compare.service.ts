import type { DataSource, EntityManager } from 'typeorm';
import { compareCoils, comparePlugs, CompatInputError, type CompatSettings } from '../../../shared/compat';
import type { CoilCompareBody, PlugCompareBody } from '../../../shared/schemas/compat';
import type { CoilSpec } from '../../../shared/schemas/specs';
import { AppError } from '../../errors';
import type { CoilComparisonRecord, PlugComparisonRecord } from '../../presenters/compat.presenter';
import { fittedPartId } from '../../repositories/engines.repository';
import { getSettings } from '../settings.service';
import { resolveCoil, resolveEngine, resolvePlug } from './resolve';

/** The model's own input guard, as the API's 400 naming the field. */
export function asBadRequest<T>(fn: () => T): T {
  try {
    return fn();
  } catch (err) {
    if (err instanceof CompatInputError) throw AppError.badRequest(err.message, [{ field: err.field, message: err.message }]);
    throw err;
  }
}

export async function compareCoilsOn(ex: EntityManager, body: CoilCompareBody, settings: CompatSettings): Promise<CoilComparisonRecord> {
  const [original, substitute, engine] = await Promise.all([
    resolveCoil(ex, body.original, 'original'),
    resolveCoil(ex, body.substitute, 'substitute'),
    resolveEngine(ex, body.engine),
  ]);
  const result = asBadRequest(() => compareCoils({ original: original.spec, substitute: substitute.spec, engine: engine.spec, settings }));
  return { result, original, substitute, engine };
}

/** The coil that supplies the plug's voltage: the one given, else the engine's fitted coil. */
async function voltageCoil(ex: EntityManager, body: PlugCompareBody, engineId: string | null): Promise<CoilSpec> {
  if (body.coil) return (await resolveCoil(ex, body.coil, 'coil')).spec;
  const fitted = engineId ? await fittedPartId(ex, engineId, 'coil') : null;
  if (!fitted)
    throw AppError.badRequest('coil: the engine has no fitted coil on file; give the coil that supplies the voltage', [
      { field: 'coil', message: 'required' },
    ]);
  return (await resolveCoil(ex, { partId: fitted }, 'coil')).spec;
}

export async function comparePlugsOn(ex: EntityManager, body: PlugCompareBody, settings: CompatSettings): Promise<PlugComparisonRecord> {
  const [original, substitute, engine] = await Promise.all([
    resolvePlug(ex, body.original, 'original'),
    resolvePlug(ex, body.substitute, 'substitute'),
    resolveEngine(ex, body.engine),
  ]);
  const coil = await voltageCoil(ex, body, engine.engineId);
  const result = asBadRequest(() =>
    comparePlugs({ original: original.spec, substitute: substitute.spec, engine: engine.spec, coil, settings }),
  );
  return { result, original, substitute, engine };
}

/** POST /api/compat/coil, under the admin's current thresholds. */
export async function compareCoilRequest(ds: DataSource, body: CoilCompareBody): Promise<CoilComparisonRecord> {
  return compareCoilsOn(ds.manager, body, (await getSettings(ds)).compat);
}

/** POST /api/compat/plug, under the admin's current thresholds. */
export async function comparePlugRequest(ds: DataSource, body: PlugCompareBody): Promise<PlugComparisonRecord> {
  return comparePlugsOn(ds.manager, body, (await getSettings(ds)).compat);
}
