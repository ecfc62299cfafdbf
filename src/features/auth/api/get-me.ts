import { queryOptions, useQuery } from '@tanstack/react-query';
import { userResponseSchema, type User } from '@shared/schemas/auth';
import { api, ApiError } from '@/lib/api-client';
import { authKeys } from './keys';

/** The signed-in user, or null when nobody is signed in. */
export async function getMe(): Promise<User | null> {
  try {
    return (await api('GET', '/api/auth/me', { schema: userResponseSchema, allowUnauthorized: true })).user;
  } catch (e) {
    if (e instanceof ApiError && e.status === 401) return null;
    throw e;
  }
}

export const meQueryOptions = () => queryOptions({ queryKey: authKeys.me, queryFn: getMe, staleTime: 60_000 });

export const useMe = () => useQuery(meQueryOptions());
