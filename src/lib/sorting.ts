/** One column sort as TanStack Table holds it (`SortingState` is an array of these). */
export interface ColumnSortState {
  id: string;
  desc: boolean;
}

/**
 * Turns the API's `sort` parameter (`name`, `-createdAt`) into table sorting state. Only one
 * column sorts at a time: the list endpoints take a single sort key (shared/api/list.ts).
 */
export function sortingFromParam(sort: string | undefined): ColumnSortState[] {
  if (!sort) return [];
  const desc = sort.startsWith('-');
  const id = desc ? sort.slice(1) : sort;
  return id ? [{ id, desc }] : [];
}

/** Turns table sorting state back into the API's `sort` parameter; `undefined` when unsorted. */
export function sortParamFromSorting(sorting: readonly ColumnSortState[]): string | undefined {
  const first = sorting[0];
  if (!first) return undefined;
  return first.desc ? `-${first.id}` : first.id;
}
