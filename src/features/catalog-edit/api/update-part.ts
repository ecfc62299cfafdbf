import { useMutation, useQueryClient } from '@tanstack/react-query';
import { partDetailSchema, type UpdatePartBody } from '@shared/schemas/parts';
import { api } from '@/lib/api-client';
import { catalogEditKeys } from './keys';
import { refreshCatalogViews } from './refresh-catalog-views';

export const updatePart = ({ id, body }: { id: string; body: UpdatePartBody }) =>
  api('PATCH', `/api/parts/${encodeURIComponent(id)}`, { body, schema: partDetailSchema });

export function useUpdatePart() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: updatePart,
    onSuccess: (detail) => {
      qc.setQueryData(catalogEditKeys.part(detail.part.id), detail);
      return refreshCatalogViews(qc);
    },
  });
}
