import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { authKeys } from './keys';

export const logout = () => api('POST', '/api/auth/logout');

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
