import type { DataSource, EntityManager } from 'typeorm';
import type { CreateSupplierBody, UpdateSupplierBody } from '../../shared/schemas/suppliers';
import { AppError } from '../errors';
import type { SupplierRecord } from '../presenters/supplier.presenter';
import { audit } from './audit.service';

const SUPPLIER_SELECT = `
SELECT s.id, s.key, s.name, s.contact_email, s.phone, s.mapping, s.created_at, last.id AS last_id, last.committed_at AS last_at
  FROM supplier s
  LEFT JOIN LATERAL (
    SELECT pl.id, pl.committed_at FROM price_list pl
     WHERE pl.supplier_id = s.id AND pl.status = 'committed' ORDER BY pl.committed_at DESC LIMIT 1
  ) last ON true`;

/** "Brackwater Trade Supply" → "brackwater-trade-supply": the key when the buyer gives none. */
export function supplierKeyFromName(name: string): string {
  const slug = name
    .normalize('NFKD')
    .replace(/\p{M}/gu, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 40)
    .replace(/-+$/, '');
  return slug || 'supplier';
}

async function one(m: EntityManager | DataSource, id: string): Promise<SupplierRecord> {
  const rows = (await m.query(`${SUPPLIER_SELECT} WHERE s.id = $1`, [id])) as SupplierRecord[];
  if (!rows[0]) throw AppError.notFound('Supplier');
  return rows[0];
}

function refuseDuplicate(err: unknown): never {
  if ((err as { code?: string }).code === '23505') {
    throw AppError.conflict('A supplier with this name or key exists already.', {
      constraint: (err as { constraint?: string }).constraint,
    });
  }
  throw err;
}

export async function listSuppliers(ds: DataSource): Promise<SupplierRecord[]> {
  return (await ds.query(`${SUPPLIER_SELECT} ORDER BY s.name`)) as SupplierRecord[];
}

export async function createSupplier(ds: DataSource, actorId: string, body: CreateSupplierBody): Promise<SupplierRecord> {
  return ds
    .transaction(async (m) => {
      const rows = (await m.query(`INSERT INTO supplier (key, name, contact_email, phone) VALUES ($1, $2, $3, $4) RETURNING id`, [
        body.key ?? supplierKeyFromName(body.name),
        body.name,
        body.contactEmail ?? null,
        body.phone ?? null,
      ])) as { id: string }[];
      const id = rows[0]?.id;
      if (!id) throw new Error('supplier insert returned no id');
      await audit(m, { actorId, action: 'supplier.create', entityType: 'supplier', entityId: id, data: { name: body.name } });
      return one(m, id);
    })
    .catch(refuseDuplicate);
}

const COLUMN_OF: Record<Exclude<keyof UpdateSupplierBody, 'mapping'>, string> = {
  key: 'key',
  name: 'name',
  contactEmail: 'contact_email',
  phone: 'phone',
};

export async function updateSupplier(ds: DataSource, actorId: string, id: string, body: UpdateSupplierBody): Promise<SupplierRecord> {
  return ds
    .transaction(async (m) => {
      const sets: string[] = [];
      const args: unknown[] = [id];
      for (const [field, column] of Object.entries(COLUMN_OF) as [keyof typeof COLUMN_OF, string][]) {
        const value = body[field];
        if (value === undefined) continue;
        args.push(value);
        sets.push(`${column} = $${args.length}`);
      }
      if (body.mapping !== undefined) {
        args.push(body.mapping === null ? null : JSON.stringify(body.mapping));
        sets.push(`mapping = $${args.length}`);
      }
      // Wrapped in a SELECT: TypeORM answers a bare UPDATE … RETURNING with [rows, count].
      const rows = (await m.query(
        `WITH upd AS (UPDATE supplier SET ${sets.join(', ')} WHERE id = $1 RETURNING id) SELECT id FROM upd`,
        args,
      )) as unknown[];
      if (rows.length === 0) throw AppError.notFound('Supplier');
      await audit(m, { actorId, action: 'supplier.update', entityType: 'supplier', entityId: id, data: { fields: Object.keys(body) } });
      return one(m, id);
    })
    .catch(refuseDuplicate);
}
