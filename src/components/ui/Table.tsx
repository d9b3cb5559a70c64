import {
  createColumnHelper,
  rowPaginationFeature,
  rowSortingFeature,
  tableFeatures,
  useTable,
  type ColumnDef,
  type ColumnHelper,
  type RowData,
  type SortingState,
  type Updater,
} from '@tanstack/react-table';
import clsx from 'clsx';
import type { MouseEvent, ReactNode } from 'react';
import { useNavigate } from 'react-router';
import { sortingFromParam, sortParamFromSorting } from '../../lib/sorting';
import { SortHeader } from './SortHeader';

/**
 * Table features: sorting and paging state only. No sorted or paginated row model is registered
 * and both run in manual mode, because the server sorts and pages; the table lays out the rows
 * it is given and turns header clicks into a new sort.
 */
export const coreTableFeatures = tableFeatures({ rowSortingFeature, rowPaginationFeature });
/** Feature set type of {@link coreTableFeatures}. */
export type CoreTableFeatures = typeof coreTableFeatures;
/** A column of a {@link DataTable}. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- columns differ in value type
export type TableColumn<T extends RowData> = ColumnDef<CoreTableFeatures, T, any>;

/** A typed column helper for rows of type `T`. */
export function tableColumnHelper<T extends RowData>(): ColumnHelper<CoreTableFeatures, T> {
  return createColumnHelper<CoreTableFeatures, T>();
}

/** Server-side sorting of a {@link DataTable}: the API's `sort` value and which columns sort. */
export interface TableSorting {
  /** The current `sort` parameter, e.g. `name` or `-createdAt`. */
  sort: string | undefined;
  onSort: (sort: string | undefined) => void;
  /** Column ids the server can sort by (ids equal the API's sort keys). */
  columns: readonly string[];
}

/** Props of {@link DataTable}. Keep `columns` stable (module scope or memo). */
export interface DataTableProps<T extends RowData> {
  columns: TableColumn<T>[];
  data: T[];
  /** Accessible name of the table. */
  caption: string;
  /** Shown in place of the rows when `data` is empty. */
  empty?: ReactNode;
  rowKey?: (row: T) => string | number;
  /** Makes the listed column headers sort buttons; the parent refetches with the new sort. */
  sorting?: TableSorting;
  /** Extra classes of each body row (e.g. to mark a locked line). */
  rowClassName?: (row: T) => string | undefined;
  /**
   * Where a row leads: the whole row opens it on click (and highlights on hover). Keep a link to
   * the same place in one cell, so the keyboard reaches it.
   */
  rowHref?: (row: T) => string;
}

/** A click on a row's own link, button or field, or a text selection, is not a row click. */
const isOwnClick = (e: MouseEvent<HTMLTableRowElement>) =>
  (e.target as HTMLElement).closest('a,button,input,select,textarea,label,summary') !== null ||
  (window.getSelection()?.toString() ?? '') !== '';

const NO_SORTING: SortingState = [];

/** A plain, readable data table; scrolls sideways on narrow screens instead of squashing. */
export function DataTable<T extends RowData>({
  columns,
  data,
  caption,
  empty,
  rowKey,
  sorting,
  rowClassName,
  rowHref,
}: DataTableProps<T>) {
  const navigate = useNavigate();
  const sortingState = sorting ? sortingFromParam(sorting.sort) : NO_SORTING;
  const table = useTable({
    features: coreTableFeatures,
    columns,
    data,
    getRowId: rowKey ? (row) => String(rowKey(row)) : undefined,
    manualSorting: true,
    manualPagination: true,
    enableMultiSort: false,
    // Clicking a sorted column flips it rather than clearing it: a list always has an order.
    enableSortingRemoval: false,
    enableSorting: !!sorting,
    state: { sorting: sortingState },
    onSortingChange: (updater: Updater<SortingState>) => {
      if (!sorting) return;
      const next = typeof updater === 'function' ? updater(sortingState) : updater;
      sorting.onSort(sortParamFromSorting(next));
    },
  });
  const rows = table.getRowModel().rows;
  const sortable = new Set(sorting?.columns ?? []);

  return (
    <div className="data-table relative overflow-x-auto">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-sand-100 text-xs font-semibold tracking-wide text-sand-700 uppercase">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const canSort = sortable.has(header.column.id);
                const direction = canSort ? header.column.getIsSorted() : false;
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={
                      direction === 'asc'
                        ? 'ascending'
                        : direction === 'desc'
                          ? 'descending'
                          : undefined
                    }
                    className="px-4 py-2.5 whitespace-nowrap"
                  >
                    {header.isPlaceholder ? null : canSort ? (
                      <SortHeader
                        direction={direction}
                        onClick={() => header.column.toggleSorting(direction === 'asc')}
                      >
                        <table.FlexRender header={header} />
                      </SortHeader>
                    ) : (
                      <table.FlexRender header={header} />
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody className="divide-y divide-sand-200">
          {rows.map((row) => {
            const href = rowHref?.(row.original);
            return (
              <tr
                key={row.id}
                className={clsx(
                  rowClassName?.(row.original),
                  href && 'cursor-pointer hover:bg-sand-50 focus-within:bg-sand-50',
                )}
                onClick={
                  href
                    ? (e) => {
                        if (isOwnClick(e)) return;
                        if (e.metaKey || e.ctrlKey) window.open(href, '_blank');
                        else void navigate(href);
                      }
                    : undefined
                }
              >
                {row.getAllCells().map((cell) => (
                  <td key={cell.id} className="px-4 py-2.5 align-middle text-sand-800">
                    <table.FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
            );
          })}
        </tbody>
      </table>
      {rows.length === 0 ? (empty ?? <p className="px-4 py-6 text-sand-600">No rows.</p>) : null}
    </div>
  );
}
