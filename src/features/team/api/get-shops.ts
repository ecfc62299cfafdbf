import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { shopSchema } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { teamKeys } from './keys';

const shopsResponseSchema = z.object({ shops: z.array(shopSchema) });

export const getShops = async () => (await api('GET', '/api/shops', { schema: shopsResponseSchema })).shops;

export const useShops = () => useQuery({ queryKey: teamKeys.shops, queryFn: getShops, staleTime: 300_000 });
