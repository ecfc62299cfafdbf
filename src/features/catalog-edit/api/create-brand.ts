import { useMutation, useQueryClient } from '@tanstack/react-query';
import { brandResponseSchema, type CreateBrandBody } from '@shared/schemas/brands';
import { api } from '@/lib/api-client';
import { refreshCatalogViews } from './refresh-catalog-views';

export const createBrand = async (body: CreateBrandBody) => (await api('POST', '/api/brands', { body, schema: brandResponseSchema })).brand;

export function useCreateBrand() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: createBrand, onSuccess: () => refreshCatalogViews(qc) });
}
