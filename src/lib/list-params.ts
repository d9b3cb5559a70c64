import type { ListParams } from './query-keys';

/** Rows per page of every list screen unless the URL says otherwise. */
export const DEFAULT_PAGE_SIZE = 25;

/** URL keys owned by paging, search and sort; every other key is a list's own filter. */
const LIST_KEYS = ['q', 'page', 'pageSize', 'sort'] as const;

const positiveInt = (text: string | null, fallback: number, max = Number.MAX_SAFE_INTEGER) => {
  const n = Number(text);
  return Number.isInteger(n) && n >= 1 ? Math.min(n, max) : fallback;
};

/**
 * Reads a list's search, page and sort from the URL, tolerating junk (a hand-edited URL should
 * show page 1, not an error). Page size is capped at 100, the API's limit (shared/api/list.ts).
 */
export function listParamsFromSearch(search: URLSearchParams): Required<
  Omit<ListParams, 'sort'>
> & {
  sort?: string;
} {
  const q = (search.get('q') ?? '').trim().slice(0, 100);
  const sortText = search.get('sort');
  const sort = sortText && /^-?[a-zA-Z]+$/.test(sortText) ? sortText : undefined;
  return {
    q,
    page: positiveInt(search.get('page'), 1),
    pageSize: positiveInt(search.get('pageSize'), DEFAULT_PAGE_SIZE, 100),
    ...(sort ? { sort } : {}),
  };
}

/**
 * Writes list params back to URL search params, leaving defaults out so URLs stay short.
 * Changing the search text resets to page 1 (callers pass `page: 1`).
 */
export function searchFromListParams(params: ListParams): URLSearchParams {
  const search = new URLSearchParams();
  if (params.q) search.set('q', params.q);
  if (params.page && params.page > 1) search.set('page', String(params.page));
  if (params.pageSize && params.pageSize !== DEFAULT_PAGE_SIZE) {
    search.set('pageSize', String(params.pageSize));
  }
  if (params.sort) search.set('sort', params.sort);
  return search;
}

/** A change to a list's URL: paging/search/sort fields, and filters (empty or undefined removes one). */
export interface ListSearchChange extends ListParams {
  filters?: Record<string, string | undefined>;
}

/**
 * Applies `change` to the current URL search, keeping the list's filters (which
 * {@link searchFromListParams} does not know about). Changing a filter goes back to page 1,
 * because the old page number may not exist in the filtered list.
 */
export function mergeListSearch(
  previous: URLSearchParams,
  change: ListSearchChange,
): URLSearchParams {
  const { filters, ...listChange } = change;
  const next = searchFromListParams({
    ...listParamsFromSearch(previous),
    ...listChange,
    ...(filters ? { page: 1 } : {}),
  });
  for (const [key, value] of previous) {
    if (!(LIST_KEYS as readonly string[]).includes(key) && !next.has(key)) next.set(key, value);
  }
  for (const [key, value] of Object.entries(filters ?? {})) {
    if (value) next.set(key, value);
    else next.delete(key);
  }
  return next;
}

/** Reads one filter from the URL if it is one of `allowed`, else `undefined` (junk is ignored). */
export function filterFromSearch<const T extends string>(
  search: URLSearchParams,
  key: string,
  allowed: readonly T[],
): T | undefined {
  const value = search.get(key);
  return value !== null && (allowed as readonly string[]).includes(value)
    ? (value as T)
    : undefined;
}

/** Reads a positive whole-number id filter (e.g. `customerId`) from the URL, else `undefined`. */
export function idFilterFromSearch(search: URLSearchParams, key: string): number | undefined {
  const n = Number(search.get(key));
  return Number.isInteger(n) && n >= 1 ? n : undefined;
}

/** Number of pages for `total` rows (at least 1, so "page 1 of 1" shows for an empty list). */
export function pageCount(total: number, pageSize: number): number {
  return Math.max(1, Math.ceil(total / Math.max(1, pageSize)));
}
