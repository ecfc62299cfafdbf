import { createBrandBodySchema, type CreateBrandBody } from '@shared/schemas/brands';
import { HEAT_STEP_MAX, HEAT_STEP_MIN } from '@shared/schemas/specs';

/**
 * A brand's heat table as the buyer types it: one row per heat code, each mapped onto the store's
 * heat step (1 hottest … 15 coldest). Rows hold text; `parseBrand` checks them through the API's
 * own schema and points each problem at its row.
 */

export type HeatCode = CreateBrandBody['heatCodes'][number];

export interface HeatRow {
  /** A stable key for React; rows are added and removed in place. */
  key: number;
  code: string;
  /** '' until a step is chosen, else '1' … '15'. */
  step: string;
}

export interface RowErrors {
  code?: string;
  step?: string;
}

let nextKey = 1;
export const newHeatRow = (code = '', step = ''): HeatRow => ({ key: nextKey++, code, step });

export const HEAT_STEPS: readonly number[] = Array.from({ length: HEAT_STEP_MAX - HEAT_STEP_MIN + 1 }, (_, i) => HEAT_STEP_MIN + i);

const isBlank = (r: HeatRow) => r.code.trim() === '' && r.step === '';

export interface BrandDraft {
  name: string;
  ours: boolean;
  note: string;
  rows: readonly HeatRow[];
}

export type BrandParse =
  | { ok: true; body: CreateBrandBody }
  | { ok: false; fields: Record<string, string>; rows: Record<number, RowErrors>; table: string | null };

/** The draft as the API's body, or each problem by its field, its row (by key) or the whole table. */
export function parseBrand(draft: BrandDraft): BrandParse {
  const filled = draft.rows.filter((r) => !isBlank(r));
  const input = {
    name: draft.name,
    ours: draft.ours,
    heatCodeNote: draft.note.trim() === '' ? null : draft.note,
    heatCodes: filled.map((r) => ({ code: r.code, heatStep: r.step === '' ? Number.NaN : Number(r.step) })),
  };
  const fields: Record<string, string> = {};
  const rows: Record<number, RowErrors> = {};
  let table: string | null = null;

  // Point a repeated code at every row that holds it, not only at the table.
  const byCode = new Map<string, HeatRow[]>();
  for (const r of filled) {
    const code = r.code.trim();
    if (code) byCode.set(code, [...(byCode.get(code) ?? []), r]);
  }
  for (const same of byCode.values()) {
    if (same.length > 1) for (const r of same) rows[r.key] = { ...rows[r.key], code: 'this code is in the table twice' };
  }

  const result = createBrandBodySchema.safeParse(input);
  if (result.success && Object.keys(rows).length === 0) return { ok: true, body: result.data };
  for (const issue of result.success ? [] : result.error.issues) {
    const [head, index, field] = issue.path;
    if (head === 'heatCodes' && typeof index === 'number') {
      const row = filled[index];
      if (!row) continue;
      const which = field === 'heatStep' ? 'step' : 'code';
      const message = which === 'step' ? 'choose a heat step' : row.code.trim() === '' ? 'type the code' : issue.message;
      rows[row.key] = { [which]: message, ...rows[row.key] };
    } else if (head === 'heatCodes') {
      table ??= issue.code === 'too_big' ? 'at most 40 heat codes' : Object.keys(rows).length ? null : issue.message;
    } else if (typeof head === 'string') {
      fields[head] ??= head === 'name' && draft.name.trim() === '' ? 'required' : issue.message;
    }
  }
  return { ok: false, fields, rows, table };
}

export interface RunSpec {
  from: string;
  to: string;
  /** The heat step of the `from` code. */
  firstStep: number;
  /** Which way the codes run: does the next code make a colder or a hotter plug? */
  nextIs: 'colder' | 'hotter';
}

const NUMERIC = /^\d+$/;
const LETTER = /^[A-Za-z]$/;

/**
 * A run of codes filled in one go — "2 to 9, code 2 is step 4, each next code one step colder" —
 * as most brands number their heat ranges. Numbers or single letters; refuses a run that would
 * fall off either end of the heat-step scale.
 */
export function fillRun(run: RunSpec): { ok: true; rows: HeatRow[] } | { ok: false; message: string } {
  const from = run.from.trim();
  const to = run.to.trim();
  let codes: string[];
  if (NUMERIC.test(from) && NUMERIC.test(to)) {
    const a = Number(from);
    const b = Number(to);
    const dir = a <= b ? 1 : -1;
    codes = Array.from({ length: Math.abs(b - a) + 1 }, (_, i) => String(a + dir * i));
  } else if (LETTER.test(from) && LETTER.test(to) && (from === from.toUpperCase()) === (to === to.toUpperCase())) {
    const a = from.charCodeAt(0);
    const b = to.charCodeAt(0);
    const dir = a <= b ? 1 : -1;
    codes = Array.from({ length: Math.abs(b - a) + 1 }, (_, i) => String.fromCharCode(a + dir * i));
  } else {
    return { ok: false, message: 'a run goes from a number to a number, or from a letter to a letter' };
  }
  if (codes.length > 40) return { ok: false, message: 'at most 40 heat codes' };
  const sign = run.nextIs === 'colder' ? 1 : -1;
  const last = run.firstStep + sign * (codes.length - 1);
  if (last < HEAT_STEP_MIN || last > HEAT_STEP_MAX) {
    return {
      ok: false,
      message: `${codes.length} codes from step ${run.firstStep} would end at step ${last}, off the ${HEAT_STEP_MIN}–${HEAT_STEP_MAX} scale`,
    };
  }
  return { ok: true, rows: codes.map((code, i) => newHeatRow(code, String(run.firstStep + sign * i))) };
}

export type Direction = { unit: 'number' | 'letter'; nextIs: 'colder' | 'hotter' | 'mixed' };

/**
 * Which way a table's codes run, read from the table itself: numbers by value, single letters by
 * the alphabet. Null when the codes are neither, or fewer than two — then only the note can say.
 */
export function heatDirection(codes: readonly HeatCode[]): Direction | null {
  if (codes.length < 2) return null;
  let unit: Direction['unit'];
  let order: (a: string, b: string) => number;
  if (codes.every((c) => NUMERIC.test(c.code))) {
    unit = 'number';
    order = (a, b) => Number(a) - Number(b);
  } else if (codes.every((c) => LETTER.test(c.code))) {
    unit = 'letter';
    order = (a, b) => a.toUpperCase().localeCompare(b.toUpperCase());
  } else return null;
  const sorted = [...codes].sort((a, b) => order(a.code, b.code));
  const steps = sorted.map((c) => c.heatStep);
  const rising = steps.every((s, i) => i === 0 || s > steps[i - 1]!);
  const falling = steps.every((s, i) => i === 0 || s < steps[i - 1]!);
  return { unit, nextIs: rising ? 'colder' : falling ? 'hotter' : 'mixed' };
}

/** The direction in words: "a higher number is a colder plug". */
export function directionWords(d: Direction): string {
  const code = d.unit === 'number' ? 'a higher number' : 'a later letter';
  if (d.nextIs === 'mixed') return `the codes do not run one way (${code} is sometimes hotter, sometimes colder)`;
  return `${code} is a ${d.nextIs} plug`;
}

/** Each heat step with the codes on it, hottest first. */
export function codesByStep(codes: readonly HeatCode[]): { step: number; codes: string[] }[] {
  return HEAT_STEPS.map((step) => ({ step, codes: codes.filter((c) => c.heatStep === step).map((c) => c.code) }));
}

/** Typed rows that are complete enough to show on the scale while the table is being written. */
export function rowsAsCodes(rows: readonly HeatRow[]): HeatCode[] {
  return rows
    .filter((r) => r.code.trim() !== '' && r.step !== '')
    .map((r) => ({ code: r.code.trim(), heatStep: Number(r.step) }))
    .filter((c) => Number.isInteger(c.heatStep) && c.heatStep >= HEAT_STEP_MIN && c.heatStep <= HEAT_STEP_MAX);
}
