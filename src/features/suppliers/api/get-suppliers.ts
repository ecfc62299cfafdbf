import { queryOptions, useQuery } from '@tanstack/react-query';
import { suppliersResponseSchema } from '@shared/schemas/suppliers';
import { api } from '@/lib/api-client';
import { supplierKeys } from './keys';

/** Active suppliers (what pickers offer); archived ones too with `includeArchived`. */
export const getSuppliers = async (includeArchived = false) =>
  (await api('GET', `/api/suppliers${includeArchived ? '?archived=include' : ''}`, { schema: suppliersResponseSchema })).suppliers;

export const suppliersQueryOptions = (includeArchived = false) =>
  queryOptions({ queryKey: supplierKeys.list(includeArchived), queryFn: () => getSuppliers(includeArchived) });

export const useSuppliers = (includeArchived = false) => useQuery(suppliersQueryOptions(includeArchived));
