import { useMutation, useQueryClient } from '@tanstack/react-query';
import { interchangeResponseSchema, type CreateInterchangeBody } from '@shared/schemas/interchange';
import { api } from '@/lib/api-client';
import { refreshCatalogViews } from './refresh-catalog-views';

export const createInterchange = async (body: CreateInterchangeBody) =>
  (await api('POST', '/api/interchange', { body, schema: interchangeResponseSchema })).interchange;

export function useCreateInterchange() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: createInterchange, onSuccess: () => refreshCatalogViews(qc) });
}
