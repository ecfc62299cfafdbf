import type { DataSource } from 'typeorm';
import type { CreateSupplierBody, UpdateSupplierBody } from '../../shared/schemas/suppliers';
import type { Executor } from '../db/executor';
import { AppError } from '../errors';
import { audit } from '../repositories/audit.repository';
import {
  findSupplier,
  insertSupplier,
  listSupplierRows,
  updateSupplierFields,
  type SupplierRow,
} from '../repositories/suppliers.repository';

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

async function one(ex: Executor, id: string): Promise<SupplierRow> {
  const row = await findSupplier(ex, id);
  if (!row) throw AppError.notFound('Supplier');
  return row;
}

function refuseDuplicate(err: unknown): never {
  if ((err as { code?: string }).code === '23505') {
    throw AppError.conflict('A supplier with this name or key exists already.', {
      constraint: (err as { constraint?: string }).constraint,
    });
  }
  throw err;
}

export function listSuppliers(ds: DataSource, includeArchived = false): Promise<SupplierRow[]> {
  return listSupplierRows(ds.manager, includeArchived);
}

export async function createSupplier(ds: DataSource, actorId: string, body: CreateSupplierBody): Promise<SupplierRow> {
  return ds
    .transaction(async (m) => {
      const id = await insertSupplier(m, {
        key: body.key ?? supplierKeyFromName(body.name),
        name: body.name,
        contactEmail: body.contactEmail ?? null,
        phone: body.phone ?? null,
      });
      await audit(m, { actorId, action: 'supplier.create', entityType: 'supplier', entityId: id, data: { name: body.name } });
      return one(m, id);
    })
    .catch(refuseDuplicate);
}

export async function updateSupplier(ds: DataSource, actorId: string, id: string, body: UpdateSupplierBody): Promise<SupplierRow> {
  return ds
    .transaction(async (m) => {
      if (!(await updateSupplierFields(m, id, body))) throw AppError.notFound('Supplier');
      const action = body.archived === true ? 'supplier.archive' : body.archived === false ? 'supplier.restore' : 'supplier.update';
      await audit(m, { actorId, action, entityType: 'supplier', entityId: id, data: { fields: Object.keys(body) } });
      return one(m, id);
    })
    .catch(refuseDuplicate);
}
