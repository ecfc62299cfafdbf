import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdatePartBody } from '@shared/schemas/catalog';
import { api } from '@/lib/api-client';
import { catalogEditKeys } from './keys';
import { refreshCatalogViews } from './refresh-catalog-views';
import { partDetailSchema } from './response-shapes';

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
