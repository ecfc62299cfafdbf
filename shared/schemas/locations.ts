import { z } from 'zod';
import { limitQuerySchema, offsetQuerySchema, timestampSchema, uuidSchema } from './common';
import { text } from './text';

/** The chain's stores, stock per store, and transfers of parts between stores. */

// ---------- requests ----------

export const locationBodySchema = z.object({
  name: text({ min: 1, max: 80 }),
  address: text({ max: 300, multiline: true }).default(''),
  phone: text({ max: 40 }).default(''),
  openingHours: text({ max: 300, multiline: true }).default(''),
});
export type LocationBody = z.infer<typeof locationBodySchema>;

export const updateLocationBodySchema = z
  .object({
    name: text({ min: 1, max: 80 }).optional(),
    address: text({ max: 300, multiline: true }).optional(),
    phone: text({ max: 40 }).optional(),
    openingHours: text({ max: 300, multiline: true }).optional(),
  })
  .refine((b) => Object.keys(b).length > 0, 'nothing to change');
export type UpdateLocationBody = z.infer<typeof updateLocationBodySchema>;

/** How many a clerk may ask for in one transfer. */
export const TRANSFER_QUANTITY_MAX = 999;

export const transferRequestBodySchema = z.object({
  partId: uuidSchema,
  /** The store asked for the parts; they go to the requesting clerk's home store. */
  fromLocationId: uuidSchema,
  quantity: z.number().int().min(1).max(TRANSFER_QUANTITY_MAX),
});
export type TransferRequestBody = z.infer<typeof transferRequestBodySchema>;

export const TRANSFER_STATES = ['requested', 'picked', 'sent', 'received', 'refused', 'cancelled'] as const;
export const transferStateSchema = z.enum(TRANSFER_STATES);
export type TransferState = z.infer<typeof transferStateSchema>;

/** The steps after a request: each moves a transfer on from the one state it may be in. */
export const TRANSFER_STEPS = {
  pick: { from: 'requested', to: 'picked', by: 'source' },
  send: { from: 'picked', to: 'sent', by: 'source' },
  receive: { from: 'sent', to: 'received', by: 'destination' },
  refuse: { from: 'requested', to: 'refused', by: 'source' },
  cancel: { from: 'requested', to: 'cancelled', by: 'destination' },
} as const satisfies Record<string, { from: TransferState; to: TransferState; by: 'source' | 'destination' }>;
export type TransferStep = keyof typeof TRANSFER_STEPS;
export const transferStepSchema = z.enum(Object.keys(TRANSFER_STEPS) as [TransferStep, ...TransferStep[]]);

export const TRANSFER_STATE_LABELS: Record<TransferState, string> = {
  requested: 'Requested',
  picked: 'Picked',
  sent: 'Sent',
  received: 'Received',
  refused: 'Refused',
  cancelled: 'Cancelled',
};

export const TRANSFER_STEP_LABELS: Record<TransferStep, string> = {
  pick: 'Mark picked',
  send: 'Mark sent',
  receive: 'Mark received',
  refuse: 'Refuse',
  cancel: 'Cancel request',
};

/** Refusing says why: the requesting clerk reads it on the Transfers page and in the mail. */
export const transferRefuseBodySchema = z.object({ step: z.literal('refuse'), reason: text({ min: 1, max: 300 }) });

export const transferStepBodySchema = z.discriminatedUnion('step', [
  z.object({ step: z.literal('pick') }),
  z.object({ step: z.literal('send') }),
  z.object({ step: z.literal('receive') }),
  transferRefuseBodySchema,
  z.object({ step: z.literal('cancel') }),
]);
export type TransferStepBody = z.infer<typeof transferStepBodySchema>;

/** The `details` of the 409 a step gets when someone else moved the transfer on first. */
export const transferConflictDetailsSchema = z.object({ state: transferStateSchema });
export type TransferConflictDetails = z.infer<typeof transferConflictDetailsSchema>;

export const TRANSFERS_PAGE_MAX = 100;
export const transfersQuerySchema = z.object({
  limit: limitQuerySchema(TRANSFERS_PAGE_MAX, 50),
  offset: offsetQuerySchema(10_000),
});
export type TransfersQuery = z.infer<typeof transfersQuerySchema>;

/** GET /api/parts/:id and search: which store's stock is "here" for an API key, which has no home store. */
export const locationQuerySchema = z.object({ location: uuidSchema.optional() });

// ---------- responses ----------

export const locationSchema = z
  .object({ id: uuidSchema, name: z.string(), address: z.string(), phone: z.string(), openingHours: z.string() })
  .meta({ id: 'Location' });
export type Location = z.infer<typeof locationSchema>;

export const locationsResponseSchema = z.object({ locations: z.array(locationSchema) });
export type LocationsResponse = z.infer<typeof locationsResponseSchema>;

export const locationResponseSchema = z.object({ location: locationSchema });
export type LocationResponse = z.infer<typeof locationResponseSchema>;

/** The count and bin of a part at the reader's own store. */
export const stockHereSchema = z.object({ locationId: uuidSchema, onHand: z.number().int(), bin: z.string() });
export type StockHere = z.infer<typeof stockHereSchema>;

/** The other stores that hold the part (on hand above zero), most first. */
export const stockElsewhereSchema = z.object({ locationId: uuidSchema, name: z.string(), onHand: z.number().int() });
export type StockElsewhere = z.infer<typeof stockElsewhereSchema>;

/**
 * Stock across the chain as the store's staff see it: `here` is null only when the chain has no
 * store yet. `inStock` is true when any store holds the part.
 */
export const chainStockSchema = z
  .object({ inStock: z.boolean(), here: stockHereSchema.nullable(), elsewhere: z.array(stockElsewhereSchema) })
  .meta({ id: 'ChainStock' });
export type ChainStock = z.infer<typeof chainStockSchema>;

export const transferSchema = z
  .object({
    id: uuidSchema,
    partId: uuidSchema,
    partNumber: z.string(),
    brand: z.string(),
    from: z.object({ id: uuidSchema, name: z.string() }),
    to: z.object({ id: uuidSchema, name: z.string() }),
    quantity: z.number().int(),
    state: transferStateSchema,
    refusalReason: z.string().nullable(),
    requestedBy: z.string(),
    createdAt: timestampSchema,
    updatedAt: timestampSchema,
    /** The steps the reader may take now, for the buttons. */
    steps: z.array(transferStepSchema),
  })
  .meta({ id: 'Transfer' });
export type Transfer = z.infer<typeof transferSchema>;

export const transfersResponseSchema = z.object({ transfers: z.array(transferSchema), total: z.number().int() });
export type TransfersResponse = z.infer<typeof transfersResponseSchema>;

export const transferResponseSchema = z.object({ transfer: transferSchema });
export type TransferResponse = z.infer<typeof transferResponseSchema>;
