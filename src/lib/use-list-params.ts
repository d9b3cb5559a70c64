import { useCallback } from 'react';
import { useSearchParams } from 'react-router';
import { listParamsFromSearch, mergeListSearch, type ListSearchChange } from './list-params';

/**
 * A list screen's search/page/sort and filters, read from and written to the URL (so Back,
 * bookmarks and shared links show the same view). `search` is the raw URL search for filters.
 */
export function useListParams() {
  const [search, setSearch] = useSearchParams();
  const params = listParamsFromSearch(search);
  const update = useCallback(
    (change: ListSearchChange) => setSearch((previous) => mergeListSearch(previous, change)),
    [setSearch],
  );
  return { params, search, update };
}
