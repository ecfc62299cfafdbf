import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { priceListSchema, type PriceList } from '@shared/schemas/price-lists';
import { api } from '@/lib/api-client';
import { priceListKeys } from './keys';

export const getPriceList = (id: string): Promise<PriceList> =>
  api('GET', `/api/price-lists/${encodeURIComponent(id)}`, { schema: priceListSchema });

/** Polls twice a second while the server is still reading the file's rows. */
export const priceListQueryOptions = (id: string | null) =>
  queryOptions({
    queryKey: priceListKeys.detail(id ?? ''),
    queryFn: id === null ? skipToken : () => getPriceList(id),
    refetchInterval: (query) => (query.state.data?.status === 'processing' ? 500 : false),
  });

export const usePriceList = (id: string | null) => useQuery(priceListQueryOptions(id));
