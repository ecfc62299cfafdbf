import type { CoilSpec, EngineSpec, ResolvedPlugSpec } from '../schemas/specs';
import { fractionToPct, pctToFraction } from '../units';
import { analyseCoil, validateCoil, validateEngine, withAvailableVoltage, worstLoadPoint } from './coil-analysis';
import { CompatInputError, requireFinite, requireFiniteDeep, requirePositive } from './errors';
import { compact, fixed } from './format';
import { requiredVoltageAtLoadPoints } from './required-voltage';
import { DEFAULT_COMPAT_SETTINGS, type CompatSettings } from './settings';
import { describeRows, judgeRows, worstVerdict, type Check, type LoadPointResult, type RowRule, type Verdict } from './types';

/** Row ids of the plug table (compat-model.md §5), in the order the table lists them. */
export const PLUG_CHECK_IDS = ['thread', 'seat', 'reach', 'hex', 'heat', 'resistor', 'tip', 'gap', 'voltage-reserve'] as const;
export type PlugCheckId = (typeof PLUG_CHECK_IDS)[number];
export type PlugCheck = Check<PlugCheckId>;

export interface PlugComparisonInput {
  original: ResolvedPlugSpec;
  substitute: ResolvedPlugSpec;
  engine: EngineSpec;
  /** The engine's fitted coil, which supplies the available voltage. */
  coil: CoilSpec;
  settings?: CompatSettings;
}

/** What ranking needs: every row's verdict, the overall verdict and the deviation, no prose. */
export interface PlugJudgement {
  verdict: Verdict;
  rows: Array<{ id: PlugCheckId; verdict: Verdict }>;
  /** Difference of the worst-load-point reserves, as a fraction, for ranking. */
  deviation: number;
}

export interface PlugComparison extends PlugJudgement {
  checks: PlugCheck[];
  /** The fitted coil's available voltage against what the substitute's gap requires. */
  loadPoints: LoadPointResult[];
  /** The same for the original plug. */
  originalLoadPoints: LoadPointResult[];
  /** The gap each plug will run at, before wear: the engine's spec where regappable. */
  setGapMm: { original: number; substitute: number };
}

export interface PlugComparer {
  compare(substitute: ResolvedPlugSpec): PlugComparison;
  /** The same verdicts as `compare`, without reasons or load points: for ranking many. */
  judge(substitute: ResolvedPlugSpec): PlugJudgement;
}

/** Dimensions printed to hundredths of a millimetre count as the same within this. */
const SAME_MM = 0.005;
/** Absorbs binary rounding at a tolerance's edge (19.3 − 19 is 0.3000000000000007). */
const EDGE = 1e-9;
const sameMm = (a: number, b: number): boolean => Math.abs(a - b) < SAME_MM;
const mm = (v: number): string => `${fixed(v, 2)} mm`;
const kv = (v: number): string => `${fixed(v, 1)} kV`;
const pct = (fraction: number): string => `${fixed(fractionToPct(fraction), 0)} %`;
const threadText = (p: ResolvedPlugSpec): string => `M${compact(p.threadMm)}×${compact(p.threadPitchMm)}`;
const resistorText = (p: ResolvedPlugSpec): string =>
  p.resistor ? (p.resistorKohm != null ? `yes, ${compact(p.resistorKohm, 1)} kΩ` : 'yes') : 'no';
const tipText = (p: ResolvedPlugSpec): string => (p.projectedTip ? 'projected' : 'not projected');
const seatText = (p: ResolvedPlugSpec): string => (p.seat === 'flat' ? 'a flat seat with gasket' : 'a taper seat');

export function validatePlug(plug: ResolvedPlugSpec, field: string): void {
  requirePositive(plug.threadMm, `${field}.threadMm`);
  requirePositive(plug.threadPitchMm, `${field}.threadPitchMm`);
  requirePositive(plug.reachMm, `${field}.reachMm`);
  requirePositive(plug.hexMm, `${field}.hexMm`);
  requirePositive(plug.gapMm, `${field}.gapMm`);
  requireFinite(plug.heatStep, `${field}.heatStep`);
  if (plug.resistorKohm != null) requirePositive(plug.resistorKohm, `${field}.resistorKohm`);
  if (!Number.isInteger(plug.heatStep)) throw new CompatInputError(`${field}.heatStep`, 'must be a whole step');
}

/** Everything a plug row is judged on. */
interface PlugContext {
  o: ResolvedPlugSpec;
  s: ResolvedPlugSpec;
  engine: EngineSpec;
  settings: CompatSettings;
  /** The gap the substitute will run at, before wear. */
  sSetGapMm: number;
  /** Each plug at its worst load point with the fitted coil. */
  oWorst: LoadPointResult;
  sWorst: LoadPointResult;
}
type PlugRule = RowRule<PlugCheckId, PlugContext>;

const sameThread = ({ o, s }: PlugContext): boolean => sameMm(o.threadMm, s.threadMm) && sameMm(o.threadPitchMm, s.threadPitchMm);
const reachOffMm = ({ o, s }: PlugContext): number => s.reachMm - o.reachMm;
/** Heat steps run from 1 (hottest) to 15 (coldest): positive means the substitute is colder. */
const heatSteps = ({ o, s }: PlugContext): number => s.heatStep - o.heatStep;
/** Held against the engine's spec, not the original plug: a plug compared with itself may be off. */
const gapOffMm = ({ s, engine }: PlugContext): number => s.gapMm - engine.specGapMm;

type ReserveBasis = 'reserve' | 'as-original' | 'small-reserve' | 'near-original' | 'short';
/** Which clause of the table decides the voltage-reserve row, so the reason can name it. */
function reserveBasis({ oWorst, sWorst, settings }: PlugContext): ReserveBasis {
  const reserve = pctToFraction(sWorst.reservePct);
  if (reserve >= pctToFraction(settings.reserveGoPct)) return 'reserve';
  if (sWorst.requiredKv <= oWorst.requiredKv) return 'as-original';
  if (reserve >= 0) return 'small-reserve';
  return sWorst.requiredKv / oWorst.requiredKv <= settings.requiredReviewRatio ? 'near-original' : 'short';
}

/** The plug table of compat-model.md §5, row by row. */
const PLUG_RULES: readonly PlugRule[] = [
  {
    id: 'thread',
    judge: (ctx) => (sameThread(ctx) ? 'go' : 'no-go'),
    describe: ({ o, s }, verdict) => ({
      original: threadText(o),
      substitute: threadText(s),
      unit: '',
      reason:
        verdict === 'go'
          ? `Both plugs have an ${threadText(o)} thread.`
          : `The substitute's ${threadText(s)} thread does not fit the original's ${threadText(o)} bore.`,
    }),
  },
  {
    id: 'seat',
    judge: ({ o, s }) => (o.seat === s.seat ? 'go' : 'no-go'),
    describe: ({ o, s }, verdict) => ({
      original: o.seat,
      substitute: s.seat,
      unit: '',
      reason:
        verdict === 'go'
          ? `Both plugs have ${seatText(o)}.`
          : `The original has ${seatText(o)} but the substitute ${seatText(s)}, which will not seal in the head.`,
    }),
  },
  {
    id: 'reach',
    judge: (ctx) => (Math.abs(reachOffMm(ctx)) <= ctx.settings.reachToleranceMm + EDGE ? 'go' : 'no-go'),
    describe: (ctx, verdict) => {
      const { o, s, settings } = ctx;
      const off = reachOffMm(ctx);
      return {
        original: o.reachMm,
        substitute: s.reachMm,
        unit: 'mm',
        reason:
          off === 0
            ? `Both plugs have a ${mm(o.reachMm)} reach.`
            : `The substitute's ${mm(s.reachMm)} reach is ${mm(Math.abs(off))} ${off > 0 ? 'longer' : 'shorter'} than the original's ${mm(o.reachMm)}, ${verdict === 'go' ? 'within' : 'outside'} ±${mm(settings.reachToleranceMm)}.`,
      };
    },
  },
  {
    id: 'hex',
    judge: ({ o, s }) => (sameMm(o.hexMm, s.hexMm) ? 'go' : 'review'),
    describe: ({ o, s }, verdict) => ({
      original: o.hexMm,
      substitute: s.hexMm,
      unit: 'mm',
      reason:
        verdict === 'go'
          ? `Both plugs take a ${compact(o.hexMm)} mm socket.`
          : `The substitute takes a ${compact(s.hexMm)} mm socket instead of the original's ${compact(o.hexMm)} mm.`,
    }),
  },
  {
    id: 'heat',
    judge: (ctx) => {
      const n = Math.abs(heatSteps(ctx));
      return n === 0 ? 'go' : n === 1 ? 'review' : 'no-go';
    },
    describe: (ctx) => {
      const { o, s } = ctx;
      const steps = heatSteps(ctx);
      const against = `(${s.heatStep} against ${o.heatStep})`;
      let reason: string;
      if (steps === 0) reason = `Both plugs are heat step ${o.heatStep}.`;
      else if (steps === 1) reason = `The substitute is one heat step colder ${against}, which suits sustained load and boost.`;
      else if (steps === -1) reason = `The substitute is one heat step hotter ${against}, which risks pre-ignition under load.`;
      else
        reason = `The substitute is ${Math.abs(steps)} heat steps ${steps > 0 ? 'colder' : 'hotter'} ${against}, too far from the original's heat range.`;
      return { original: o.heatStep, substitute: s.heatStep, unit: 'heat step', reason };
    },
  },
  {
    id: 'resistor',
    judge: ({ o, s }) => (o.resistor && !s.resistor ? 'no-go' : 'go'),
    describe: ({ o, s }, verdict) => ({
      original: resistorText(o),
      substitute: resistorText(s),
      unit: '',
      reason:
        verdict === 'no-go'
          ? 'The original has a resistor and the substitute does not, which risks radio and engine-electronics interference.'
          : o.resistor === s.resistor
            ? `Both plugs are ${o.resistor ? 'resistor' : 'non-resistor'} types.`
            : 'The substitute adds a resistor the original lacks, which only suppresses interference further.',
    }),
  },
  {
    id: 'tip',
    judge: ({ o, s }) => (!o.projectedTip && s.projectedTip ? 'no-go' : 'go'),
    describe: ({ o, s }, verdict) => ({
      original: tipText(o),
      substitute: tipText(s),
      unit: '',
      reason:
        verdict === 'no-go'
          ? 'The substitute has a projected tip where the original does not, which may strike the piston or valves.'
          : o.projectedTip === s.projectedTip
            ? `Both plugs have ${o.projectedTip ? 'a projected' : 'a non-projected'} tip.`
            : 'The substitute has a non-projected tip, which sits no further into the chamber than the original.',
    }),
  },
  {
    id: 'gap',
    judge: (ctx) => (Math.abs(gapOffMm(ctx)) <= ctx.settings.gapToleranceMm + EDGE ? 'go' : ctx.s.regappable ? 'review' : 'no-go'),
    describe: (ctx, verdict) => {
      const { o, s, engine, settings } = ctx;
      const gapped = `The substitute comes gapped at ${mm(s.gapMm)}`;
      const spec = `the engine's ${mm(engine.specGapMm)} spec`;
      const off = mm(Math.abs(gapOffMm(ctx)));
      const reasons = {
        go: `${gapped}, within ±${mm(settings.gapToleranceMm)} of ${spec}.`,
        review: `${gapped}, ${off} off ${spec}, and may be regapped: set to ${mm(engine.specGapMm)}.`,
        'no-go': `${gapped}, ${off} off ${spec}, and may not be regapped.`,
      };
      return { original: o.gapMm, substitute: s.gapMm, unit: 'mm', reason: reasons[verdict] };
    },
  },
  {
    id: 'voltage-reserve',
    judge: (ctx) => {
      const basis = reserveBasis(ctx);
      return basis === 'reserve' || basis === 'as-original' ? 'go' : basis === 'short' ? 'no-go' : 'review';
    },
    describe: (ctx) => {
      const { oWorst, sWorst, sSetGapMm, settings } = ctx;
      const reserve = pct(pctToFraction(sWorst.reservePct));
      const where = sWorst.name === 'full' ? 'full load' : sWorst.name;
      const needs = `With the fitted coil's ${kv(sWorst.availableKv)} and the substitute set at ${mm(sSetGapMm)} (${mm(sWorst.gapMm)} with wear), ${where} needs ${kv(sWorst.requiredKv)}`;
      const asked = `${fixed(settings.reserveGoPct, 0)} %`;
      const oKv = kv(oWorst.requiredKv);
      const ofOriginal = pct(sWorst.requiredKv / oWorst.requiredKv);
      const reasons: Record<ReserveBasis, string> = {
        reserve: `${needs}, a reserve of ${reserve}, at least the ${asked} asked.`,
        'as-original': `${needs} (reserve ${reserve}), no more than the original's ${oKv}.`,
        'small-reserve': `${needs}, a reserve of ${reserve}, under the ${asked} asked and above the original's ${oKv}.`,
        'near-original': `${needs} (reserve ${reserve}), but that is ${ofOriginal} of the original's ${oKv}, within the ${pct(settings.requiredReviewRatio)} allowed.`,
        short: `${needs} (reserve ${reserve}), ${ofOriginal} of the original's ${oKv}.`,
      };
      return {
        original: oWorst.reservePct,
        substitute: sWorst.reservePct,
        unit: '%',
        reason: reasons[reserveBasis(ctx)],
      };
    },
  },
];

/** The gap a plug will run at: the engine's spec where it may be regapped, since it will be set. */
export function setGapMm(plug: ResolvedPlugSpec, engine: EngineSpec): number {
  return plug.regappable ? engine.specGapMm : plug.gapMm;
}

/** Works out the original plug, the engine and its fitted coil once; compares any substitute. */
export function preparePlugComparison(input: Omit<PlugComparisonInput, 'substitute'>): PlugComparer {
  const settings = input.settings ?? DEFAULT_COMPAT_SETTINGS;
  const { original, engine, coil } = input;
  requireFiniteDeep(settings, 'settings');
  validateEngine(engine);
  validateCoil(coil, 'coil');
  validatePlug(original, 'original');

  const availableV = analyseCoil(coil, engine, settings).availableV;
  const oGap = setGapMm(original, engine);
  const loadPointsAt = (gapMm: number): LoadPointResult[] =>
    withAvailableVoltage(requiredVoltageAtLoadPoints({ engine, gapMm, settings }), availableV);
  const originalLoadPoints = loadPointsAt(oGap);
  const oWorst = worstLoadPoint(originalLoadPoints);

  const judgeSubstitute = (substitute: ResolvedPlugSpec) => {
    validatePlug(substitute, 'substitute');
    const sSetGapMm = setGapMm(substitute, engine);
    const loadPoints = sSetGapMm === oGap ? originalLoadPoints.map((p) => ({ ...p })) : loadPointsAt(sSetGapMm);
    const sWorst = worstLoadPoint(loadPoints);
    const ctx: PlugContext = {
      o: original,
      s: substitute,
      engine,
      settings,
      sSetGapMm,
      oWorst,
      sWorst,
    };
    const rows = judgeRows(PLUG_RULES, ctx);
    const judgement: PlugJudgement = {
      verdict: worstVerdict(rows),
      rows,
      deviation: Math.abs(pctToFraction(sWorst.reservePct) - pctToFraction(oWorst.reservePct)),
    };
    return { ctx, loadPoints, judgement };
  };

  return {
    judge: (substitute) => judgeSubstitute(substitute).judgement,
    compare(substitute) {
      const { ctx, loadPoints, judgement } = judgeSubstitute(substitute);
      return {
        verdict: judgement.verdict,
        rows: judgement.rows,
        deviation: judgement.deviation,
        checks: describeRows(PLUG_RULES, ctx, judgement.rows),
        loadPoints,
        originalLoadPoints: originalLoadPoints.map((p) => ({ ...p })),
        setGapMm: { original: oGap, substitute: ctx.sSetGapMm },
      };
    },
  };
}

/** Compares a substitute plug with the original on an engine and its fitted coil (§3, §5). */
export function comparePlugs(input: PlugComparisonInput): PlugComparison {
  return preparePlugComparison(input).compare(input.substitute);
}
