import { useMutation, useQueryClient } from '@tanstack/react-query';
import { partDetailSchema, type CreatePartBody } from '@shared/schemas/parts';
import { api } from '@/lib/api-client';
import { catalogEditKeys } from './keys';
import { refreshCatalogViews } from './refresh-catalog-views';

export const createPart = (body: CreatePartBody) => api('POST', '/api/parts', { body, schema: partDetailSchema });

export function useCreatePart() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: createPart,
    onSuccess: (detail) => {
      qc.setQueryData(catalogEditKeys.part(detail.part.id), detail);
      return refreshCatalogViews(qc);
    },
  });
}
