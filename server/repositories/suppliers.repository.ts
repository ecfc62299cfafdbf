import { z } from 'zod';
import type { Mapping } from '../../shared/price-list/mapping';
import { insertReturningId, queryIds, queryOne, queryRows, type Executor } from '../db/executor';
import { storedMappingSchema } from './price-lists.repository';

/** A supplier with its last committed price list. */
const supplierRowSchema = z.object({
  id: z.string(),
  key: z.string(),
  name: z.string(),
  contact_email: z.string().nullable(),
  phone: z.string().nullable(),
  mapping: storedMappingSchema.nullable(),
  created_at: z.date(),
  last_id: z.string().nullable(),
  last_at: z.date().nullable(),
  archived_at: z.date().nullable(),
});
export type SupplierRow = z.infer<typeof supplierRowSchema>;

const SUPPLIER_SELECT = `
SELECT s.id, s.key, s.name, s.contact_email, s.phone, s.mapping, s.created_at, s.archived_at, last.id AS last_id, last.committed_at AS last_at
  FROM supplier s
  LEFT JOIN LATERAL (
    SELECT pl.id, pl.committed_at FROM price_list pl
     WHERE pl.supplier_id = s.id AND pl.status = 'committed' ORDER BY pl.committed_at DESC LIMIT 1
  ) last ON true`;

export function findSupplier(ex: Executor, id: string): Promise<SupplierRow | null> {
  return queryOne(ex, supplierRowSchema, `${SUPPLIER_SELECT} WHERE s.id = $1`, [id]);
}

/** Active suppliers by name; archived ones too (after them) with `includeArchived`. */
export function listSupplierRows(ex: Executor, includeArchived = false): Promise<SupplierRow[]> {
  return queryRows(
    ex,
    supplierRowSchema,
    `${SUPPLIER_SELECT} WHERE $1::boolean OR s.archived_at IS NULL ORDER BY s.archived_at IS NOT NULL, s.name`,
    [includeArchived],
  );
}

export interface SupplierFields {
  key: string;
  name: string;
  contactEmail: string | null;
  phone: string | null;
  mapping: Mapping | null;
  archived: boolean;
}

export function insertSupplier(ex: Executor, s: Omit<SupplierFields, 'mapping' | 'archived'>): Promise<string> {
  return insertReturningId(ex, `INSERT INTO supplier (key, name, contact_email, phone) VALUES ($1, $2, $3, $4) RETURNING id`, [
    s.key,
    s.name,
    s.contactEmail,
    s.phone,
  ]);
}

const COLUMN_OF: Record<keyof SupplierFields, string> = {
  key: 'key',
  name: 'name',
  contactEmail: 'contact_email',
  phone: 'phone',
  mapping: 'mapping',
  archived: 'archived_at',
};

/** Writes the fields given (undefined ones are left as they are); false when there is no such supplier. */
export async function updateSupplierFields(ex: Executor, id: string, changes: Partial<SupplierFields>): Promise<boolean> {
  const sets: string[] = [];
  const args: unknown[] = [id];
  for (const field of Object.keys(COLUMN_OF) as (keyof SupplierFields)[]) {
    const value = changes[field];
    if (value === undefined) continue;
    if (field === 'archived') {
      // Archiving again keeps the first date.
      sets.push(value ? `archived_at = coalesce(archived_at, now())` : `archived_at = NULL`);
      continue;
    }
    args.push(field === 'mapping' && value !== null ? JSON.stringify(value) : value);
    sets.push(`${COLUMN_OF[field]} = $${args.length}`);
  }
  const set = sets.length ? sets.join(', ') : 'id = id';
  return (await queryIds(ex, `UPDATE supplier SET ${set} WHERE id = $1 RETURNING id`, args)).length > 0;
}

const mappingRowSchema = z.object({ mapping: storedMappingSchema.nullable() });

/** The column mapping the supplier's last committed list used; undefined when there is no such supplier. */
export async function rememberedMapping(ex: Executor, supplierId: string): Promise<Mapping | null | undefined> {
  const row = await queryOne(ex, mappingRowSchema, `SELECT mapping FROM supplier WHERE id = $1`, [supplierId]);
  return row ? row.mapping : undefined;
}
