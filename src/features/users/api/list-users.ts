import { useQuery } from '@tanstack/react-query';
import { pageOf } from '../../../../shared/api/list';
import { userSchema } from '../../../../shared/api/users';
import { pagedListQueryOptions } from '../../../lib/paged-list';
import { userKeys, type ListParams } from '../../../lib/query-keys';

const userPageSchema = pageOf(userSchema);

/** `GET /api/users` (admin): a page of the plant's users. */
export const usersQueryOptions = (params: ListParams) =>
  pagedListQueryOptions({
    queryKey: userKeys.list(params),
    path: '/api/users',
    schema: userPageSchema,
    params,
  });

/** One page of users. */
export function useUsers(params: ListParams) {
  return useQuery(usersQueryOptions(params));
}
