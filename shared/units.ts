/**
 * The one place every unit conversion is written. Specs and settings are kept in the units the
 * trade prints (mm, mH, ms, kPa, kV, kΩ, °C, %); the compatibility model works in SI
 * (m, H, s, Pa, V, Ω, K, rad) and converts at its edge with these functions, never inline.
 */

/** Pascals in one torr: a standard atmosphere is 101 325 Pa and 760 Torr by definition. */
export const PA_PER_TORR = 101_325 / 760;
export const PA_PER_KPA = 1_000;
export const PA_PER_BAR = 100_000;
/** 0 °C on the kelvin scale. */
export const KELVIN_AT_ZERO_CELSIUS = 273.15;

// Length
export const mmToM = (mm: number): number => mm / 1_000;
export const mToMm = (m: number): number => m * 1_000;
export const cmToM = (cm: number): number => cm / 100;
export const mToCm = (m: number): number => m * 100;

// Inductance
export const mhToH = (mh: number): number => mh / 1_000;
export const hToMh = (h: number): number => h * 1_000;

// Time
export const msToS = (ms: number): number => ms / 1_000;
export const sToMs = (s: number): number => s * 1_000;
export const usToS = (us: number): number => us / 1_000_000;
export const sToUs = (s: number): number => s * 1_000_000;

// Pressure
export const kpaToPa = (kpa: number): number => kpa * PA_PER_KPA;
export const paToKpa = (pa: number): number => pa / PA_PER_KPA;
export const barToPa = (bar: number): number => bar * PA_PER_BAR;
export const paToBar = (pa: number): number => pa / PA_PER_BAR;
export const torrToPa = (torr: number): number => torr * PA_PER_TORR;
export const paToTorr = (pa: number): number => pa / PA_PER_TORR;

// Voltage, resistance, energy
export const kvToV = (kv: number): number => kv * 1_000;
export const vToKv = (v: number): number => v / 1_000;
export const kohmToOhm = (kohm: number): number => kohm * 1_000;
export const ohmToKohm = (ohm: number): number => ohm / 1_000;
export const mjToJ = (mj: number): number => mj / 1_000;
export const jToMj = (j: number): number => j * 1_000;

// Temperature
export const celsiusToKelvin = (c: number): number => c + KELVIN_AT_ZERO_CELSIUS;
export const kelvinToCelsius = (k: number): number => k - KELVIN_AT_ZERO_CELSIUS;

// Angle
export const degToRad = (deg: number): number => (deg * Math.PI) / 180;
export const radToDeg = (rad: number): number => (rad * 180) / Math.PI;

// Ratios: settings hold percentages, the model works in fractions
export const pctToFraction = (pct: number): number => pct / 100;
export const fractionToPct = (fraction: number): number => fraction * 100;
