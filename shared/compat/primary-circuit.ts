import { sToMs } from '../units';
import type { CurrentSample } from './types';

/**
 * The coil's primary as an RL circuit switched onto a DC supply, SI throughout:
 * i(t) = (V/R)(1 − e^(−t·R/L)), capped by the driver's current limit where there is one.
 */
export interface PrimaryCircuit {
  voltageV: number;
  resistanceOhm: number;
  inductanceH: number;
  /** The driver's current limit; null where nothing limits the current but the circuit. */
  currentLimitA: number | null;
}

export function timeConstantS(inductanceH: number, resistanceOhm: number): number {
  return inductanceH / resistanceOhm;
}

export function primaryCurrentA(circuit: PrimaryCircuit, tS: number): number {
  const { voltageV, resistanceOhm, inductanceH, currentLimitA } = circuit;
  const rl = (voltageV / resistanceOhm) * -Math.expm1((-tS * resistanceOhm) / inductanceH);
  return currentLimitA === null ? rl : Math.min(rl, currentLimitA);
}

/** Energy in the primary's field: E = ½·L·i². */
export function storedEnergyJ(inductanceH: number, currentA: number): number {
  return 0.5 * inductanceH * currentA * currentA;
}

/** The voltage an inductor develops when its current changes by ΔI in Δt: L·ΔI/Δt. */
export function inductiveKickV(inductanceH: number, deltaCurrentA: number, deltaTimeS: number): number {
  return (inductanceH * deltaCurrentA) / deltaTimeS;
}

/** Samples on a chart curve: every 2.5 % of the dwell, from 0 to 1.5 × dwell. */
export const CURRENT_CURVE_SAMPLES = 61;

/** i(t) over 0 … 1.5 × dwell for a chart, in ms and A. */
export function sampleCurrentCurve(circuit: PrimaryCircuit, dwellS: number, samples: number = CURRENT_CURVE_SAMPLES): CurrentSample[] {
  const end = 1.5 * dwellS;
  const curve: CurrentSample[] = [];
  for (let k = 0; k < samples; k++) {
    const t = samples === 1 ? 0 : (end * k) / (samples - 1);
    curve.push({ tMs: sToMs(t), amps: primaryCurrentA(circuit, t) });
  }
  return curve;
}

/**
 * The coil's rated available voltage (V): the maker's figure, or where absent the primary's
 * flyback peak stepped up by the turns ratio (ideal transformer, Vs = Vp·Ns/Np).
 */
export function ratedAvailableVoltageV(input: { ratedV: number | null; turnsRatio: number; flybackPeakV: number }): number {
  return input.ratedV ?? input.flybackPeakV * input.turnsRatio;
}

/**
 * Available secondary voltage (V) at a condition: it scales with the primary current
 * interrupted, available = rated × (i reached / rated peak current), capped at rated.
 */
export function availableVoltageV(input: { ratedV: number; currentA: number; ratedPeakCurrentA: number }): number {
  return input.ratedV * Math.min(1, input.currentA / input.ratedPeakCurrentA);
}
