import { z } from 'zod';
import { mappingSchema } from '../price-list/mapping';
import { emailSchema, timestampSchema, uuidSchema } from './common';
import { text } from './text';

/** Suppliers: who sends the price lists, and the column mapping remembered for each. */

export const SUPPLIER_KEY_PATTERN = /^[a-z0-9][a-z0-9-]{0,39}$/;

export const supplierKeySchema = z.string().trim().regex(SUPPLIER_KEY_PATTERN, 'lower-case letters, digits and dashes, at most 40');
const supplierNameSchema = text({ min: 1, max: 120 });
const phoneSchema = text({ max: 40 });

// ---------- requests ----------

export const createSupplierBodySchema = z.object({
  /** Derived from the name when left out. */
  key: supplierKeySchema.optional(),
  name: supplierNameSchema,
  contactEmail: emailSchema.nullable().optional(),
  phone: phoneSchema.nullable().optional(),
});
export type CreateSupplierBody = z.infer<typeof createSupplierBodySchema>;

export const updateSupplierBodySchema = z
  .object({
    key: supplierKeySchema.optional(),
    name: supplierNameSchema.optional(),
    contactEmail: emailSchema.nullable().optional(),
    phone: phoneSchema.nullable().optional(),
    /** The remembered column mapping; null forgets it. */
    mapping: mappingSchema.nullable().optional(),
    /** Archive (hide from pickers and lists; its price lists stay in the history) or restore. */
    archived: z.boolean().optional(),
  })
  .refine((b) => Object.keys(b).length > 0, { message: 'nothing to change' });
export type UpdateSupplierBody = z.infer<typeof updateSupplierBodySchema>;

/** GET /api/suppliers: archived suppliers only when asked for. */
export const suppliersQuerySchema = z.object({ archived: z.enum(['include', 'exclude']).default('exclude') });
export type SuppliersQuery = z.infer<typeof suppliersQuerySchema>;

// ---------- responses ----------

export const supplierSchema = z
  .object({
    id: uuidSchema,
    key: z.string(),
    name: z.string(),
    contactEmail: z.string().nullable(),
    phone: z.string().nullable(),
    mapping: mappingSchema.nullable(),
    /** When the last price list of this supplier was committed. */
    lastPriceListAt: timestampSchema.nullable(),
    lastPriceListId: uuidSchema.nullable(),
    createdAt: timestampSchema,
    /** Archived: hidden from pickers and lists unless asked for. */
    archivedAt: timestampSchema.nullable(),
  })
  .meta({ id: 'Supplier' });
export type Supplier = z.infer<typeof supplierSchema>;

export const suppliersResponseSchema = z.object({ suppliers: z.array(supplierSchema) });
export type SuppliersResponse = z.infer<typeof suppliersResponseSchema>;

export const supplierResponseSchema = z.object({ supplier: supplierSchema });
export type SupplierResponse = z.infer<typeof supplierResponseSchema>;
