import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/** `POST /api/auth/logout` → 204. */
export function logout(): Promise<void> {
  return api.request<void>('/api/auth/logout', { method: 'POST' });
}

/** Signs out and forgets every cached record, so the next user sees nothing of this one's. */
export function useLogout() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: logout,
    onSettled: () => {
      api.resetCsrf();
      queryClient.clear();
    },
  });
}
