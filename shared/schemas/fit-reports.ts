import { z } from 'zod';
import { emailSchema, timestampSchema, uuidSchema } from './common';
import { coilCompareBodySchema, compatResultSchema, plugCompareBodySchema, verdictSchema } from './compat';
import { linkTokenSchema, text } from './text';

/** Fit reports: a comparison saved with its inputs, shared by a read-only link. */

// ---------- requests ----------

const titleSchema = text({ max: 120 }).optional();
const notesSchema = text({ max: 2000, multiline: true }).optional();

export const fitReportBodySchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('coil'), title: titleSchema, notes: notesSchema, inputs: coilCompareBodySchema }),
  z.object({ kind: z.literal('plug'), title: titleSchema, notes: notesSchema, inputs: plugCompareBodySchema }),
]);
export type FitReportBody = z.infer<typeof fitReportBodySchema>;

export const emailFitReportBodySchema = z.object({ to: emailSchema });
export type EmailFitReportBody = z.infer<typeof emailFitReportBodySchema>;

export const shareTokenParamSchema = z.object({ token: linkTokenSchema });

// ---------- responses ----------

const fitReportFields = z.object({
  id: uuidSchema,
  title: z.string(),
  notes: z.string(),
  verdict: verdictSchema,
  createdAt: timestampSchema,
  createdBy: z.string(),
  shopName: z.string().nullable(),
  result: compatResultSchema,
  shareUrl: z.string(),
});

/** A saved report with the compare request it was made from (`inputs`) and its result. */
export const fitReportSchema = z
  .discriminatedUnion('kind', [
    fitReportFields.extend({ kind: z.literal('coil'), inputs: coilCompareBodySchema }),
    fitReportFields.extend({ kind: z.literal('plug'), inputs: plugCompareBodySchema }),
  ])
  .meta({ id: 'FitReport' });
export type FitReport = z.infer<typeof fitReportSchema>;

/** A line of the list: the report without its inputs, result and link. */
export const fitReportSummarySchema = fitReportFields
  .pick({ id: true, title: true, verdict: true, createdAt: true, createdBy: true, shopName: true })
  .extend({ kind: z.enum(['coil', 'plug']) })
  .meta({ id: 'FitReportSummary' });
export type FitReportSummary = z.infer<typeof fitReportSummarySchema>;

export const fitReportResponseSchema = z.object({ fitReport: fitReportSchema });
export type FitReportResponse = z.infer<typeof fitReportResponseSchema>;

export const fitReportsResponseSchema = z.object({ fitReports: z.array(fitReportSummarySchema) });
export type FitReportsResponse = z.infer<typeof fitReportsResponseSchema>;

/** POST /api/fit-reports/:id/email: accepted for sending. */
export const emailSentResponseSchema = z.object({ sent: z.literal(true) });
export type EmailSentResponse = z.infer<typeof emailSentResponseSchema>;
