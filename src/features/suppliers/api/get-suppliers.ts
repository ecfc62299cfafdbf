import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { supplierSchema } from '@shared/schemas/price-list';
import { api } from '@/lib/api-client';
import { supplierKeys } from './keys';

const suppliersResponseSchema = z.object({ suppliers: z.array(supplierSchema) });

export const getSuppliers = async () => (await api('GET', '/api/suppliers', { schema: suppliersResponseSchema })).suppliers;

export const suppliersQueryOptions = () => queryOptions({ queryKey: supplierKeys.all, queryFn: getSuppliers });

export const useSuppliers = () => useQuery(suppliersQueryOptions());
