import type { Mapping } from '../../shared/price-list/mapping';
import type { Supplier, SupplierResponse, SuppliersResponse } from '../../shared/schemas/suppliers';

/** A supplier row with its last committed price list joined. */
export interface SupplierRecord {
  id: string;
  key: string;
  name: string;
  contact_email: string | null;
  phone: string | null;
  mapping: Mapping | null;
  created_at: Date;
  last_id: string | null;
  last_at: Date | null;
}

export function presentSupplier(r: SupplierRecord): Supplier {
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
  };
}

export const presentSuppliers = (rows: SupplierRecord[]): SuppliersResponse => ({ suppliers: rows.map(presentSupplier) });
export const presentSupplierResponse = (row: SupplierRecord): SupplierResponse => ({ supplier: presentSupplier(row) });
