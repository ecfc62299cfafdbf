import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { SortDirection } from '@shared/schemas/common';
import { priceListChangesSchema, type PriceListChangeSort, type PriceListChangeType } from '@shared/schemas/price-lists';
import { api } from '@/lib/api-client';
import { priceListKeys } from './keys';

export interface ChangesPage {
  id: string;
  type: PriceListChangeType;
  sort: PriceListChangeSort;
  dir: SortDirection;
  offset: number;
  limit: number;
}

export const getPriceListChanges = ({ id, type, sort, dir, offset, limit }: ChangesPage) =>
  api(
    'GET',
    `/api/price-lists/${encodeURIComponent(id)}/changes?${new URLSearchParams({ type, sort, dir, offset: String(offset), limit: String(limit) })}`,
    { schema: priceListChangesSchema },
  );

export const priceListChangesQueryOptions = (page: ChangesPage) =>
  queryOptions({
    queryKey: priceListKeys.changes(page.id, page.type, page.sort, page.dir, page.offset, page.limit),
    queryFn: () => getPriceListChanges(page),
    placeholderData: keepPreviousData,
  });

export const usePriceListChanges = (page: ChangesPage) => useQuery(priceListChangesQueryOptions(page));
