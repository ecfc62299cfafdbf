import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userResponseSchema, type LoginBody } from '@shared/schemas/auth';
import { api, forgetCsrfToken } from '@/lib/api-client';
import { authKeys } from './keys';

export async function login(body: LoginBody) {
  const res = await api('POST', '/api/auth/login', { body, schema: userResponseSchema, allowUnauthorized: true });
  forgetCsrfToken();
  return res;
}

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
