import type { EngineSpec } from '../schemas/specs';
import { degToRad, kpaToPa, mmToM, vToKv } from '../units';
import { gasStateAtSpark } from './cylinder-gas';
import { CompatInputError, requireFinite, requirePositive } from './errors';
import { densityEquivalentPressurePa, paschenBreakdownV, paschenMinimum } from './paschen';
import type { CompatSettings } from './settings';
import type { LoadPointName, LoadPointResult } from './types';

/** A load point's conditions, in trade units as settings hold them. */
export interface LoadPointCondition {
  name: LoadPointName;
  mapKpa: number;
  advanceDeg: number;
  tempK: number;
}

export type RequiredLoadPoint = Omit<LoadPointResult, 'availableKv' | 'reservePct'>;

/** True where the engine is charged above atmosphere and so gets a boost load point. */
export function engineHasBoost(engine: Pick<EngineSpec, 'aspiration' | 'peakBoostKpa'>): boolean {
  return engine.aspiration !== 'natural' && engine.peakBoostKpa > 0;
}

/** Idle, cruise and full load always; boost (full-load MAP + peak boost) only where boosted. */
export function loadPointConditions(
  engine: Pick<EngineSpec, 'aspiration' | 'peakBoostKpa'>,
  settings: CompatSettings,
): LoadPointCondition[] {
  const { idle, cruise, full, boost } = settings.loadPoints;
  const points: LoadPointCondition[] = [
    { name: 'idle', ...idle },
    { name: 'cruise', ...cruise },
    { name: 'full', ...full },
  ];
  if (engineHasBoost(engine)) {
    points.push({
      name: 'boost',
      mapKpa: full.mapKpa + engine.peakBoostKpa + boost.mapKpaAboveFull,
      advanceDeg: boost.advanceDeg,
      tempK: boost.tempK,
    });
  }
  return points;
}

const PASCHEN_MIN_PD_PA_M = paschenMinimum().pdPaM;

/**
 * Required secondary voltage (V) across a gap of gapM metres in the cylinder gas at the spark.
 * Throws where p·d falls left of the Paschen minimum: the formula does not hold there, and no
 * plug gap in a running engine gets near it.
 */
export function requiredVoltageV(input: {
  compressionRatio: number;
  rodRatio: number;
  intakePressurePa: number;
  intakeTemperatureK: number;
  advanceRad: number;
  gapM: number;
  polytropicN: number;
}): number {
  const gas = gasStateAtSpark({
    compressionRatio: input.compressionRatio,
    rodRatio: input.rodRatio,
    advanceRad: input.advanceRad,
    intake: { pressurePa: input.intakePressurePa, temperatureK: input.intakeTemperatureK },
    polytropicN: input.polytropicN,
  });
  const pd = densityEquivalentPressurePa(gas.pressurePa, gas.temperatureK) * input.gapM;
  if (!(pd >= PASCHEN_MIN_PD_PA_M)) {
    throw new CompatInputError('gapMm', 'gap too small for Paschen’s law at this cylinder pressure');
  }
  return paschenBreakdownV(pd);
}

/**
 * Required kV at each load point. The gap is the plug's set gap (the engine's spec gap when none
 * is given) plus the wear allowance.
 */
export function requiredVoltageAtLoadPoints(input: {
  engine: Pick<EngineSpec, 'compressionRatio' | 'rodRatio' | 'aspiration' | 'peakBoostKpa' | 'specGapMm'>;
  gapMm?: number;
  settings: CompatSettings;
}): RequiredLoadPoint[] {
  const { engine, settings } = input;
  requireFinite(engine.compressionRatio, 'engine.compressionRatio');
  if (!(engine.compressionRatio > 1)) {
    throw new CompatInputError('engine.compressionRatio', 'must be above 1');
  }
  requireFinite(engine.rodRatio, 'engine.rodRatio');
  if (!(engine.rodRatio > 1)) throw new CompatInputError('engine.rodRatio', 'must be above 1');
  requireFinite(engine.peakBoostKpa, 'engine.peakBoostKpa');
  const setGapMm = requirePositive(input.gapMm ?? engine.specGapMm, input.gapMm === undefined ? 'engine.specGapMm' : 'gapMm');
  const gapMm = setGapMm + settings.wearAllowanceMm;

  return loadPointConditions(engine, settings).map((point) => ({
    name: point.name,
    mapKpa: point.mapKpa,
    advanceDeg: point.advanceDeg,
    gapMm,
    requiredKv: vToKv(
      requiredVoltageV({
        compressionRatio: engine.compressionRatio,
        rodRatio: engine.rodRatio,
        intakePressurePa: kpaToPa(point.mapKpa),
        intakeTemperatureK: point.tempK,
        advanceRad: degToRad(point.advanceDeg),
        gapM: mmToM(gapMm),
        polytropicN: settings.polytropicN,
      }),
    ),
  }));
}
