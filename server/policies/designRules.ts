import { hasRole } from './predicates';

/** The plant's design rules: the desk and the reviewer read them; only the plant manager changes them. */
export const designRulesPolicy = {
  show: hasRole('admin', 'engineer', 'sales', 'foreman'),
  update: hasRole('admin'),
};
