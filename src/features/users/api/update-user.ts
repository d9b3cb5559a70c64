import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userSchema, type UpdateUserInput, type User } from '../../../../shared/api/users';
import { api } from '../../../lib/api-client';
import { userKeys } from '../../../lib/query-keys';

/** `PATCH /api/users/:id` → 200 User. */
export function updateUser(id: number, change: UpdateUserInput): Promise<User> {
  return api.request(`/api/users/${id}`, { method: 'PATCH', body: change, schema: userSchema });
}

/** Changes a user's role or status, then refetches every users list and that user's detail. */
export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, change }: { id: number; change: UpdateUserInput }) => updateUser(id, change),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }),
  });
}
