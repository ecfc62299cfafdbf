import { celsiusToKelvin, cmToM, torrToPa } from '../units';

/**
 * Paschen's law: breakdown voltage of a uniform gap as a function of pressure × gap,
 * V = B·pd / (ln(A·pd) − ln(ln(1 + 1/γ))). Constants are kept in SI: A in 1/(Pa·m),
 * B in V/(Pa·m).
 */
export interface PaschenGas {
  aPerPaM: number;
  bVPerPaM: number;
  gamma: number;
}

/** Air, as published per (cm·Torr): A = 15, B = 365 V, γ = 0.01 (compat-model.md §3). */
const TORR_CM_IN_PA_M = torrToPa(1) * cmToM(1);
export const PASCHEN_AIR: PaschenGas = {
  aPerPaM: 15 / TORR_CM_IN_PA_M,
  bVPerPaM: 365 / TORR_CM_IN_PA_M,
  gamma: 0.01,
};

/** Breakdown follows gas density; pressures are referred to 20 °C at the same density. */
export const PASCHEN_REFERENCE_TEMPERATURE_K = celsiusToKelvin(20);

/** The pressure the gas would have at its density and 293.15 K. */
export function densityEquivalentPressurePa(pressurePa: number, temperatureK: number): number {
  return (pressurePa * PASCHEN_REFERENCE_TEMPERATURE_K) / temperatureK;
}

const secondaryEmissionTerm = (gas: PaschenGas): number => Math.log(Math.log(1 + 1 / gas.gamma));

/**
 * Breakdown voltage in volts at p·d (Pa·m). Left of the formula's asymptote (A·pd at or below
 * ln(1 + 1/γ)) no breakdown is predicted and the result is +Infinity.
 */
export function paschenBreakdownV(pdPaM: number, gas: PaschenGas = PASCHEN_AIR): number {
  const denominator = Math.log(gas.aPerPaM * pdPaM) - secondaryEmissionTerm(gas);
  if (!(denominator > 0)) return Number.POSITIVE_INFINITY;
  return (gas.bVPerPaM * pdPaM) / denominator;
}

/** The Paschen minimum: pd = e·ln(1 + 1/γ) / A, V = e·(B/A)·ln(1 + 1/γ). */
export function paschenMinimum(gas: PaschenGas = PASCHEN_AIR): { pdPaM: number; voltageV: number } {
  const k = Math.log(1 + 1 / gas.gamma);
  return { pdPaM: (Math.E * k) / gas.aPerPaM, voltageV: (Math.E * gas.bVPerPaM * k) / gas.aPerPaM };
}
