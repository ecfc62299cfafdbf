import { z } from 'zod';
import { createBrandBodySchema, type CreateBrandBody } from '@shared/schemas/brands';
import { HEAT_STEP_MAX, HEAT_STEP_MIN, heatCodeSchema, heatStepSchema } from '@shared/schemas/specs';
import { plainWords } from '@shared/validation/plain-words';

/**
 * A brand's heat table as the buyer types it: one row per heat code, each mapped onto the store's
 * heat step (1 hottest … 15 coldest). Rows hold text; `brandFormSchema` checks them with the API's
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

/** The rows as typed; the form's schema checks them and turns them into the request's heat codes. */
const heatRowSchema = z.object({ key: z.number(), code: z.string(), step: z.string() });

/**
 * Each typed row checked where it stands, so every problem is said on its own row: a code left
 * out, a step not chosen, a code too long or twice in the table. Blank rows are left out; the
 * request's own rule for the whole table (createBrandBodySchema) has the last word.
 */
const heatTableSchema = z
  .array(heatRowSchema)
  .superRefine((rows, ctx) => {
    const codes = rows.map((r) => r.code.trim());
    rows.forEach((r, i) => {
      if (isBlank(r)) return;
      const code = codes[i]!;
      if (code === '') ctx.addIssue({ code: 'custom', path: [i, 'code'], message: 'type the code' });
      else if (codes.indexOf(code) !== codes.lastIndexOf(code))
        ctx.addIssue({ code: 'custom', path: [i, 'code'], message: 'this code is in the table twice' });
      else {
        const checked = heatCodeSchema.safeParse(code, { error: plainWords });
        if (!checked.success) ctx.addIssue({ code: 'custom', path: [i, 'code'], message: `the code ${checked.error.issues[0]!.message}` });
      }
      if (!heatStepSchema.safeParse(Number(r.step)).success)
        ctx.addIssue({ code: 'custom', path: [i, 'step'], message: 'choose a heat step' });
    });
  })
  .transform((rows): HeatCode[] => rows.filter((r) => !isBlank(r)).map((r) => ({ code: r.code.trim(), heatStep: Number(r.step) })))
  .pipe(createBrandBodySchema.shape.heatCodes.unwrap());

/** Adding a brand: the request's schema, with the heat table as the rows the buyer types. */
export const brandFormSchema = createBrandBodySchema.extend({ heatCodes: heatTableSchema });

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
