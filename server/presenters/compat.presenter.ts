import type { Check, CoilComparison, LoadPointResult, PlugComparison } from '../../shared/compat';
import { CAUTIONS, type CheckRow, type CompatResult } from '../../shared/schemas/compat';
import type { CoilSpec, EngineSpec, ResolvedPlugSpec } from '../../shared/schemas/specs';

export const presentCheck = (c: Check): CheckRow => ({
  id: c.id,
  verdict: c.verdict,
  original: c.original,
  substitute: c.substitute,
  unit: c.unit,
  reason: c.reason,
});

const presentLoadPoint = (p: LoadPointResult): CompatResult['loadPoints'][number] => ({
  name: p.name,
  mapKpa: p.mapKpa,
  advanceDeg: p.advanceDeg,
  gapMm: p.gapMm,
  requiredKv: p.requiredKv,
  availableKv: p.availableKv,
  reservePct: p.reservePct,
});

/** A side of a comparison: a spec from the catalog (with its part) or typed in, and how it is named. */
export interface Resolved<S> {
  spec: S;
  label: string;
  partId: string | null;
}

export interface ResolvedEngine {
  spec: EngineSpec;
  label: string;
  engineId: string | null;
}

interface Sides<S> {
  original: Resolved<S>;
  substitute: Resolved<S>;
  engine: ResolvedEngine;
}

function common<S>(sides: Sides<S>, r: CoilComparison | PlugComparison) {
  return {
    verdict: r.verdict,
    checks: r.checks.map(presentCheck),
    loadPoints: r.loadPoints.map(presentLoadPoint),
    originalLoadPoints: r.originalLoadPoints.map(presentLoadPoint),
    original: { label: sides.original.label, partId: sides.original.partId },
    substitute: { label: sides.substitute.label, partId: sides.substitute.partId },
    engine: { label: sides.engine.label, engineId: sides.engine.engineId },
    cautions: [...CAUTIONS],
  };
}

export interface CoilComparisonRecord extends Sides<CoilSpec> {
  result: CoilComparison;
}

/** POST /api/compat/coil, and the result a coil fit report keeps. */
export function presentCoilComparison(c: CoilComparisonRecord): CompatResult {
  const { result: r, substitute, engine } = c;
  return {
    kind: 'coil',
    ...common(c, r),
    currents: r.currents,
    crankingCurrents: r.crankingCurrents,
    energyMj: r.energyMj,
    // The engine's driver limit matters only to a coil the engine's ECU drives (no driver of its own).
    driverLimitA: substitute.spec.driver === 'external' ? (engine.spec.driverCurrentLimitA ?? null) : null,
    dwellMs: engine.spec.dwellMs,
    crankingDwellMs: engine.spec.crankingDwellMs,
  };
}

export interface PlugComparisonRecord extends Sides<ResolvedPlugSpec> {
  result: PlugComparison;
}

/** POST /api/compat/plug, and the result a plug fit report keeps. */
export function presentPlugComparison(c: PlugComparisonRecord): CompatResult {
  return { kind: 'plug', ...common(c, c.result) };
}
