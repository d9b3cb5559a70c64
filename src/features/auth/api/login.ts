import { useMutation, useQueryClient } from '@tanstack/react-query';
import { meSchema, type LoginInput, type Me } from '../../../../shared/api/auth';
import { api } from '../../../lib/api-client';
import { authKeys } from '../../../lib/query-keys';

/** `POST /api/auth/login`: 200 with the session, 401 `bad_credentials`, 429 `rate_limited`. */
export function login(input: LoginInput): Promise<Me> {
  return api.request('/api/auth/login', { method: 'POST', body: input, schema: meSchema });
}

/**
 * Signs in and seeds the session cache. The session id rotates on sign-in, so the CSRF token
 * bound to the old session is dropped first.
 */
export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: (me) => {
      api.resetCsrf();
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== authKeys.all[0] });
      queryClient.setQueryData(authKeys.me(), me);
    },
  });
}
