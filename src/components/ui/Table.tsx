import {
  createColumnHelper,
  tableFeatures,
  useTable,
  type ColumnDef,
  type ColumnHelper,
  type RowData,
} from '@tanstack/react-table';
import type { ReactNode } from 'react';

/**
 * Core-only table features: paging, search and sort happen on the server, so the table only
 * lays out the rows it is given.
 */
export const coreTableFeatures = tableFeatures({});
/** Feature set type of {@link coreTableFeatures}. */
export type CoreTableFeatures = typeof coreTableFeatures;
/** A column of a {@link DataTable}. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- columns differ in value type
export type TableColumn<T extends RowData> = ColumnDef<CoreTableFeatures, T, any>;

/** A typed column helper for rows of type `T`. */
export function tableColumnHelper<T extends RowData>(): ColumnHelper<CoreTableFeatures, T> {
  return createColumnHelper<CoreTableFeatures, T>();
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
}

/** A plain, readable data table; scrolls sideways on narrow screens instead of squashing. */
export function DataTable<T extends RowData>({
  columns,
  data,
  caption,
  empty,
  rowKey,
}: DataTableProps<T>) {
  const table = useTable({
    features: coreTableFeatures,
    columns,
    data,
    getRowId: rowKey ? (row) => String(rowKey(row)) : undefined,
  });
  const rows = table.getRowModel().rows;

  return (
    <div className="relative overflow-x-auto">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-sand-100 text-xs font-semibold tracking-wide text-sand-700 uppercase">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => (
                <th key={header.id} scope="col" className="px-4 py-2.5 whitespace-nowrap">
                  {header.isPlaceholder ? null : <table.FlexRender header={header} />}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody className="divide-y divide-sand-200">
          {rows.map((row) => (
            <tr key={row.id} className="hover:bg-sand-50">
              {row.getAllCells().map((cell) => (
                <td key={cell.id} className="px-4 py-2.5 align-middle text-sand-800">
                  <table.FlexRender cell={cell} />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      {rows.length === 0 ? (empty ?? <p className="px-4 py-6 text-sand-600">No rows.</p>) : null}
    </div>
  );
}
