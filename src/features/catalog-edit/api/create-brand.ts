import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import type { CreateBrandBody } from '@shared/schemas/catalog';
import { api } from '@/lib/api-client';
import { refreshCatalogViews } from './refresh-catalog-views';

const createdBrandSchema = z.object({ brand: z.object({ id: z.string(), name: z.string() }) });

export const createBrand = async (body: CreateBrandBody) => (await api('POST', '/api/brands', { body, schema: createdBrandSchema })).brand;

export function useCreateBrand() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: createBrand, onSuccess: () => refreshCatalogViews(qc) });
}
