import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { priceListHistorySchema } from '@shared/schemas/price-lists';
import { api } from '@/lib/api-client';
import { priceListKeys } from './keys';

/** The latest hundred uploads of a supplier, newest first: the history. */
export const getPriceLists = (supplierId: string) =>
  api('GET', `/api/price-lists?${new URLSearchParams({ supplierId, limit: '100' })}`, { schema: priceListHistorySchema });

export const priceListsQueryOptions = (supplierId: string | null) =>
  queryOptions({
    queryKey: priceListKeys.history(supplierId ?? ''),
    queryFn: supplierId === null ? skipToken : () => getPriceLists(supplierId),
  });

export const usePriceLists = (supplierId: string | null) => useQuery(priceListsQueryOptions(supplierId));
