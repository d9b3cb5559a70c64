import { useQuery } from '@tanstack/react-query';
import { customerSummarySchema, pageOf } from '../../../../shared/api/list';
import { filterFromSearch, listParamsFromSearch } from '../../../lib/list-params';
import { pagedListQueryOptions } from '../../../lib/paged-list';
import { customerKeys, type ListParams } from '../../../lib/query-keys';

const customerPageSchema = pageOf(customerSummarySchema);

/** Payment terms a builder company can have (shared/api/customers.ts). */
export const CUSTOMER_TERMS = ['account', 'deposit'] as const;
/** One of {@link CUSTOMER_TERMS}. */
export type CustomerTerms = (typeof CUSTOMER_TERMS)[number];

/** Query of `GET /api/customers`: list params plus the terms filter. */
export interface CustomerListParams extends ListParams {
  terms?: CustomerTerms;
}

/** `GET /api/customers`: a page of builder companies (staff only). */
export const customersQueryOptions = (params: CustomerListParams) =>
  pagedListQueryOptions({
    queryKey: customerKeys.list(params),
    path: '/api/customers',
    schema: customerPageSchema,
    params,
  });

/** One page of builder companies. */
export function useCustomers(params: CustomerListParams) {
  return useQuery(customersQueryOptions(params));
}

/** Builders sort by name unless the URL says otherwise (the server's default too). */
export const DEFAULT_BUILDER_SORT = 'name';

/** Reads the builders list's query (search, page, sort, terms) from the URL. */
export function customerListParamsFromSearch(search: URLSearchParams): CustomerListParams {
  const terms = filterFromSearch(search, 'terms', CUSTOMER_TERMS);
  const params = listParamsFromSearch(search);
  return { ...params, sort: params.sort ?? DEFAULT_BUILDER_SORT, ...(terms ? { terms } : {}) };
}
