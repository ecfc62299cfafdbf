import { useQuery } from '@tanstack/react-query';
import { shopsResponseSchema } from '@shared/schemas/users';
import { api } from '@/lib/api-client';
import { teamKeys } from './keys';

export const getShops = async () => (await api('GET', '/api/shops', { schema: shopsResponseSchema })).shops;

export const useShops = () => useQuery({ queryKey: teamKeys.shops, queryFn: getShops, staleTime: 300_000 });
