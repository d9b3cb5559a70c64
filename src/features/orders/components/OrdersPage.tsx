import { ORDER_STATUSES } from '../../../../shared/api/orders';
import type { Role } from '../../../../shared/api/roles';
import {
  EmptyState,
  FilterSelect,
  ListToolbar,
  PagedTable,
  PageHeader,
  SearchBox,
} from '../../../components/ui';
import { BuilderFilter } from '../../../components/filters/BuilderFilter';
import { useListParams } from '../../../lib/use-list-params';
import { orderListParamsFromSearch, useOrders } from '../api/list-orders';
import { ORDER_STATUS_LABELS } from '../order-status';
import { ORDER_SORT_COLUMNS, orderColumns } from './order-columns';

/** `/orders`: orders by status and builder; sort, search and page through the URL. */
export function OrdersPage({ role }: { role: Role }) {
  const { params, search, update } = useListParams();
  const query = orderListParamsFromSearch(search);
  const orders = useOrders(query);
  const filtered = !!(params.q || query.status || query.customerId || query.jobId);
  return (
    <>
      <PageHeader
        title={role === 'builder' ? 'Your orders' : 'Orders'}
        description={
          role === 'builder'
            ? 'Your company’s truss orders with the plant.'
            : 'Truss orders of every builder, newest changes first.'
        }
      />
      <ListToolbar>
        <SearchBox
          label="Search orders"
          placeholder="Order number, job or builder"
          value={params.q}
          onSearch={(q) => update({ q, page: 1 })}
        />
        <FilterSelect
          id="filter-status"
          label="Status"
          allLabel="Any status"
          value={query.status ?? ''}
          onChange={(status) => update({ filters: { status } })}
        >
          {ORDER_STATUSES.map((status) => (
            <option key={status} value={status}>
              {ORDER_STATUS_LABELS[status]}
            </option>
          ))}
        </FilterSelect>
        <BuilderFilter
          role={role}
          value={query.customerId}
          onChange={(customerId) => update({ filters: { customerId } })}
        />
      </ListToolbar>
      <PagedTable
        query={orders}
        what="orders"
        caption="Orders"
        columns={orderColumns}
        rowKey={(order) => order.id}
        rowHref={(order) => `/orders/${order.id}`}
        sorting={{
          sort: query.sort,
          onSort: (sort) => update({ sort, page: 1 }),
          columns: ORDER_SORT_COLUMNS,
        }}
        empty={
          <EmptyState title={filtered ? 'No orders match this search' : 'No orders yet'}>
            {filtered
              ? 'Try other words, or another status.'
              : role === 'builder'
                ? 'Orders appear here once the plant starts one for your jobs.'
                : 'Orders are started from a job’s page with “New order”.'}
          </EmptyState>
        }
        onPage={(p) => update({ page: p })}
      />
    </>
  );
}
