import { queryOptions, useQuery } from '@tanstack/react-query';
import { suppliersResponseSchema } from '@shared/schemas/suppliers';
import { api } from '@/lib/api-client';
import { supplierKeys } from './keys';

export const getSuppliers = async () => (await api('GET', '/api/suppliers', { schema: suppliersResponseSchema })).suppliers;

export const suppliersQueryOptions = () => queryOptions({ queryKey: supplierKeys.all, queryFn: getSuppliers });

export const useSuppliers = () => useQuery(suppliersQueryOptions());
