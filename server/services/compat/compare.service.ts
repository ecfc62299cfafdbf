import type { DataSource } from 'typeorm';
import { compareCoils, comparePlugs, CompatInputError, type CompatSettings } from '../../../shared/compat';
import type { CoilCompareBody, PlugCompareBody } from '../../../shared/schemas/compat';
import type { CoilSpec } from '../../../shared/schemas/specs';
import { AppError } from '../../errors';
import type { CoilComparisonRecord, PlugComparisonRecord } from '../../presenters/compat.presenter';
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

export async function compareCoilRequest(ds: DataSource, body: CoilCompareBody, settings: CompatSettings): Promise<CoilComparisonRecord> {
  const [original, substitute, engine] = await Promise.all([
    resolveCoil(ds, body.original, 'original'),
    resolveCoil(ds, body.substitute, 'substitute'),
    resolveEngine(ds, body.engine),
  ]);
  const result = asBadRequest(() => compareCoils({ original: original.spec, substitute: substitute.spec, engine: engine.spec, settings }));
  return { result, original, substitute, engine };
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

export async function comparePlugRequest(ds: DataSource, body: PlugCompareBody, settings: CompatSettings): Promise<PlugComparisonRecord> {
  const [original, substitute, engine] = await Promise.all([
    resolvePlug(ds, body.original, 'original'),
    resolvePlug(ds, body.substitute, 'substitute'),
    resolveEngine(ds, body.engine),
  ]);
  const coil = await voltageCoil(ds, body, engine.engineId);
  const result = asBadRequest(() =>
    comparePlugs({ original: original.spec, substitute: substitute.spec, engine: engine.spec, coil, settings }),
  );
  return { result, original, substitute, engine };
}
