/**
 * The gas in the cylinder at the spark: volume by the slider-crank relation, pressure and
 * temperature by polytropic compression from bottom dead centre. SI throughout.
 */

/**
 * Cylinder volume over clearance volume, V/Vc, at crank angle θ before top dead centre:
 * V/Vc = 1 + ½(r − 1)(R + 1 − cos θ − √(R² − sin²θ)), R = connecting rod / crank radius.
 */
export function volumeRatioAtCrankAngle(compressionRatio: number, rodRatio: number, crankAngleRad: number): number {
  const sin = Math.sin(crankAngleRad);
  const piston = rodRatio + 1 - Math.cos(crankAngleRad) - Math.sqrt(rodRatio * rodRatio - sin * sin);
  return 1 + 0.5 * (compressionRatio - 1) * piston;
}

export interface GasState {
  pressurePa: number;
  temperatureK: number;
}

/**
 * Polytropic compression by a volume ratio V_start / V_end:
 * p = p₀·ratio^n, T = T₀·ratio^(n−1).
 */
export function polytropicCompression(start: GasState, volumeRatio: number, n: number): GasState {
  return {
    pressurePa: start.pressurePa * Math.pow(volumeRatio, n),
    temperatureK: start.temperatureK * Math.pow(volumeRatio, n - 1),
  };
}

/** Gas state at a spark θ before TDC, compressed from intake conditions at BDC (V_bdc = r·Vc). */
export function gasStateAtSpark(input: {
  compressionRatio: number;
  rodRatio: number;
  advanceRad: number;
  intake: GasState;
  polytropicN: number;
}): GasState {
  const vOverVc = volumeRatioAtCrankAngle(input.compressionRatio, input.rodRatio, input.advanceRad);
  return polytropicCompression(input.intake, input.compressionRatio / vOverVc, input.polytropicN);
}
