import { useMutation, useQueryClient } from '@tanstack/react-query';
import { commitPriceListResponseSchema } from '@shared/schemas/price-lists';
import { api } from '@/lib/api-client';
import { priceListKeys } from './keys';

export const commitPriceList = ({ id }: { id: string; supplierId: string }) =>
  api('POST', `/api/price-lists/${encodeURIComponent(id)}/commit`, { schema: commitPriceListResponseSchema });

export function useCommitPriceList() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: commitPriceList,
    onSuccess: (committed, { supplierId }) => {
      const { notices: _notices, counterPrices: _counter, ...list } = committed;
      qc.setQueryData(priceListKeys.detail(list.id), list);
      // Committing makes the supplier's other staged lists stale, so the history changes too.
      void qc.invalidateQueries({ queryKey: priceListKeys.history(supplierId) });
    },
    // A refusal (the list went stale, the same file was committed) may change what the list shows.
    onError: (_err, { id }) => qc.invalidateQueries({ queryKey: priceListKeys.detail(id) }),
  });
}
