/**
 * Hierarchical query keys, one factory per resource. Mutations invalidate a prefix (`users.all`)
 * so every list and detail below it refetches.
 */

/** Parameters of a paged list, as they appear in the key (and the URL). */
export interface ListParams {
  q?: string;
  page?: number;
  pageSize?: number;
  sort?: string;
}

/** Builds the standard `all / lists / list / details / detail` factory for one resource. */
function resourceKeys<const R extends string>(resource: R) {
  const all = [resource] as const;
  return {
    all,
    lists: () => [...all, 'list'] as const,
    list: (params: ListParams = {}) => [...all, 'list', params] as const,
    details: () => [...all, 'detail'] as const,
    detail: (id: number) => [...all, 'detail', id] as const,
  };
}

/** Query keys of the signed-in session. */
export const authKeys = {
  all: ['auth'] as const,
  me: () => ['auth', 'me'] as const,
  health: () => ['auth', 'health'] as const,
};

/** Query keys of plant users (admin). */
export const userKeys = resourceKeys('users');
/** Query keys of builder companies (customers). */
export const customerKeys = resourceKeys('customers');
/** Query keys of jobs. */
export const jobKeys = resourceKeys('jobs');

/** Query keys of orders; an order's lines live under its detail key (`orders.detail(id)`). */
export const orderKeys = {
  ...resourceKeys('orders'),
  /** One stored truss line of an order. */
  line: (orderId: number, lineId: number) => ['orders', 'detail', orderId, 'line', lineId] as const,
};
/** Query keys of the design reviewer's queue. */
export const reviewKeys = resourceKeys('reviews');
/** Query keys of stateless design previews (keyed by the input itself). */
export const designKeys = {
  all: ['designs'] as const,
  preview: (input: unknown) => ['designs', 'preview', input] as const,
  compare: (input: unknown) => ['designs', 'compare', input] as const,
};

/** Query keys of the signed-in user's plant. */
export const plantKeys = {
  all: ['plant'] as const,
  summary: () => ['plant', 'summary'] as const,
};

/** Every factory by resource name. */
export const queryKeys = {
  auth: authKeys,
  users: userKeys,
  customers: customerKeys,
  jobs: jobKeys,
  orders: orderKeys,
  reviews: reviewKeys,
  designs: designKeys,
  plant: plantKeys,
};

/** Query keys of the shop: orders ready for the saw and each order's cut list. */
export const shopKeys = {
  all: ['shop'] as const,
  orders: () => ['shop', 'orders'] as const,
  cutList: (orderId: number) => ['shop', 'cut-list', orderId] as const,
};

/**
 * Query keys of an order's outgoing mail (delivery states). They sit under the order's detail key,
 * so whatever refetches the order (a payment recorded, a quote sent) refetches its mail too.
 */
export const orderMailKeys = {
  list: (orderId: number) => [...orderKeys.detail(orderId), 'mail'] as const,
};

/** Query keys of the home pages' task lists (`GET /api/tasks`). */
export const taskKeys = {
  all: ['tasks'] as const,
  mine: () => ['tasks', 'mine'] as const,
};
