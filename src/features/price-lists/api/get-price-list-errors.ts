import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { SortDirection } from '@shared/schemas/common';
import { priceListErrorsSchema, type PriceListErrorSort } from '@shared/schemas/price-lists';
import { api } from '@/lib/api-client';
import { priceListKeys } from './keys';

export interface ErrorsPage {
  id: string;
  sort: PriceListErrorSort;
  dir: SortDirection;
  offset: number;
  limit: number;
}

export const getPriceListErrors = ({ id, sort, dir, offset, limit }: ErrorsPage) =>
  api(
    'GET',
    `/api/price-lists/${encodeURIComponent(id)}/errors?${new URLSearchParams({ sort, dir, offset: String(offset), limit: String(limit) })}`,
    { schema: priceListErrorsSchema },
  );

export const priceListErrorsQueryOptions = (page: ErrorsPage) =>
  queryOptions({
    queryKey: priceListKeys.errors(page.id, page.sort, page.dir, page.offset, page.limit),
    queryFn: () => getPriceListErrors(page),
    placeholderData: keepPreviousData,
  });

export const usePriceListErrors = (page: ErrorsPage) => useQuery(priceListErrorsQueryOptions(page));

/** The rejected rows as CSV, for a plain download link. */
export const priceListErrorsCsvUrl = (id: string): string => `/api/price-lists/${encodeURIComponent(id)}/errors.csv`;
