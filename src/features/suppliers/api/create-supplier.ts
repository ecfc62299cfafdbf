import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { supplierSchema, type CreateSupplierBody } from '@shared/schemas/price-list';
import { api } from '@/lib/api-client';
import { supplierKeys } from './keys';

const supplierResponseSchema = z.object({ supplier: supplierSchema });

export const createSupplier = async (body: CreateSupplierBody) =>
  (await api('POST', '/api/suppliers', { body, schema: supplierResponseSchema })).supplier;

export function useCreateSupplier() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: createSupplier, onSuccess: () => qc.invalidateQueries({ queryKey: supplierKeys.all }) });
}
