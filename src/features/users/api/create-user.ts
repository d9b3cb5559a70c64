import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userSchema, type CreateUserInput, type User } from '../../../../shared/api/users';
import { api } from '../../../lib/api-client';
import { userKeys } from '../../../lib/query-keys';

/** `POST /api/users` → 201 User. */
export function createUser(input: CreateUserInput): Promise<User> {
  return api.request('/api/users', { method: 'POST', body: input, schema: userSchema });
}

/** Adds a user, then refetches every users list. */
export function useCreateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }),
  });
}
