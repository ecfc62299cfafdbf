import { queryOptions, useQuery } from '@tanstack/react-query';
import { brandsResponseSchema } from '@shared/schemas/brands';
import { api } from '@/lib/api-client';
import { catalogEditKeys } from './keys';

export const getBrands = async () => (await api('GET', '/api/brands', { schema: brandsResponseSchema })).brands;

export const brandsQueryOptions = () => queryOptions({ queryKey: catalogEditKeys.brands, queryFn: getBrands, staleTime: 60_000 });

/** Every brand with its heat table, our own lines first. */
export const useBrands = () => useQuery(brandsQueryOptions());
