import { z } from 'zod';
import { DELIMITERS } from '../price-list/delimiters';
import { mappingSchema } from '../price-list/mapping';
import { limitQuerySchema, offsetQuerySchema, sortDirQuerySchema, timestampSchema, uuidSchema } from './common';
import { counterPricesSchema } from './sell-price';
import { fileText } from './text';

/** Supplier price lists: upload, preview, commit or discard, history (buyers and admins). */

// ---------- price lists: requests ----------

/** The JSON text of a mapping, as sent in a multipart field. */
const mappingFieldSchema = fileText(256 * 1024)
  .transform((text, ctx) => {
    try {
      return JSON.parse(text) as unknown;
    } catch {
      ctx.addIssue({ code: 'custom', message: 'mapping is not valid JSON' });
      return z.NEVER;
    }
  })
  .pipe(mappingSchema);

export const delimiterSchema = z.enum(DELIMITERS);

/** The text fields of the multipart upload (the file itself is the `file` part). */
export const uploadPriceListFieldsSchema = z.object({
  supplierId: uuidSchema,
  mapping: mappingFieldSchema.optional(),
  /** Optional id chosen by the client, so it can poll GET /api/price-lists/:id while the upload is processed. */
  uploadId: uuidSchema.optional(),
  /** The field delimiter; guessed from the first lines when absent. */
  delimiter: delimiterSchema.optional(),
});
export type UploadPriceListFields = z.infer<typeof uploadPriceListFieldsSchema>;

/** A new mapping, or a new delimiter (the file is read again, its mapping guessed or remembered anew). */
export const previewPriceListBodySchema = z.object({ mapping: mappingSchema.optional(), delimiter: delimiterSchema.optional() });
export type PreviewPriceListBody = z.infer<typeof previewPriceListBodySchema>;

const offsetSchema = offsetQuerySchema(10_000_000);
const limitSchema = limitQuerySchema(1000, 100);

export const PRICE_LIST_CHANGE_TYPES = ['new', 'changed', 'unchanged', 'supersession'] as const;
export type PriceListChangeType = (typeof PRICE_LIST_CHANGE_TYPES)[number];

/**
 * What the preview tables sort by: file line, part number, the new cost or list price, or the
 * size of its move in percent. Ties, and the default, go in file order.
 */
export const PRICE_LIST_CHANGE_SORTS = ['line', 'partNumber', 'cost', 'list', 'costChange', 'listChange'] as const;
export type PriceListChangeSort = (typeof PRICE_LIST_CHANGE_SORTS)[number];

export const priceListChangesQuerySchema = z.object({
  type: z.enum(PRICE_LIST_CHANGE_TYPES).optional(),
  /** Only the moves above the threshold. */
  flagged: z.enum(['true', 'false']).optional(),
  sort: z.enum(PRICE_LIST_CHANGE_SORTS).default('line'),
  dir: sortDirQuerySchema,
  offset: offsetSchema,
  limit: limitSchema,
});
export type PriceListChangesQuery = z.infer<typeof priceListChangesQuerySchema>;

/** The rejected rows sort by file line or by the column that was wrong; ties in file order. */
export const PRICE_LIST_ERROR_SORTS = ['line', 'column'] as const;
export type PriceListErrorSort = (typeof PRICE_LIST_ERROR_SORTS)[number];

export const priceListErrorsQuerySchema = z.object({
  sort: z.enum(PRICE_LIST_ERROR_SORTS).default('line'),
  dir: sortDirQuerySchema,
  offset: offsetSchema,
  limit: limitSchema,
});
export type PriceListErrorsQuery = z.infer<typeof priceListErrorsQuerySchema>;

export const priceListHistoryQuerySchema = z.object({
  supplierId: uuidSchema.optional(),
  offset: offsetSchema,
  limit: limitSchema,
});
export type PriceListHistoryQuery = z.infer<typeof priceListHistoryQuerySchema>;

// ---------- price lists: responses ----------

export const PRICE_LIST_STATUSES = ['processing', 'staged', 'committed', 'discarded', 'failed'] as const;
export type PriceListStatus = (typeof PRICE_LIST_STATUSES)[number];

/**
 * total = new + changed + unchanged + rejected, each counting lines of the file. `changed`
 * includes a first price from this supplier for a part the catalog has (`firstPrices` of them);
 * `supersessions` counts the links the commit will make.
 */
export const priceListCountsSchema = z.object({
  total: z.number().int(),
  new: z.number().int(),
  changed: z.number().int(),
  unchanged: z.number().int(),
  rejected: z.number().int(),
  firstPrices: z.number().int(),
  supersessions: z.number().int(),
});
export type PriceListCounts = z.infer<typeof priceListCountsSchema>;

export const priceListProgressSchema = z.object({
  phase: z.enum(['reading', 'comparing', 'done']),
  rowsDone: z.number().int(),
  bytesRead: z.number().int(),
  bytesTotal: z.number().int(),
});
export type PriceListProgress = z.infer<typeof priceListProgressSchema>;

const personSchema = z.object({ id: uuidSchema, name: z.string() }).nullable();

/** What the commit wrote, counted by the database. */
export const priceListAppliedSchema = z.object({
  partsCreated: z.number().int(),
  specsStored: z.number().int(),
  pricesWritten: z.number().int(),
  supersessionsLinked: z.number().int(),
});
export type PriceListApplied = z.infer<typeof priceListAppliedSchema>;

export const priceListSchema = z
  .object({
    id: uuidSchema,
    supplierId: uuidSchema,
    supplierName: z.string(),
    fileName: z.string(),
    sha256: z.string(),
    sizeBytes: z.number().int(),
    encoding: z.string().nullable(),
    delimiter: z.string().nullable(),
    /** The file's headers, in file order. */
    columns: z.array(z.string()),
    mapping: mappingSchema,
    mappingSource: z.enum(['given', 'remembered', 'guessed']),
    status: z.enum(PRICE_LIST_STATUSES),
    /** Another list of this supplier was committed after this one was compared: preview again before committing. */
    stale: z.boolean(),
    counts: priceListCountsSchema.nullable(),
    flagged: z.number().int(),
    flagThresholdPct: z.number().nullable(),
    progress: priceListProgressSchema,
    applied: priceListAppliedSchema.nullable(),
    createdBy: personSchema,
    createdAt: timestampSchema,
    committedBy: personSchema,
    committedAt: timestampSchema.nullable(),
    discardedAt: timestampSchema.nullable(),
  })
  .meta({ id: 'PriceList' });
export type PriceList = z.infer<typeof priceListSchema>;

export const priceListHistorySchema = z.object({ priceLists: z.array(priceListSchema), total: z.number().int() });
export type PriceListHistory = z.infer<typeof priceListHistorySchema>;

/** POST .../commit: the list as committed, plus what could not follow (search index, e-mail). */
export const commitPriceListResponseSchema = priceListSchema.extend({
  notices: z.array(z.string()),
  /** Whether the Counter now sells this list's parts at this supplier's price (see `counterPricesMessage`). */
  counterPrices: counterPricesSchema,
});
export type CommitPriceListResponse = z.infer<typeof commitPriceListResponseSchema>;

export const SUPERSESSION_STATES = ['link', 'already', 'not-found', 'kind-mismatch', 'conflict', 'loop'] as const;
export type SupersessionState = (typeof SUPERSESSION_STATES)[number];

/** One line of the preview tables. Money in cents; `old…` is null for a new part or a first price. */
export const priceListChangeSchema = z
  .object({
    line: z.number().int(),
    type: z.enum(['new', 'changed', 'unchanged']),
    partId: uuidSchema.nullable(),
    /** As the supplier printed it. */
    partNumber: z.string(),
    /** The catalog's number of the part it matched (null for a new part). */
    catalogNumber: z.string().nullable(),
    brand: z.string(),
    description: z.string().nullable(),
    kind: z.enum(['coil', 'plug']).nullable(),
    oldCostCents: z.number().int().nullable(),
    newCostCents: z.number().int(),
    oldListCents: z.number().int().nullable(),
    newListCents: z.number().int(),
    oldCoreCents: z.number().int().nullable(),
    /** Null when the file gives no core charge (the current one is kept). */
    newCoreCents: z.number().int().nullable(),
    oldPackQty: z.number().int().nullable(),
    newPackQty: z.number().int().nullable(),
    costChangePct: z.number().nullable(),
    listChangePct: z.number().nullable(),
    flagged: z.boolean(),
    /** For a new part: whether the file carried a complete spec (else it shows "no spec — no verdict"). */
    specStored: z.boolean(),
    supersedes: z.string().nullable(),
    supersession: z.enum(SUPERSESSION_STATES).nullable(),
  })
  .meta({ id: 'PriceListChange' });
export type PriceListChange = z.infer<typeof priceListChangeSchema>;

export const priceListChangesSchema = z.object({ changes: z.array(priceListChangeSchema), total: z.number().int() });
export type PriceListChanges = z.infer<typeof priceListChangesSchema>;

export const priceListRowErrorSchema = z
  .object({
    line: z.number().int(),
    /** The header as printed in the file; null when the line as a whole is wrong. */
    column: z.string().nullable(),
    field: z.string().nullable(),
    message: z.string(),
  })
  .meta({ id: 'PriceListRowError' });
export type PriceListRowError = z.infer<typeof priceListRowErrorSchema>;

/** `total` counts reasons; a line rejected for two reasons has two entries. */
export const priceListErrorsSchema = z.object({ errors: z.array(priceListRowErrorSchema), total: z.number().int() });
export type PriceListErrors = z.infer<typeof priceListErrorsSchema>;

/** Why a whole file was refused, in `error.details.reason` of a 400, 413 or 415. */
export const priceListFileRefusalDetailsSchema = z.object({
  reason: z.string(),
  line: z.number().int().optional(),
  headers: z.array(z.string()).optional(),
  mapping: mappingSchema.optional(),
  problems: z.array(z.object({ code: z.string(), message: z.string() })).optional(),
  limitMb: z.number().optional(),
});
export type PriceListFileRefusalDetails = z.infer<typeof priceListFileRefusalDetailsSchema>;

export const PRICE_LIST_UPLOAD_FIELD = 'file';
export const PRICE_LIST_MAX_FILE_NAME = 255;
