import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  customerSchema,
  type CreateCustomerInput,
  type CustomerDetail,
  type UpdateCustomerInput,
} from '../../../../shared/api/customers';
import { api } from '../../../lib/api-client';
import { customerKeys, jobKeys } from '../../../lib/query-keys';

/** `GET /api/customers/:id` query options. */
export const customerQueryOptions = (id: number) =>
  queryOptions({
    queryKey: customerKeys.detail(id),
    queryFn: ({ signal }) =>
      api.request(`/api/customers/${id}`, { schema: customerSchema, signal }),
  });

/** One builder company with its contacts. */
export function useCustomer(id: number) {
  return useQuery(customerQueryOptions(id));
}

/** `POST /api/customers` → 201 CustomerDetail. */
export function createCustomer(body: CreateCustomerInput): Promise<CustomerDetail> {
  return api.request('/api/customers', { method: 'POST', body, schema: customerSchema });
}

/** `PATCH /api/customers/:id` → CustomerDetail. */
export function updateCustomer(id: number, change: UpdateCustomerInput): Promise<CustomerDetail> {
  return api.request(`/api/customers/${id}`, {
    method: 'PATCH',
    body: change,
    schema: customerSchema,
  });
}

/** Adds a builder company; every builders list refetches. */
export function useCreateCustomer() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCustomer,
    onSuccess: (customer) => {
      queryClient.setQueryData(customerKeys.detail(customer.id), customer);
      return queryClient.invalidateQueries({ queryKey: customerKeys.lists() });
    },
  });
}

/** Saves a change to a builder company; its page and every builders list refetch. */
export function useUpdateCustomer(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: UpdateCustomerInput) => updateCustomer(id, change),
    onSuccess: (customer) => {
      queryClient.setQueryData(customerKeys.detail(id), customer);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: customerKeys.lists() }),
        // Job pages show the builder's name.
        queryClient.invalidateQueries({ queryKey: jobKeys.all }),
      ]);
    },
  });
}
