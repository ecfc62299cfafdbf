import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userResponseSchema, type LoginBody } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { authKeys } from './keys';

export const login = (body: LoginBody) => api('POST', '/api/auth/login', { body, schema: userResponseSchema, allowUnauthorized: true });

export function useLogin() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: (data) => {
      qc.removeQueries({ predicate: (q) => q.queryKey[0] !== authKeys.me[0] });
      qc.setQueryData(authKeys.me, data.user);
    },
  });
}
