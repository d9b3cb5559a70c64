import type { CustomerSummary } from '../../shared/api/list';
import type { CustomerDetail } from '../../shared/api/customers';
import type { Customer } from '../models';

type WithJobCount = Customer & { get(k: 'jobCount'): unknown };

/** A row of the builders table. */
export function presentCustomerSummary(c: WithJobCount): CustomerSummary {
  return {
    id: c.id,
    name: c.name,
    email: c.email,
    phone: c.phone,
    terms: c.terms,
    city: c.city,
    jobCount: Number(c.get('jobCount') ?? 0),
  };
}

/** A builder company's page. */
export function presentCustomer(c: WithJobCount): CustomerDetail {
  return {
    ...presentCustomerSummary(c),
    billingAddress: c.billingAddress,
    contacts: c.contacts ?? [],
    createdAt: c.createdAt.toISOString(),
  };
}
