import { useMutation, useQueryClient } from '@tanstack/react-query';
import { supplierResponseSchema, type CreateSupplierBody } from '@shared/schemas/suppliers';
import { api } from '@/lib/api-client';
import { supplierKeys } from './keys';

export const createSupplier = async (body: CreateSupplierBody) =>
  (await api('POST', '/api/suppliers', { body, schema: supplierResponseSchema })).supplier;

export function useCreateSupplier() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: createSupplier, onSuccess: () => qc.invalidateQueries({ queryKey: supplierKeys.all }) });
}
