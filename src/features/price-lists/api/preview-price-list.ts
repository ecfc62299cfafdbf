import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Delimiter } from '@shared/price-list/delimiters';
import type { Mapping } from '@shared/price-list/mapping';
import { priceListSchema } from '@shared/schemas/price-lists';
import { api } from '@/lib/api-client';
import { priceListKeys } from './keys';

/** Stages the file again with the buyer's mapping or delimiter, or against today's prices when it went stale. */
export const previewPriceList = ({ id, ...body }: { id: string; mapping?: Mapping; delimiter?: Delimiter }) =>
  api('POST', `/api/price-lists/${encodeURIComponent(id)}/preview`, { body, schema: priceListSchema });

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
