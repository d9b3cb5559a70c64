import type { ListQuery } from '../../shared/api/list';

/** The one shape of every paged list. */
export const presentPage = <T>(items: T[], total: number, q: ListQuery) => ({
  items,
  total,
  page: q.page,
  pageSize: q.pageSize,
});
