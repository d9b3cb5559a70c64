import { useQuery } from '@tanstack/react-query';
import { customerSummarySchema, pageOf } from '../../../../shared/api/list';
import { pagedListQueryOptions } from '../../../lib/paged-list';
import { customerKeys, type ListParams } from '../../../lib/query-keys';

const customerPageSchema = pageOf(customerSummarySchema);

/** `GET /api/customers`: a page of builder companies (staff only). */
export const customersQueryOptions = (params: ListParams) =>
  pagedListQueryOptions({
    queryKey: customerKeys.list(params),
    path: '/api/customers',
    schema: customerPageSchema,
    params,
  });

/** One page of builder companies. */
export function useCustomers(params: ListParams) {
  return useQuery(customersQueryOptions(params));
}
