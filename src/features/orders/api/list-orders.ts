import { useQuery } from '@tanstack/react-query';
import { pageOf } from '../../../../shared/api/list';
import {
  ORDER_STATUSES,
  orderSummarySchema,
  type OrderStatus,
} from '../../../../shared/api/orders';
import {
  filterFromSearch,
  idFilterFromSearch,
  listParamsFromSearch,
} from '../../../lib/list-params';
import { pagedListQueryOptions } from '../../../lib/paged-list';
import { orderKeys, type ListParams } from '../../../lib/query-keys';

const orderPageSchema = pageOf(orderSummarySchema);

/** Query of `GET /api/orders`: list params plus status, builder and job filters. */
export interface OrderListParams extends ListParams {
  status?: OrderStatus;
  customerId?: number;
  jobId?: number;
}

/** `GET /api/orders`: a page of orders (the server scopes builders to their company). */
export const ordersQueryOptions = (params: OrderListParams) =>
  pagedListQueryOptions({
    queryKey: orderKeys.list(params),
    path: '/api/orders',
    schema: orderPageSchema,
    params,
  });

/** One page of orders. */
export function useOrders(params: OrderListParams) {
  return useQuery(ordersQueryOptions(params));
}

/** Orders list most recently changed first unless the URL says otherwise (sent explicitly). */
export const DEFAULT_ORDER_SORT = '-updatedAt';

/** Reads the orders list's query (search, page, sort, status, builder, job) from the URL. */
export function orderListParamsFromSearch(search: URLSearchParams): OrderListParams {
  const status = filterFromSearch(search, 'status', ORDER_STATUSES);
  const customerId = idFilterFromSearch(search, 'customerId');
  const jobId = idFilterFromSearch(search, 'jobId');
  const params = listParamsFromSearch(search);
  return {
    ...params,
    sort: params.sort ?? DEFAULT_ORDER_SORT,
    ...(status ? { status } : {}),
    ...(customerId ? { customerId } : {}),
    ...(jobId ? { jobId } : {}),
  };
}
