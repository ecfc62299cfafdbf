import type { CoilSpec, EngineSpec } from '../schemas/specs';
import { fractionToPct, jToMj, pctToFraction, vToKv } from '../units';
import {
  analyseCoil,
  coilCurrentCurves,
  validateCoil,
  validateEngine,
  withAvailableVoltage,
  worstLoadPoint,
  type CoilAnalysis,
} from './coil-analysis';
import { requireFiniteDeep } from './errors';
import { compact, fixed, range } from './format';
import { requiredVoltageAtLoadPoints } from './required-voltage';
import { DEFAULT_COMPAT_SETTINGS, type CompatSettings } from './settings';
import {
  describeRows,
  judgeRows,
  worstVerdict,
  type Check,
  type CurrentSample,
  type LoadPointResult,
  type RowRule,
  type Verdict,
} from './types';

/** Row ids of the coil table (compat-model.md §4), in the order the table lists them. */
export const COIL_CHECK_IDS = [
  'driver',
  'connector',
  'mounting',
  'primary-window',
  'driver-current',
  'energy-cranking',
  'voltage-reserve',
  'secondary-window',
  'turns-ratio',
] as const;
export type CoilCheckId = (typeof COIL_CHECK_IDS)[number];
export type CoilCheck = Check<CoilCheckId>;

export interface CoilComparisonInput {
  original: CoilSpec;
  substitute: CoilSpec;
  engine: EngineSpec;
  settings?: CompatSettings;
}

export interface CoilComparisonOptions {
  /** Sample the chart curves (default true). */
  curves?: boolean;
}

/** What ranking needs: every row's verdict, the overall verdict and the deviation, no prose. */
export interface CoilJudgement {
  verdict: Verdict;
  rows: Array<{ id: CoilCheckId; verdict: Verdict }>;
  /**
   * How far the substitute strays from the original, for ranking: |E_S/E_O − 1| plus the
   * difference of the worst-load-point reserves, both as fractions.
   */
  deviation: number;
}

export interface CoilComparison extends CoilJudgement {
  checks: CoilCheck[];
  /** The substitute's available voltage against the required voltage at each load point. */
  loadPoints: LoadPointResult[];
  /** The same for the original, so a chart can show both. */
  originalLoadPoints: LoadPointResult[];
  /**
   * Primary current i(t) over 0 … 1.5 × running dwell at charging voltage and the window's mid
   * resistance: the API's `currents` shape. Empty arrays when curves are skipped.
   */
  currents: { original: CurrentSample[]; substitute: CurrentSample[] };
  /** The same over 0 … 1.5 × cranking dwell at cranking voltage. */
  crankingCurrents: { original: CurrentSample[]; substitute: CurrentSample[] };
  /** Stored energy at cranking, mid resistance (the energy-cranking row's figures), in mJ. */
  energyMj: { original: number; substitute: number };
  /** Stored energy at cranking at the window's high end, the worst case, in mJ. */
  energyWorstMj: { original: number; substitute: number };
}

/** Compares substitutes against one original on one engine; the original's side is worked out once. */
export interface CoilComparer {
  compare(substitute: CoilSpec, options?: CoilComparisonOptions): CoilComparison;
  /** The same verdicts as `compare`, without reasons, load points or curves: for ranking many. */
  judge(substitute: CoilSpec): CoilJudgement;
}

const DRIVER_WORDS = {
  integrated: 'an integrated igniter',
  external: 'an external driver',
} as const;
const ARCHITECTURE_WORDS = {
  'coil-on-plug': 'a coil-on-plug',
  pencil: 'a pencil coil',
  'coil-pack': 'a coil pack',
  canister: 'a canister coil',
} as const;
const ARCHITECTURE_PLURALS = {
  'coil-on-plug': 'coil-on-plug coils',
  pencil: 'pencil coils',
  'coil-pack': 'coil packs',
  canister: 'canister coils',
} as const;

const outputsText = (n: number): string => `${n} output${n === 1 ? '' : 's'}`;
const pinsText = (coil: CoilSpec): string => `${coil.connectorPins} pins with key ${coil.connectorKey.trim()}`;
const mountingText = (c: CoilSpec): string => `${c.architecture}, ${outputsText(c.outputs)}`;
const ohms = (v: number): string => `${fixed(v, 2)} Ω`;
const amps = (v: number): string => `${fixed(v, 1)} A`;
const kv = (v: number): string => `${fixed(v, 1)} kV`;
const pct = (fraction: number): string => `${fixed(fractionToPct(fraction), 0)} %`;
const secondaryWindow = (c: CoilSpec): [number, number] | null =>
  c.secondaryKohmMin != null && c.secondaryKohmMax != null ? [c.secondaryKohmMin, c.secondaryKohmMax] : null;
const kohmWindowText = (w: [number, number]): string => `${range(w[0], w[1], 1)} kΩ`;
const loadPointWords = (p: LoadPointResult): string => (p.name === 'full' ? 'full load' : p.name);

/** Everything a coil row is judged on. */
interface CoilContext {
  o: CoilSpec;
  s: CoilSpec;
  oa: CoilAnalysis;
  sa: CoilAnalysis;
  engine: EngineSpec;
  settings: CompatSettings;
  /** Each coil at its worst load point: the one needing the most voltage. */
  oWorst: LoadPointResult;
  sWorst: LoadPointResult;
}
type CoilRule = RowRule<CoilCheckId, CoilContext>;

const sameConnector = ({ o, s }: CoilContext): boolean =>
  o.connectorPins === s.connectorPins && o.connectorKey.trim().toUpperCase() === s.connectorKey.trim().toUpperCase();
const sameMounting = ({ o, s }: CoilContext): boolean => o.architecture === s.architecture && o.outputs === s.outputs;

// "Widened by 10 %": each end of the original's window moves outward by 10 % of its own value.
const widenedLow = ({ o, settings }: CoilContext): number => o.primaryOhmMin * (1 - pctToFraction(settings.primaryWindowWidenPct));
const widenedHigh = ({ o, settings }: CoilContext): number => o.primaryOhmMax * (1 + pctToFraction(settings.primaryWindowWidenPct));

/** The driver-current row applies to an externally driven substitute on an engine that states a limit. */
const driverLimitA = ({ s, engine }: CoilContext): number | null => (s.driver === 'external' ? (engine.driverCurrentLimitA ?? null) : null);
/** Held to the larger of the engine's limit and what the original itself draws. */
const allowedCurrentA = (ctx: CoilContext, limit: number): number => Math.max(limit, ctx.oa.driverCurrentA);

const energyRatio = ({ oa, sa }: CoilContext): number => sa.crankingEnergyJ / oa.crankingEnergyJ;

type ReserveBasis = 'reserve' | 'as-original' | 'small-reserve' | 'near-original' | 'short';
/** Which clause of the table decides the voltage-reserve row, so the reason can name it. */
function reserveBasis({ oa, sa, sWorst, settings }: CoilContext): ReserveBasis {
  const reserve = pctToFraction(sWorst.reservePct);
  if (reserve >= pctToFraction(settings.reserveGoPct)) return 'reserve';
  if (sa.availableV >= oa.availableV) return 'as-original';
  if (reserve >= 0) return 'small-reserve';
  return sa.availableV / oa.availableV >= settings.availableReviewRatio ? 'near-original' : 'short';
}

const turnsRatioOff = ({ o, s }: CoilContext): number => s.turnsRatio / o.turnsRatio - 1;

/** The coil table of compat-model.md §4, row by row. */
const COIL_RULES: readonly CoilRule[] = [
  {
    id: 'driver',
    judge: ({ o, s }) => (o.driver === s.driver ? 'go' : 'no-go'),
    describe: ({ o, s }, verdict) => ({
      original: o.driver,
      substitute: s.driver,
      unit: '',
      reason:
        verdict === 'go'
          ? `Both coils use ${DRIVER_WORDS[o.driver]}.`
          : `The original uses ${DRIVER_WORDS[o.driver]} but the substitute ${DRIVER_WORDS[s.driver]}, which the engine's wiring does not drive.`,
    }),
  },
  {
    id: 'connector',
    judge: (ctx) => (sameConnector(ctx) ? 'go' : 'no-go'),
    describe: ({ o, s }, verdict) => ({
      original: pinsText(o),
      substitute: pinsText(s),
      unit: '',
      reason:
        verdict === 'go'
          ? `Both connectors have ${pinsText(o)}.`
          : `The original's connector has ${pinsText(o)} but the substitute's has ${pinsText(s)}.`,
    }),
  },
  {
    id: 'mounting',
    judge: (ctx) => (sameMounting(ctx) ? 'go' : 'no-go'),
    describe: ({ o, s }, verdict) => ({
      original: mountingText(o),
      substitute: mountingText(s),
      unit: '',
      reason:
        verdict === 'go'
          ? `Both are ${ARCHITECTURE_PLURALS[o.architecture]} with ${outputsText(o.outputs)}.`
          : `The original is ${ARCHITECTURE_WORDS[o.architecture]} with ${outputsText(o.outputs)} but the substitute is ${ARCHITECTURE_WORDS[s.architecture]} with ${outputsText(s.outputs)}.`,
    }),
  },
  {
    id: 'primary-window',
    judge: (ctx) => {
      const { o, s } = ctx;
      if (s.primaryOhmMin >= widenedLow(ctx) && s.primaryOhmMax <= widenedHigh(ctx)) return 'go';
      return s.primaryOhmMin <= o.primaryOhmMax && s.primaryOhmMax >= o.primaryOhmMin ? 'review' : 'no-go';
    },
    describe: (ctx, verdict) => {
      const { o, s, settings } = ctx;
      const sText = `${range(s.primaryOhmMin, s.primaryOhmMax, 2)} Ω`;
      const oText = `${range(o.primaryOhmMin, o.primaryOhmMax, 2)} Ω`;
      const widened = `${fixed(settings.primaryWindowWidenPct, 0)} % (${range(widenedLow(ctx), widenedHigh(ctx), 2)} Ω)`;
      const reasons = {
        go: `The substitute's ${sText} primary window lies inside the original's ${oText} widened by ${widened}.`,
        review: `The substitute's ${sText} primary window overlaps the original's ${oText} but reaches outside it widened by ${widened}.`,
        'no-go': `The substitute's ${sText} primary window does not overlap the original's ${oText}.`,
      };
      return {
        original: range(o.primaryOhmMin, o.primaryOhmMax, 2),
        substitute: range(s.primaryOhmMin, s.primaryOhmMax, 2),
        unit: 'Ω',
        reason: reasons[verdict],
      };
    },
  },
  {
    id: 'driver-current',
    judge: (ctx) => {
      const limit = driverLimitA(ctx);
      if (limit === null) return 'go';
      const over = ctx.sa.driverCurrentA / allowedCurrentA(ctx, limit) - 1;
      return over <= 0 ? 'go' : over <= pctToFraction(ctx.settings.driverCurrentReviewPct) ? 'review' : 'no-go';
    },
    describe: (ctx, verdict) => {
      const { oa, sa, s, engine, settings } = ctx;
      const limit = driverLimitA(ctx);
      if (limit === null) {
        return {
          original: null,
          substitute: null,
          unit: 'A',
          reason:
            s.driver !== 'external'
              ? 'Not applicable: the substitute has an integrated igniter, which limits its own primary current.'
              : 'Not applicable: the engine states no driver current limit to hold the substitute to.',
        };
      }
      const allowed = allowedCurrentA(ctx, limit);
      const draws = `At ${fixed(settings.chargingVoltageV, 1)} V and ${fixed(engine.dwellMs, 1)} ms dwell on its lowest primary resistance (${ohms(sa.lowResistanceOhm)}) the substitute draws ${amps(sa.driverCurrentA)}`;
      const allowedText = `${amps(allowed)} allowed (the larger of the engine's ${amps(limit)} driver limit and the original's ${amps(oa.driverCurrentA)})`;
      return {
        original: oa.driverCurrentA,
        substitute: sa.driverCurrentA,
        unit: 'A',
        reason:
          verdict === 'go'
            ? `${draws}, within the ${allowedText}.`
            : `${draws}, ${pct(sa.driverCurrentA / allowed - 1)} above the ${allowedText}, ${verdict === 'review' ? 'within' : 'beyond'} the ${fixed(settings.driverCurrentReviewPct, 0)} % review margin.`,
      };
    },
  },
  {
    id: 'energy-cranking',
    judge: (ctx) => {
      const ratio = energyRatio(ctx);
      return ratio >= ctx.settings.energyGoRatio ? 'go' : ratio >= ctx.settings.energyReviewRatio ? 'review' : 'no-go';
    },
    describe: (ctx, verdict) => {
      const { oa, sa, engine, settings } = ctx;
      const oMj = jToMj(oa.crankingEnergyJ);
      const sMj = jToMj(sa.crankingEnergyJ);
      const goText = pct(settings.energyGoRatio);
      const reviewText = pct(settings.energyReviewRatio);
      const tails = {
        go: `at least the ${goText} asked`,
        review: `below ${goText} but at least ${reviewText}`,
        'no-go': `below the ${reviewText} floor`,
      };
      return {
        original: oMj,
        substitute: sMj,
        unit: 'mJ',
        reason: `At ${fixed(settings.crankingVoltageV, 1)} V cranking with ${fixed(engine.crankingDwellMs, 1)} ms dwell the substitute stores ${fixed(sMj, 1)} mJ against the original's ${fixed(oMj, 1)} mJ (${pct(energyRatio(ctx))}), ${tails[verdict]}.`,
      };
    },
  },
  {
    id: 'voltage-reserve',
    judge: (ctx) => {
      const basis = reserveBasis(ctx);
      return basis === 'reserve' || basis === 'as-original' ? 'go' : basis === 'short' ? 'no-go' : 'review';
    },
    describe: (ctx) => {
      const { oa, sa, oWorst, sWorst, settings } = ctx;
      const reserve = pct(pctToFraction(sWorst.reservePct));
      const against = `The substitute makes ${kv(vToKv(sa.availableV))} against ${kv(sWorst.requiredKv)} required at ${loadPointWords(sWorst)}`;
      const oKv = kv(vToKv(oa.availableV));
      const asked = `${fixed(settings.reserveGoPct, 0)} %`;
      const ofOriginal = pct(sa.availableV / oa.availableV);
      const reasons: Record<ReserveBasis, string> = {
        reserve: `${against}, a reserve of ${reserve}, at least the ${asked} asked.`,
        'as-original': `${against} (reserve ${reserve}), as much as the original's ${oKv}, the floor the maker's own choice sets.`,
        'small-reserve': `${against}, a reserve of ${reserve}, under the ${asked} asked and less than the original's ${oKv}.`,
        'near-original': `${against} (reserve ${reserve}), but that is ${ofOriginal} of the original's ${oKv}, at least the ${pct(settings.availableReviewRatio)} asked.`,
        short: `${against} (reserve ${reserve}), and only ${ofOriginal} of the original's ${oKv}.`,
      };
      return {
        original: oWorst.reservePct,
        substitute: sWorst.reservePct,
        unit: '%',
        reason: reasons[reserveBasis(ctx)],
      };
    },
  },
  {
    id: 'secondary-window',
    // Both absent: nothing to hold against. One absent is not in the table: review, a bench reading decides.
    judge: ({ o, s }) => {
      const ow = secondaryWindow(o);
      const sw = secondaryWindow(s);
      if (ow === null && sw === null) return 'go';
      return ow !== null && sw !== null && sw[0] <= ow[1] && sw[1] >= ow[0] ? 'go' : 'review';
    },
    describe: ({ o, s }, verdict) => {
      const ow = secondaryWindow(o);
      const sw = secondaryWindow(s);
      let reason: string;
      if (ow === null && sw === null) {
        reason = 'Neither coil states a secondary resistance window, so there is nothing to hold against.';
      } else if (ow === null || sw === null) {
        const [who, w] = ow !== null ? ['original', ow] : ['substitute', sw as [number, number]];
        reason = `Only the ${who} states a secondary window (${kohmWindowText(w)}), so the two cannot be compared without a bench reading.`;
      } else {
        reason = `The substitute's ${kohmWindowText(sw)} secondary window ${verdict === 'go' ? 'overlaps' : 'does not overlap'} the original's ${kohmWindowText(ow)}.`;
      }
      return {
        original: ow ? range(ow[0], ow[1], 1) : null,
        substitute: sw ? range(sw[0], sw[1], 1) : null,
        unit: 'kΩ',
        reason,
      };
    },
  },
  {
    id: 'turns-ratio',
    judge: (ctx) => (Math.abs(turnsRatioOff(ctx)) <= pctToFraction(ctx.settings.turnsRatioTolerancePct) ? 'go' : 'review'),
    describe: (ctx, verdict) => {
      const { o, s, settings } = ctx;
      const off = turnsRatioOff(ctx);
      return {
        original: o.turnsRatio,
        substitute: s.turnsRatio,
        unit: ':1',
        reason:
          off === 0
            ? `The substitute's ${compact(s.turnsRatio, 1)}:1 turns ratio matches the original's.`
            : `The substitute's ${compact(s.turnsRatio, 1)}:1 turns ratio is ${pct(Math.abs(off))} ${off > 0 ? 'above' : 'below'} the original's ${compact(o.turnsRatio, 1)}:1, ${verdict === 'go' ? 'within' : 'outside'} ±${fixed(settings.turnsRatioTolerancePct, 0)} %.`,
      };
    },
  },
];

/**
 * Works out the original and the engine once and returns a comparer for any substitute.
 * `compare` and `judge` use the same rules, so their verdicts cannot drift apart.
 */
export function prepareCoilComparison(input: Omit<CoilComparisonInput, 'substitute'>): CoilComparer {
  const settings = input.settings ?? DEFAULT_COMPAT_SETTINGS;
  const { original, engine } = input;
  requireFiniteDeep(settings, 'settings');
  validateEngine(engine);
  validateCoil(original, 'original');

  const required = requiredVoltageAtLoadPoints({ engine, settings });
  const oa = analyseCoil(original, engine, settings);
  const originalLoadPoints = withAvailableVoltage(required, oa.availableV);
  const oWorst = worstLoadPoint(originalLoadPoints);
  // A coil's available voltage is the same at every load point, so its worst point is always the
  // one that needs the most; judging works that one point out instead of all of them.
  const hardest = required.filter((r) => r.name === oWorst.name);

  const judgeSubstitute = (substitute: CoilSpec) => {
    validateCoil(substitute, 'substitute');
    const sa = analyseCoil(substitute, engine, settings);
    const sWorst = withAvailableVoltage(hardest, sa.availableV)[0]!;
    const ctx: CoilContext = {
      o: original,
      s: substitute,
      oa,
      sa,
      engine,
      settings,
      oWorst,
      sWorst,
    };
    const rows = judgeRows(COIL_RULES, ctx);
    const judgement: CoilJudgement = {
      verdict: worstVerdict(rows),
      rows,
      deviation: Math.abs(energyRatio(ctx) - 1) + Math.abs(pctToFraction(sWorst.reservePct) - pctToFraction(oWorst.reservePct)),
    };
    return { ctx, judgement };
  };

  return {
    judge: (substitute) => judgeSubstitute(substitute).judgement,
    compare(substitute, options = {}) {
      const { ctx, judgement } = judgeSubstitute(substitute);
      const { sa } = ctx;
      const curves = options.curves ?? true;
      const oCurves = curves ? coilCurrentCurves(oa, engine) : { cranking: [], charging: [] };
      const sCurves = curves ? coilCurrentCurves(sa, engine) : { cranking: [], charging: [] };
      return {
        verdict: judgement.verdict,
        rows: judgement.rows,
        deviation: judgement.deviation,
        checks: describeRows(COIL_RULES, ctx, judgement.rows),
        loadPoints: withAvailableVoltage(required, sa.availableV),
        // a copy per result, so one caller's edits cannot reach another's
        originalLoadPoints: originalLoadPoints.map((p) => ({ ...p })),
        currents: { original: oCurves.charging, substitute: sCurves.charging },
        crankingCurrents: { original: oCurves.cranking, substitute: sCurves.cranking },
        energyMj: { original: jToMj(oa.crankingEnergyJ), substitute: jToMj(sa.crankingEnergyJ) },
        energyWorstMj: {
          original: jToMj(oa.crankingEnergyWorstJ),
          substitute: jToMj(sa.crankingEnergyWorstJ),
        },
      };
    },
  };
}

/** Compares a substitute coil with the original on an engine (compat-model.md §1, §2, §4). */
export function compareCoils(input: CoilComparisonInput, options: CoilComparisonOptions = {}): CoilComparison {
  return prepareCoilComparison(input).compare(input.substitute, options);
}
