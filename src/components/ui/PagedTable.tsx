import type { RowData } from '@tanstack/react-table';
import { Card } from './Card';
import { Pager } from './Pager';
import { QueryState, type QueryStateProps } from './QueryState';
import { DataTable, type DataTableProps } from './Table';

/** One page of a server-paged list, as every list endpoint answers it. */
export interface PageOf<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

/** Props of {@link PagedTable}: the list query, and the table without its rows. */
export interface PagedTableProps<T extends RowData> extends Omit<DataTableProps<T>, 'data'> {
  query: QueryStateProps<PageOf<T>>['query'];
  /** What is listed, for the loading and error texts ("jobs"). */
  what: string;
  onPage: (page: number) => void;
}

/** A card with a server-paged table: loading and error states, the rows, and the pager. */
export function PagedTable<T extends RowData>({
  query,
  what,
  onPage,
  ...table
}: PagedTableProps<T>) {
  return (
    <Card flush>
      <QueryState query={query} what={what}>
        {(page) => (
          <>
            <DataTable {...table} data={page.items} />
            <Pager page={page.page} pageSize={page.pageSize} total={page.total} onPage={onPage} />
          </>
        )}
      </QueryState>
    </Card>
  );
}
