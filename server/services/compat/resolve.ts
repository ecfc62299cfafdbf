import type { EntityManager } from 'typeorm';
import type { CoilRef, EngineRef, PlugRef } from '../../../shared/schemas/compat';
import type { CoilSpec, EngineSpec, ResolvedPlugSpec } from '../../../shared/schemas/specs';
import { AppError } from '../../errors';
import type { Resolved, ResolvedEngine } from '../../presenters/compat.presenter';
import { findEngine } from '../../repositories/engines.repository';
import { findPartRows } from '../../repositories/parts.repository';
import { findSpecs } from '../../repositories/specs.repository';

const fieldError = (field: string, message: string) => AppError.badRequest(`${field}: ${message}`, [{ field, message }]);

async function partSpec(ex: EntityManager, partId: string, field: string) {
  const row = (await findPartRows(ex, [partId])).get(partId);
  if (!row) throw fieldError(`${field}.partId`, 'no such part');
  const spec = (await findSpecs(ex, [partId])).get(partId);
  return { row, spec, label: `${row.brand} ${row.part_number}` };
}

/** A coil from the catalog or typed in; a part without a coil spec gets no verdict. */
export async function resolveCoil(ex: EntityManager, ref: CoilRef, field: string): Promise<Resolved<CoilSpec>> {
  if ('spec' in ref) return { spec: ref.spec, label: 'typed-in coil spec', partId: null };
  const { row, spec, label } = await partSpec(ex, ref.partId, field);
  if (row.kind !== 'coil') throw fieldError(`${field}.partId`, `${label} is a plug, not a coil`);
  if (!spec?.coil) throw fieldError(`${field}.partId`, `${label} has no spec — no verdict`);
  return { spec: spec.coil, label, partId: row.id };
}

export async function resolvePlug(ex: EntityManager, ref: PlugRef, field: string): Promise<Resolved<ResolvedPlugSpec>> {
  if ('spec' in ref) return { spec: ref.spec, label: 'typed-in plug spec', partId: null };
  const { row, spec, label } = await partSpec(ex, ref.partId, field);
  if (row.kind !== 'plug') throw fieldError(`${field}.partId`, `${label} is a coil, not a plug`);
  if (!spec?.plug) throw fieldError(`${field}.partId`, `${label} has no spec — no verdict`);
  return { spec: spec.plug, label, partId: row.id };
}

export function engineLabel(e: EngineSpec): string {
  const air = e.aspiration === 'natural' ? '' : ` ${e.aspiration} ${e.peakBoostKpa} kPa`;
  return `${e.code} — ${e.displacementL.toFixed(1)} L ${e.cylinders}-cyl, ${e.compressionRatio}:1${air}`;
}

export async function resolveEngine(ex: EntityManager, ref: EngineRef): Promise<ResolvedEngine> {
  if ('spec' in ref) return { spec: ref.spec, label: `${engineLabel(ref.spec)} (typed in)`, engineId: null };
  const e = await findEngine(ex, ref.engineId);
  if (!e) throw fieldError('engine.engineId', 'no such engine');
  return { spec: e.spec, label: engineLabel(e.spec), engineId: e.id };
}
