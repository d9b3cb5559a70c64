import type { CustomerSummary } from '../../shared/api/list';
import type { Customer } from '../models';

export function presentCustomerSummary(
  c: Customer & { get(k: 'jobCount'): unknown },
): CustomerSummary {
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
