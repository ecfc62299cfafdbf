import { z } from 'zod';
import { coilCompareBodySchema, compatResultSchema, plugCompareBodySchema, verdictSchema } from '../../shared/schemas/compat';
import { fitReportPriceSchema, fitReportVehicleSchema, type FitReportPrice, type FitReportVehicle } from '../../shared/schemas/fit-reports';
import { execute, insertReturningId, queryOne, queryRows, type Executor } from '../db/executor';

const columns = {
  id: z.string(),
  title: z.string(),
  notes: z.string(),
  /** The result as presented when the report was saved (jsonb). */
  result: compatResultSchema,
  verdict: verdictSchema,
  share_token: z.string(),
  created_at: z.date(),
  created_by_name: z.string(),
  shop_id: z.string().nullable(),
  shop_name: z.string().nullable(),
  vehicle: fitReportVehicleSchema.nullable(),
  prices: z.array(fitReportPriceSchema),
  archived_at: z.date().nullable(),
};

/** A fit_report row with its author and shop; `inputs` is the compare request it was made from (jsonb). */
const fitReportRowSchema = z.discriminatedUnion('kind', [
  z.object({ ...columns, kind: z.literal('coil'), inputs: coilCompareBodySchema }),
  z.object({ ...columns, kind: z.literal('plug'), inputs: plugCompareBodySchema }),
]);
export type FitReportRow = z.infer<typeof fitReportRowSchema>;

const SELECT = `SELECT r.id, r.kind, r.title, r.notes, r.inputs, r.result, r.verdict, r.share_token, r.created_at, r.shop_id,
                       r.vehicle, r.prices, r.archived_at,
                       u.name AS created_by_name, s.name AS shop_name
                  FROM fit_report r JOIN "user" u ON u.id = r.created_by LEFT JOIN shop s ON s.id = r.shop_id`;

export interface NewFitReport {
  kind: 'coil' | 'plug';
  title: string;
  notes: string;
  inputs: unknown;
  result: z.input<typeof compatResultSchema>;
  shareToken: string;
  createdBy: string;
  shopId: string | null;
  vehicle: FitReportVehicle | null;
  prices: FitReportPrice[];
}

export function insertFitReport(ex: Executor, r: NewFitReport): Promise<string> {
  return insertReturningId(
    ex,
    `INSERT INTO fit_report (kind, title, notes, inputs, result, verdict, share_token, created_by, shop_id, vehicle, prices)
     VALUES ($1,$2,$3,$4,$5,$6,$7,$8,$9,$10,$11) RETURNING id`,
    [
      r.kind,
      r.title,
      r.notes,
      JSON.stringify(r.inputs),
      JSON.stringify(r.result),
      r.result.verdict,
      r.shareToken,
      r.createdBy,
      r.shopId,
      r.vehicle === null ? null : JSON.stringify(r.vehicle),
      JSON.stringify(r.prices),
    ],
  );
}

export interface FitReportFilter {
  /** Of one shop, or of every shop when null. */
  shopId: string | null;
  /** Words found anywhere in the title, note, vehicle, parts or engine (case-insensitive). */
  q?: string;
  includeArchived: boolean;
  limit: number;
}

/** What the list's text search looks through. */
const SEARCHED = `concat_ws(' ', r.title, r.notes, r.vehicle->>'year', r.vehicle->>'make', r.vehicle->>'model', r.vehicle->>'engine',
                            r.result->'original'->>'label', r.result->'substitute'->>'label', r.result->'engine'->>'label')`;

/** Newest first; each word of `q` must appear somewhere. */
export function listFitReports(ex: Executor, f: FitReportFilter): Promise<FitReportRow[]> {
  const words = (f.q ?? '')
    .split(/\s+/)
    .filter(Boolean)
    .map((w) => `%${w.replace(/[\\%_]/g, '\\$&')}%`);
  return queryRows(
    ex,
    fitReportRowSchema,
    `${SELECT} WHERE ($1::uuid IS NULL OR r.shop_id = $1) AND ($2::boolean OR r.archived_at IS NULL)
        AND ${SEARCHED} ILIKE ALL ($3::text[])
      ORDER BY r.created_at DESC LIMIT $4`,
    [f.shopId, f.includeArchived, words, f.limit],
  );
}

/** Archives (keeping the first date) or restores; the number of rows changed. */
export function setFitReportArchived(ex: Executor, id: string, archived: boolean): Promise<number> {
  return execute(ex, `UPDATE fit_report SET archived_at = CASE WHEN $2 THEN coalesce(archived_at, now()) END WHERE id = $1`, [
    id,
    archived,
  ]);
}

export function findFitReport(ex: Executor, id: string): Promise<FitReportRow | null> {
  return queryOne(ex, fitReportRowSchema, `${SELECT} WHERE r.id = $1`, [id]);
}

export function findFitReportByToken(ex: Executor, token: string): Promise<FitReportRow | null> {
  return queryOne(ex, fitReportRowSchema, `${SELECT} WHERE r.share_token = $1`, [token]);
}
