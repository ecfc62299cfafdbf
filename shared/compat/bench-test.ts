import type { CoilSpec } from '../schemas/specs';
import { fractionToPct } from '../units';
import { CompatInputError, requireFinite, requireFiniteDeep } from './errors';
import { compact, fixed, range } from './format';
import { DEFAULT_COMPAT_SETTINGS, type CompatSettings } from './settings';

/** Copper's resistance is quoted at 20 °C; windings are corrected to it before judging. */
export const COPPER_REFERENCE_C = 20;

/**
 * A resistance reading at or above this is no continuity: an open winding, not one out of its
 * window. 40 MΩ is the top of the highest resistance range of a common 4000-count handheld
 * multimeter, which shows "OL" (overload) above it (common practice, from memory); a winding's
 * primary reads about an ohm and its secondary some kilohms, so nothing good comes near it.
 */
export const OPEN_CIRCUIT_OHM = 40e6;

export const BENCH_VERDICTS = ['in-spec', 'out-of-spec', 'short', 'open'] as const;
export type BenchVerdict = (typeof BENCH_VERDICTS)[number];

export type BenchWindow = Pick<CoilSpec, 'primaryOhmMin' | 'primaryOhmMax' | 'secondaryKohmMin' | 'secondaryKohmMax'>;

export interface BenchTestInput {
  /** The meter's primary reading in Ω; null, NaN, Infinity or OPEN_CIRCUIT_OHM and above for no reading / over range (open). */
  primaryOhm: number | null;
  /** The secondary reading in kΩ; leave undefined when not measured, null when the meter reads open. */
  secondaryKohm?: number | null;
  /** Winding temperature at the time of the reading. */
  coilTempC: number;
  window: BenchWindow;
  settings?: CompatSettings;
}

export interface BenchTestResult {
  /** The worse of the primary's and the secondary's verdicts (open, short, out of spec, in spec). */
  verdict: BenchVerdict;
  primaryVerdict: BenchVerdict;
  /** Null when the secondary was not measured or the part states no secondary window. */
  secondaryVerdict: BenchVerdict | null;
  primaryAt20Ohm: number | null;
  secondaryAt20Kohm: number | null;
  window: BenchWindow;
  reason: string;
}

/** R20 = R_T / (1 + α·(T − 20 °C)). */
export function copperResistanceAt20(resistance: number, temperatureC: number, alphaPerK: number): number {
  const factor = 1 + alphaPerK * (temperatureC - COPPER_REFERENCE_C);
  if (!(factor > 0)) throw new CompatInputError('coilTempC', `${temperatureC} °C is below what copper correction allows`);
  return resistance / factor;
}

const isReading = (value: number | null | undefined): value is number => typeof value === 'number' && Number.isFinite(value);

/** Whether a reading in ohms is a continuity reading rather than the meter's overload (open). */
export const isContinuity = (ohm: number | null | undefined): ohm is number => isReading(ohm) && ohm < OPEN_CIRCUIT_OHM;

/** One winding's reading, corrected and judged against its window. */
interface Winding {
  name: 'primary' | 'secondary';
  reading: number | null;
  at20: number | null;
  min: number;
  max: number;
  unit: string;
  decimals: number;
}

function judgeWinding(w: Winding, shortFraction: number): BenchVerdict {
  if (w.at20 === null) return 'open';
  if (w.at20 < w.min * shortFraction) return 'short';
  return w.at20 >= w.min && w.at20 <= w.max ? 'in-spec' : 'out-of-spec';
}

function windingClause(w: Winding, verdict: BenchVerdict, tempC: number, shortFraction: number): string {
  const window = `${range(w.min, w.max, w.decimals)} ${w.unit}`;
  if (w.at20 === null || w.reading === null) {
    return `the ${w.name} gives no reading (open circuit) against its ${window} window`;
  }
  const places = w.decimals + 1;
  // The correction is worth stating only when the winding was read away from 20 °C.
  const figures =
    tempC === COPPER_REFERENCE_C
      ? `the ${w.name} reads ${fixed(w.reading, places)} ${w.unit} at ${COPPER_REFERENCE_C} °C`
      : `the ${w.name} reads ${fixed(w.at20, places)} ${w.unit} at ${COPPER_REFERENCE_C} °C (${fixed(w.reading, places)} ${w.unit} at ${compact(tempC, 1)} °C)`;
  switch (verdict) {
    case 'short':
      return `${figures}, under ${fixed(fractionToPct(shortFraction), 0)} % of its ${window} window's low end, a shorted winding`;
    case 'in-spec':
      return `${figures}, inside its ${window} window`;
    default:
      return `${figures}, outside its ${window} window`;
  }
}

const SEVERITY: Record<BenchVerdict, number> = {
  'in-spec': 0,
  'out-of-spec': 1,
  short: 2,
  open: 3,
};

/** A bench reading corrected to 20 °C and held against the part's windows (compat-model.md §6). */
export function benchTest(input: BenchTestInput): BenchTestResult {
  const settings = input.settings ?? DEFAULT_COMPAT_SETTINGS;
  requireFiniteDeep(settings, 'settings');
  const { window } = input;
  const tempC = requireFinite(input.coilTempC, 'coilTempC');
  requireFinite(window.primaryOhmMin, 'window.primaryOhmMin');
  requireFinite(window.primaryOhmMax, 'window.primaryOhmMax');
  for (const [field, value] of [
    ['primaryOhm', input.primaryOhm],
    ['secondaryKohm', input.secondaryKohm],
  ] as const) {
    if (isReading(value) && value < 0) throw new CompatInputError(field, 'a resistance reading cannot be negative');
  }

  const alpha = settings.copperAlphaPerK;
  const shortFraction = settings.shortFractionOfLow;
  const correct = (reading: number | null): number | null => (reading === null ? null : copperResistanceAt20(reading, tempC, alpha));

  const primaryReading = isContinuity(input.primaryOhm) ? input.primaryOhm : null;
  const primary: Winding = {
    name: 'primary',
    reading: primaryReading,
    at20: correct(primaryReading),
    min: window.primaryOhmMin,
    max: window.primaryOhmMax,
    unit: 'Ω',
    decimals: 2,
  };
  const primaryVerdict = judgeWinding(primary, shortFraction);
  const clauses = [windingClause(primary, primaryVerdict, tempC, shortFraction)];

  // undefined: not measured; null, NaN, Infinity or an overload: the meter read open
  const measuredSecondary = input.secondaryKohm !== undefined;
  const secondaryReading = isReading(input.secondaryKohm) && isContinuity(input.secondaryKohm * 1000) ? input.secondaryKohm : null;
  const secondaryAt20Kohm = measuredSecondary ? correct(secondaryReading) : null;
  let secondaryVerdict: BenchVerdict | null = null;
  if (measuredSecondary) {
    const { secondaryKohmMin: min, secondaryKohmMax: max } = window;
    if (min != null && max != null) {
      const secondary: Winding = {
        name: 'secondary',
        reading: secondaryReading,
        at20: secondaryAt20Kohm,
        min: requireFinite(min, 'window.secondaryKohmMin'),
        max: requireFinite(max, 'window.secondaryKohmMax'),
        unit: 'kΩ',
        decimals: 1,
      };
      secondaryVerdict = judgeWinding(secondary, shortFraction);
      clauses.push(windingClause(secondary, secondaryVerdict, tempC, shortFraction));
    } else {
      clauses.push('the part states no secondary window to hold the secondary reading against');
    }
  }

  const verdict = secondaryVerdict !== null && SEVERITY[secondaryVerdict] > SEVERITY[primaryVerdict] ? secondaryVerdict : primaryVerdict;
  const sentence = clauses.join(', and ');
  return {
    verdict,
    primaryVerdict,
    secondaryVerdict,
    primaryAt20Ohm: primary.at20,
    secondaryAt20Kohm,
    window,
    reason: `${sentence.charAt(0).toUpperCase()}${sentence.slice(1)}.`,
  };
}
