import { useMutation, useQueryClient } from '@tanstack/react-query';
import { priceListSchema } from '@shared/schemas/price-lists';
import { api } from '@/lib/api-client';
import { priceListKeys } from './keys';

export const discardPriceList = ({ id }: { id: string; supplierId: string }) =>
  api('POST', `/api/price-lists/${encodeURIComponent(id)}/discard`, { schema: priceListSchema });

export function useDiscardPriceList() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: discardPriceList,
    onSuccess: (list, { supplierId }) => {
      qc.setQueryData(priceListKeys.detail(list.id), list);
      void qc.invalidateQueries({ queryKey: priceListKeys.history(supplierId) });
    },
  });
}
