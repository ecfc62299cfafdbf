import type { DataSource } from 'typeorm';
import type { CoilRef, EngineRef, PlugRef } from '../../../shared/schemas/compat';
import type { CoilSpec, EngineSpec, ResolvedPlugSpec } from '../../../shared/schemas/specs';
import { AppError } from '../../errors';
import { engineSpecOf, loadEngine, loadPartRows, loadSpecs } from '../catalog/part-loader';

export interface Resolved<S> {
  spec: S;
  label: string;
  partId: string | null;
}

const fieldError = (field: string, message: string) => AppError.badRequest(`${field}: ${message}`, [{ field, message }]);

async function partSpec(ds: DataSource, partId: string, field: string) {
  const row = (await loadPartRows(ds, [partId])).get(partId);
  if (!row) throw fieldError(`${field}.partId`, 'no such part');
  const spec = (await loadSpecs(ds, [partId])).get(partId);
  return { row, spec, label: `${row.brand} ${row.part_number}` };
}

/** A coil from the catalog or typed in; a part without a coil spec gets no verdict. */
export async function resolveCoil(ds: DataSource, ref: CoilRef, field: string): Promise<Resolved<CoilSpec>> {
  if ('spec' in ref) return { spec: ref.spec, label: 'typed-in coil spec', partId: null };
  const { row, spec, label } = await partSpec(ds, ref.partId, field);
  if (row.kind !== 'coil') throw fieldError(`${field}.partId`, `${label} is a plug, not a coil`);
  if (!spec?.coil) throw fieldError(`${field}.partId`, `${label} has no spec — no verdict`);
  return { spec: spec.coil, label, partId: row.id };
}

export async function resolvePlug(ds: DataSource, ref: PlugRef, field: string): Promise<Resolved<ResolvedPlugSpec>> {
  if ('spec' in ref) return { spec: ref.spec, label: 'typed-in plug spec', partId: null };
  const { row, spec, label } = await partSpec(ds, ref.partId, field);
  if (row.kind !== 'plug') throw fieldError(`${field}.partId`, `${label} is a coil, not a plug`);
  if (!spec?.plug) throw fieldError(`${field}.partId`, `${label} has no spec — no verdict`);
  return { spec: spec.plug, label, partId: row.id };
}

export interface ResolvedEngine {
  spec: EngineSpec;
  label: string;
  engineId: string | null;
}

export function engineLabel(e: EngineSpec): string {
  const air = e.aspiration === 'natural' ? '' : ` ${e.aspiration} ${e.peakBoostKpa} kPa`;
  return `${e.code} — ${e.displacementL.toFixed(1)} L ${e.cylinders}-cyl, ${e.compressionRatio}:1${air}`;
}

export async function resolveEngine(ds: DataSource, ref: EngineRef): Promise<ResolvedEngine> {
  if ('spec' in ref) return { spec: ref.spec, label: `${engineLabel(ref.spec)} (typed in)`, engineId: null };
  const e = await loadEngine(ds, ref.engineId);
  if (!e) throw fieldError('engine.engineId', 'no such engine');
  const spec = engineSpecOf(e);
  return { spec, label: engineLabel(spec), engineId: e.id };
}

/** The part an engine is fitted with at a position ("ignition coil", "spark plug"). */
export async function fittedPartId(ds: DataSource, engineId: string, kind: 'coil' | 'plug'): Promise<string | null> {
  const rows = (await ds.query(
    `SELECT f.part_id FROM fitment f JOIN part p ON p.id = f.part_id WHERE f.engine_id = $1 AND p.kind = $2 ORDER BY f.position LIMIT 1`,
    [engineId, kind],
  )) as { part_id: string }[];
  return rows[0]?.part_id ?? null;
}
