import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Mapping } from '@shared/price-list/mapping';
import { priceListSchema } from '@shared/schemas/price-lists';
import { api } from '@/lib/api-client';
import { priceListKeys } from './keys';

/** Stages the file again with the buyer's mapping, or against today's prices when it went stale. */
export const previewPriceList = ({ id, mapping }: { id: string; mapping: Mapping }) =>
  api('POST', `/api/price-lists/${encodeURIComponent(id)}/preview`, { body: { mapping }, schema: priceListSchema });

export function usePreviewPriceList() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: previewPriceList,
    onSuccess: async (list) => {
      await qc.invalidateQueries({ queryKey: priceListKeys.list(list.id) });
      qc.setQueryData(priceListKeys.detail(list.id), list);
      void qc.invalidateQueries({ queryKey: priceListKeys.history(list.supplierId) });
    },
  });
}
