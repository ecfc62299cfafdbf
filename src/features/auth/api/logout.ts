import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, forgetCsrfToken } from '@/lib/api-client';
import { authKeys } from './keys';

export async function logout(): Promise<void> {
  await api('POST', '/api/auth/logout');
  forgetCsrfToken();
}

export function useLogout() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: logout,
    onSuccess: () => {
      // Forget everything the last user fetched; the layout then sends the browser to sign-in.
      qc.setQueryData(authKeys.me, null);
      qc.removeQueries({ predicate: (q) => q.queryKey[0] !== authKeys.me[0] });
    },
  });
}
