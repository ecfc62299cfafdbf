import type { CoilSpec, EngineSpec } from '../schemas/specs';
import { fractionToPct, kvToV, mhToH, msToS, vToKv } from '../units';
import { CompatInputError, requireFinite, requirePositive } from './errors';
import {
  availableVoltageV,
  primaryCurrentA,
  ratedAvailableVoltageV,
  sampleCurrentCurve,
  storedEnergyJ,
  type PrimaryCircuit,
} from './primary-circuit';
import type { RequiredLoadPoint } from './required-voltage';
import type { CompatSettings } from './settings';
import type { CurrentSample, LoadPointResult } from './types';

/**
 * One coil on one engine, worked out at the conditions compat-model.md §1 names:
 * - energy at cranking: the window's mid resistance, cranking voltage, cranking dwell;
 * - driver current: the window's low end, charging voltage, running dwell, with no cap (it is
 *   the current the driver would have to switch);
 * - available voltage at the load points: mid resistance, charging voltage, running dwell.
 */
export interface CoilAnalysis {
  midResistanceOhm: number;
  lowResistanceOhm: number;
  highResistanceOhm: number;
  inductanceH: number;
  /** What caps the current: the coil's own rated peak with an integrated igniter, else the engine's driver limit. */
  currentLimitA: number | null;
  crankingCurrentA: number;
  crankingEnergyJ: number;
  /** Cranking energy at the window's high end, the worst case for energy. */
  crankingEnergyWorstJ: number;
  runningCurrentA: number;
  ratedAvailableV: number;
  availableV: number;
  /** Uncapped current at the window's low end, charging voltage, end of running dwell. */
  driverCurrentA: number;
  crankingCircuit: PrimaryCircuit;
  chargingCircuit: PrimaryCircuit;
}

export function validateCoil(coil: CoilSpec, field: string): void {
  requirePositive(coil.primaryOhmMin, `${field}.primaryOhmMin`);
  requirePositive(coil.primaryOhmMax, `${field}.primaryOhmMax`);
  if (coil.primaryOhmMin > coil.primaryOhmMax) {
    throw new CompatInputError(`${field}.primaryOhmMin`, "must not be above the window's max");
  }
  requirePositive(coil.primaryInductanceMh, `${field}.primaryInductanceMh`);
  requirePositive(coil.turnsRatio, `${field}.turnsRatio`);
  requirePositive(coil.peakCurrentA, `${field}.peakCurrentA`);
  requireFinite(coil.outputs, `${field}.outputs`);
  requireFinite(coil.connectorPins, `${field}.connectorPins`);
  if (coil.availableKv != null) requirePositive(coil.availableKv, `${field}.availableKv`);
  const hasMin = coil.secondaryKohmMin != null;
  const hasMax = coil.secondaryKohmMax != null;
  if (hasMin !== hasMax) {
    throw new CompatInputError(`${field}.secondaryKohmMin`, 'give both ends of the secondary window, or neither');
  }
  if (coil.secondaryKohmMin != null && coil.secondaryKohmMax != null) {
    requirePositive(coil.secondaryKohmMin, `${field}.secondaryKohmMin`);
    requirePositive(coil.secondaryKohmMax, `${field}.secondaryKohmMax`);
    if (coil.secondaryKohmMin > coil.secondaryKohmMax) {
      throw new CompatInputError(`${field}.secondaryKohmMin`, "must not be above the window's max");
    }
  }
}

export function validateEngine(engine: EngineSpec): void {
  requireFinite(engine.compressionRatio, 'engine.compressionRatio');
  requireFinite(engine.rodRatio, 'engine.rodRatio');
  requireFinite(engine.peakBoostKpa, 'engine.peakBoostKpa');
  requirePositive(engine.specGapMm, 'engine.specGapMm');
  requirePositive(engine.dwellMs, 'engine.dwellMs');
  requirePositive(engine.crankingDwellMs, 'engine.crankingDwellMs');
  if (engine.driverCurrentLimitA != null) {
    requirePositive(engine.driverCurrentLimitA, 'engine.driverCurrentLimitA');
  }
}

/** The current limit a coil sees on an engine: its own igniter's, or the engine's external driver's. */
export function driverCurrentLimitA(coil: CoilSpec, engine: EngineSpec): number | null {
  return coil.driver === 'integrated' ? coil.peakCurrentA : (engine.driverCurrentLimitA ?? null);
}

export function analyseCoil(coil: CoilSpec, engine: EngineSpec, settings: CompatSettings): CoilAnalysis {
  const midResistanceOhm = (coil.primaryOhmMin + coil.primaryOhmMax) / 2;
  const inductanceH = mhToH(coil.primaryInductanceMh);
  const currentLimitA = driverCurrentLimitA(coil, engine);
  const crankingDwellS = msToS(engine.crankingDwellMs);
  const runningDwellS = msToS(engine.dwellMs);

  const crankingCircuit: PrimaryCircuit = {
    voltageV: settings.crankingVoltageV,
    resistanceOhm: midResistanceOhm,
    inductanceH,
    currentLimitA,
  };
  const chargingCircuit: PrimaryCircuit = {
    voltageV: settings.chargingVoltageV,
    resistanceOhm: midResistanceOhm,
    inductanceH,
    currentLimitA,
  };

  const crankingCurrentA = primaryCurrentA(crankingCircuit, crankingDwellS);
  const crankingWorstCurrentA = primaryCurrentA(
    {
      voltageV: settings.crankingVoltageV,
      resistanceOhm: coil.primaryOhmMax,
      inductanceH,
      currentLimitA,
    },
    crankingDwellS,
  );
  const runningCurrentA = primaryCurrentA(chargingCircuit, runningDwellS);
  const driverCurrentA = primaryCurrentA(
    {
      voltageV: settings.chargingVoltageV,
      resistanceOhm: coil.primaryOhmMin,
      inductanceH,
      currentLimitA: null,
    },
    runningDwellS,
  );
  const ratedAvailableV = ratedAvailableVoltageV({
    ratedV: coil.availableKv == null ? null : kvToV(coil.availableKv),
    turnsRatio: coil.turnsRatio,
    flybackPeakV: settings.flybackPeakV,
  });

  return {
    midResistanceOhm,
    lowResistanceOhm: coil.primaryOhmMin,
    highResistanceOhm: coil.primaryOhmMax,
    inductanceH,
    currentLimitA,
    crankingCurrentA,
    crankingEnergyJ: storedEnergyJ(inductanceH, crankingCurrentA),
    crankingEnergyWorstJ: storedEnergyJ(inductanceH, crankingWorstCurrentA),
    runningCurrentA,
    ratedAvailableV,
    availableV: availableVoltageV({
      ratedV: ratedAvailableV,
      currentA: runningCurrentA,
      ratedPeakCurrentA: coil.peakCurrentA,
    }),
    driverCurrentA,
    crankingCircuit,
    chargingCircuit,
  };
}

/** The charting curves of §1: i(t) over 0 … 1.5 × dwell at cranking and at charging voltage. */
export function coilCurrentCurves(analysis: CoilAnalysis, engine: EngineSpec): { cranking: CurrentSample[]; charging: CurrentSample[] } {
  return {
    cranking: sampleCurrentCurve(analysis.crankingCircuit, msToS(engine.crankingDwellMs)),
    charging: sampleCurrentCurve(analysis.chargingCircuit, msToS(engine.dwellMs)),
  };
}

/** Adds a coil's available voltage and the reserve to each required load point. */
export function withAvailableVoltage(required: readonly RequiredLoadPoint[], availableV: number): LoadPointResult[] {
  const availableKv = vToKv(availableV);
  // Written out rather than spread: spread-and-extend is a slow path in V8 and ranking calls this per candidate.
  return required.map((point) => ({
    name: point.name,
    mapKpa: point.mapKpa,
    advanceDeg: point.advanceDeg,
    gapMm: point.gapMm,
    requiredKv: point.requiredKv,
    availableKv,
    reservePct: fractionToPct((availableKv - point.requiredKv) / point.requiredKv),
  }));
}

/** The load point with the least reserve. */
export function worstLoadPoint(points: readonly LoadPointResult[]): LoadPointResult {
  let worst = points[0];
  if (worst === undefined) throw new CompatInputError('loadPoints', 'no load points to compare');
  for (const p of points) if (p.reservePct < worst.reservePct) worst = p;
  return worst;
}
