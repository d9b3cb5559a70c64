import type { Role } from '../../../shared/api/roles';
import { useBuilderChoices } from '../../lib/builder-choices';
import { canListBuilders } from '../../lib/permissions';
import { RecordFilter } from '../ui';

/** Props of {@link BuilderFilter}. */
export interface BuilderFilterProps {
  role: Role;
  value: number | undefined;
  /** The company id as URL text, or '' for "all". */
  onChange: (customerId: string) => void;
}

/**
 * "Builder" filter of a list (jobs, orders); nothing for roles that may not list builder
 * companies.
 */
export function BuilderFilter({ role, value, onChange }: BuilderFilterProps) {
  const show = canListBuilders(role);
  const builders = useBuilderChoices(show);
  if (!show) return null;
  return (
    <RecordFilter
      id="filter-builder"
      label="Builder"
      allLabel="All builders"
      choices={builders.data?.items}
      value={value}
      onChange={onChange}
    />
  );
}
