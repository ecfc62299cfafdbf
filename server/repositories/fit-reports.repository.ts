import { z } from 'zod';
import { coilCompareBodySchema, compatResultSchema, plugCompareBodySchema, verdictSchema } from '../../shared/schemas/compat';
import { insertReturningId, queryOne, queryRows, type Executor } from '../db/executor';

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
};

/** A fit_report row with its author and shop; `inputs` is the compare request it was made from (jsonb). */
const fitReportRowSchema = z.discriminatedUnion('kind', [
  z.object({ ...columns, kind: z.literal('coil'), inputs: coilCompareBodySchema }),
  z.object({ ...columns, kind: z.literal('plug'), inputs: plugCompareBodySchema }),
]);
export type FitReportRow = z.infer<typeof fitReportRowSchema>;

const SELECT = `SELECT r.id, r.kind, r.title, r.notes, r.inputs, r.result, r.verdict, r.share_token, r.created_at, r.shop_id,
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
}

export function insertFitReport(ex: Executor, r: NewFitReport): Promise<string> {
  return insertReturningId(
    ex,
    `INSERT INTO fit_report (kind, title, notes, inputs, result, verdict, share_token, created_by, shop_id)
     VALUES ($1,$2,$3,$4,$5,$6,$7,$8,$9) RETURNING id`,
    [r.kind, r.title, r.notes, JSON.stringify(r.inputs), JSON.stringify(r.result), r.result.verdict, r.shareToken, r.createdBy, r.shopId],
  );
}

/** Newest first; of one shop, or of every shop when `shopId` is null. */
export function listFitReports(ex: Executor, shopId: string | null, limit: number): Promise<FitReportRow[]> {
  return queryRows(ex, fitReportRowSchema, `${SELECT} WHERE ($1::uuid IS NULL OR r.shop_id = $1) ORDER BY r.created_at DESC LIMIT $2`, [
    shopId,
    limit,
  ]);
}

export function findFitReport(ex: Executor, id: string): Promise<FitReportRow | null> {
  return queryOne(ex, fitReportRowSchema, `${SELECT} WHERE r.id = $1`, [id]);
}

export function findFitReportByToken(ex: Executor, token: string): Promise<FitReportRow | null> {
  return queryOne(ex, fitReportRowSchema, `${SELECT} WHERE r.share_token = $1`, [token]);
}
