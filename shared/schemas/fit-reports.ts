import { z } from 'zod';
import { emailSchema, timestampSchema, uuidSchema } from './common';
import { coilCompareBodySchema, compatResultSchema, plugCompareBodySchema, verdictSchema } from './compat';
import { storeSettingsSchema } from './settings';
import { linkTokenSchema, text } from './text';

/** Fit reports: a comparison saved with its inputs, shared by a read-only link. */

// ---------- requests ----------

const titleSchema = text({ max: 120 }).optional();
const notesSchema = text({ max: 2000, multiline: true }).optional();

/** The vehicle as the user picked it (year → make → model → engine), kept with the report. */
export const fitReportVehicleSchema = z.object({
  year: z.number().int().min(1900).max(2100),
  make: text({ min: 1, max: 80 }),
  model: text({ min: 1, max: 80 }),
  engine: text({ min: 1, max: 160 }),
});
export type FitReportVehicle = z.infer<typeof fitReportVehicleSchema>;

/** The engine's name may be left to the server (the compared engine's label). */
const vehicleSchema = fitReportVehicleSchema.partial({ engine: true }).optional();

export const fitReportBodySchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('coil'), title: titleSchema, notes: notesSchema, vehicle: vehicleSchema, inputs: coilCompareBodySchema }),
  z.object({ kind: z.literal('plug'), title: titleSchema, notes: notesSchema, vehicle: vehicleSchema, inputs: plugCompareBodySchema }),
]);
export type FitReportBody = z.infer<typeof fitReportBodySchema>;

export const emailFitReportBodySchema = z.object({ to: emailSchema });
export type EmailFitReportBody = z.infer<typeof emailFitReportBodySchema>;

export const shareTokenParamSchema = z.object({ token: linkTokenSchema });

/** GET /api/fit-reports: a text search (vehicle, part numbers, title, note) and archived ones when asked. */
export const fitReportsQuerySchema = z.object({
  q: text({ max: 120 }).optional(),
  archived: z.enum(['include', 'exclude']).default('exclude'),
});
export type FitReportsQuery = z.infer<typeof fitReportsQuerySchema>;

/** PATCH /api/fit-reports/:id: archive (hidden from the list; the share link still opens it) or restore. */
export const updateFitReportBodySchema = z.object({ archived: z.boolean() });
export type UpdateFitReportBody = z.infer<typeof updateFitReportBodySchema>;

// ---------- responses ----------

/** A part's sell price on the day the report was saved, in cents. */
export const fitReportPriceSchema = z.object({
  side: z.enum(['original', 'substitute']),
  partId: uuidSchema,
  label: z.string(),
  listCents: z.number().int(),
  coreCents: z.number().int(),
});
export type FitReportPrice = z.infer<typeof fitReportPriceSchema>;

const fitReportFields = z.object({
  id: uuidSchema,
  title: z.string(),
  notes: z.string(),
  verdict: verdictSchema,
  createdAt: timestampSchema,
  createdBy: z.string(),
  shopName: z.string().nullable(),
  vehicle: fitReportVehicleSchema.nullable(),
  /** The parts of the comparison, as their labels ("brand number"). */
  originalLabel: z.string(),
  substituteLabel: z.string(),
  archivedAt: timestampSchema.nullable(),
  result: compatResultSchema,
  /** Only for the catalog's parts that a supplier prices. */
  prices: z.array(fitReportPriceSchema),
  /** The store that made the report, from the Settings. */
  store: storeSettingsSchema,
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

/** The report on its public share page: no staff member's name. */
const sharedFields = fitReportFields.omit({ createdBy: true });
export const sharedFitReportSchema = z
  .discriminatedUnion('kind', [
    sharedFields.extend({ kind: z.literal('coil'), inputs: coilCompareBodySchema }),
    sharedFields.extend({ kind: z.literal('plug'), inputs: plugCompareBodySchema }),
  ])
  .meta({ id: 'SharedFitReport' });
export type SharedFitReport = z.infer<typeof sharedFitReportSchema>;

export const sharedFitReportResponseSchema = z.object({ fitReport: sharedFitReportSchema });
export type SharedFitReportResponse = z.infer<typeof sharedFitReportResponseSchema>;

/** A line of the list: the report without its inputs, result and link. */
export const fitReportSummarySchema = fitReportFields
  .pick({
    id: true,
    title: true,
    notes: true,
    verdict: true,
    createdAt: true,
    createdBy: true,
    shopName: true,
    vehicle: true,
    originalLabel: true,
    substituteLabel: true,
    archivedAt: true,
  })
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
