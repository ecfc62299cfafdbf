import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import type { CreateInterchangeBody } from '@shared/schemas/catalog';
import { api } from '@/lib/api-client';
import { refreshCatalogViews } from './refresh-catalog-views';

const createdSchema = z.object({ interchange: z.object({ id: z.string() }) });

export const createInterchange = async (body: CreateInterchangeBody) =>
  (await api('POST', '/api/interchange', { body, schema: createdSchema })).interchange;

export function useCreateInterchange() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: createInterchange, onSuccess: () => refreshCatalogViews(qc) });
}
