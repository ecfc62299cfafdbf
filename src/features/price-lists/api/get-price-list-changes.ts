import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { priceListChangesSchema, type PriceListChangeType } from '@shared/schemas/price-lists';
import { api } from '@/lib/api-client';
import { priceListKeys } from './keys';

export interface ChangesPage {
  id: string;
  type: PriceListChangeType;
  offset: number;
  limit: number;
}

export const getPriceListChanges = ({ id, type, offset, limit }: ChangesPage) =>
  api(
    'GET',
    `/api/price-lists/${encodeURIComponent(id)}/changes?${new URLSearchParams({ type, offset: String(offset), limit: String(limit) })}`,
    {
      schema: priceListChangesSchema,
    },
  );

export const priceListChangesQueryOptions = (page: ChangesPage) =>
  queryOptions({
    queryKey: priceListKeys.changes(page.id, page.type, page.offset, page.limit),
    queryFn: () => getPriceListChanges(page),
    placeholderData: keepPreviousData,
  });

export const usePriceListChanges = (page: ChangesPage) => useQuery(priceListChangesQueryOptions(page));
