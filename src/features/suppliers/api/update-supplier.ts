import { useMutation, useQueryClient } from '@tanstack/react-query';
import { supplierResponseSchema, type UpdateSupplierBody } from '@shared/schemas/suppliers';
import { api } from '@/lib/api-client';
import { supplierKeys } from './keys';

export const updateSupplier = async ({ id, ...body }: UpdateSupplierBody & { id: string }) =>
  (await api('PATCH', `/api/suppliers/${encodeURIComponent(id)}`, { body, schema: supplierResponseSchema })).supplier;

export function useUpdateSupplier() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: updateSupplier, onSuccess: () => qc.invalidateQueries({ queryKey: supplierKeys.all }) });
}
