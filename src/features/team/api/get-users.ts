import { queryOptions, useQuery } from '@tanstack/react-query';
import { teamResponseSchema } from '@shared/schemas/users';
import { api } from '@/lib/api-client';
import { teamKeys } from './keys';

export const getUsers = async () => (await api('GET', '/api/users', { schema: teamResponseSchema })).users;

export const usersQueryOptions = () => queryOptions({ queryKey: teamKeys.users, queryFn: getUsers });

export const useUsers = () => useQuery(usersQueryOptions());
