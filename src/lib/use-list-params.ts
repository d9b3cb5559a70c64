import { useCallback } from 'react';
import { useSearchParams } from 'react-router';
import { listParamsFromSearch, searchFromListParams } from './list-params';
import type { ListParams } from './query-keys';

/** A list screen's search/page/sort, read from and written to the URL (so Back and links work). */
export function useListParams() {
  const [search, setSearch] = useSearchParams();
  const params = listParamsFromSearch(search);
  const update = useCallback(
    (change: ListParams) =>
      setSearch((previous) =>
        searchFromListParams({ ...listParamsFromSearch(previous), ...change }),
      ),
    [setSearch],
  );
  return { params, update };
}
