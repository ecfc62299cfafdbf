import type { Supplier, SupplierResponse, SuppliersResponse } from '../../shared/schemas/suppliers';
import type { SupplierRow } from '../repositories/suppliers.repository';

export function presentSupplier(r: SupplierRow): Supplier {
  return {
    id: r.id,
    key: r.key,
    name: r.name,
    contactEmail: r.contact_email,
    phone: r.phone,
    mapping: r.mapping,
    lastPriceListAt: r.last_at?.toISOString() ?? null,
    lastPriceListId: r.last_id,
    createdAt: r.created_at.toISOString(),
    archivedAt: r.archived_at?.toISOString() ?? null,
  };
}

export const presentSuppliers = (rows: SupplierRow[]): SuppliersResponse => ({ suppliers: rows.map(presentSupplier) });
export const presentSupplierResponse = (row: SupplierRow): SupplierResponse => ({ supplier: presentSupplier(row) });
