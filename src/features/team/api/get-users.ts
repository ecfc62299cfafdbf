import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { teamMemberSchema } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { teamKeys } from './keys';

const usersResponseSchema = z.object({ users: z.array(teamMemberSchema) });

export const getUsers = async () => (await api('GET', '/api/users', { schema: usersResponseSchema })).users;

export const usersQueryOptions = () => queryOptions({ queryKey: teamKeys.users, queryFn: getUsers });

export const useUsers = () => useQuery(usersQueryOptions());
