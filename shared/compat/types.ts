/** The verdict every check row and every comparison carries, best first. */
export const VERDICTS = ['go', 'review', 'no-go'] as const;
export type Verdict = (typeof VERDICTS)[number];

/** One row of a comparison table: the numbers on both sides and one sentence of reason. */
export interface Check<Id extends string = string> {
  id: Id;
  verdict: Verdict;
  original: number | string | null;
  substitute: number | string | null;
  unit: string;
  reason: string;
}

export const LOAD_POINT_NAMES = ['idle', 'cruise', 'full', 'boost'] as const;
export type LoadPointName = (typeof LOAD_POINT_NAMES)[number];

/** Required against available secondary voltage at one engine load point, in trade units. */
export interface LoadPointResult {
  name: LoadPointName;
  mapKpa: number;
  advanceDeg: number;
  /** The effective gap: the gap the plug is set to plus the wear allowance. */
  gapMm: number;
  requiredKv: number;
  availableKv: number;
  /** (available − required) / required, in percent. */
  reservePct: number;
}

/** One point of a primary-current chart. */
export interface CurrentSample {
  tMs: number;
  amps: number;
}

const VERDICT_RANK: Record<Verdict, number> = { go: 0, review: 1, 'no-go': 2 };

/** 0 for go, 1 for review, 2 for no-go: the order the ranking sorts by. */
export function verdictRank(verdict: Verdict): number {
  return VERDICT_RANK[verdict];
}

/** The worst verdict of a list of verdicts or rows (the overall verdict is the worst row); `go` when empty. */
export function worstVerdict(verdicts: ReadonlyArray<Verdict | { verdict: Verdict }>): Verdict {
  let worst: Verdict = 'go';
  for (const item of verdicts) {
    const v = typeof item === 'string' ? item : item.verdict;
    if (VERDICT_RANK[v] > VERDICT_RANK[worst]) worst = v;
  }
  return worst;
}

/** A row's text: the figures on both sides and one sentence of reason. */
export type RowText = Omit<Check, 'id' | 'verdict'>;

/**
 * One row of a check table as a rule: how it is judged and how it is described. Judging must be
 * cheap (ranking judges thousands of alternates and shows a few); describing writes the prose
 * only for rows that are shown, and is handed the verdict judging gave.
 */
export interface RowRule<Id extends string, Context> {
  id: Id;
  judge: (ctx: Context) => Verdict;
  describe: (ctx: Context, verdict: Verdict) => RowText;
}

/** Every row's verdict, in the rules' order. */
export function judgeRows<Id extends string, Context>(
  rules: readonly RowRule<Id, Context>[],
  ctx: Context,
): Array<{ id: Id; verdict: Verdict }> {
  const rows = new Array<{ id: Id; verdict: Verdict }>(rules.length);
  for (let k = 0; k < rules.length; k++) {
    const rule = rules[k]!;
    rows[k] = { id: rule.id, verdict: rule.judge(ctx) };
  }
  return rows;
}

/** The table rows for judged rows. Written out field by field: spread-and-extend is slow in V8. */
export function describeRows<Id extends string, Context>(
  rules: readonly RowRule<Id, Context>[],
  ctx: Context,
  rows: ReadonlyArray<{ id: Id; verdict: Verdict }>,
): Check<Id>[] {
  return rules.map((rule, k) => {
    const verdict = rows[k]!.verdict;
    const text = rule.describe(ctx, verdict);
    return {
      id: rule.id,
      verdict,
      original: text.original,
      substitute: text.substitute,
      unit: text.unit,
      reason: text.reason,
    };
  });
}
