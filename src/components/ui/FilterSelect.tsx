import type { ReactNode } from 'react';
import { Select } from './Select';

/** Props of {@link FilterSelect}. An empty `value` means "all". */
export interface FilterSelectProps {
  id: string;
  label: string;
  value: string;
  onChange: (value: string) => void;
  /** Label of the "no filter" choice, e.g. "All terms". */
  allLabel: string;
  disabled?: boolean;
  children: ReactNode;
}

/** A labelled select above a list that narrows it; applies at once (one request per change). */
export function FilterSelect({
  id,
  label,
  value,
  onChange,
  allLabel,
  disabled,
  children,
}: FilterSelectProps) {
  return (
    <div className="flex min-w-44 flex-col gap-1">
      <label htmlFor={id} className="text-xs font-semibold tracking-wide text-sand-600 uppercase">
        {label}
      </label>
      <Select
        id={id}
        value={value}
        disabled={disabled}
        onChange={(event) => onChange(event.target.value)}
      >
        <option value="">{allLabel}</option>
        {children}
      </Select>
    </div>
  );
}

/** The row above a list: search on the left, filters beside it; wraps on narrow screens. */
export function ListToolbar({ children }: { children: ReactNode }) {
  return <div className="mb-4 flex flex-wrap items-end gap-3">{children}</div>;
}

/** Props of {@link RecordFilter}. `choices` is undefined while they load. */
export interface RecordFilterProps {
  id: string;
  label: string;
  allLabel: string;
  choices: readonly { id: number; name: string }[] | undefined;
  value: number | undefined;
  /** The record id as URL text, or '' for "all". */
  onChange: (value: string) => void;
}

/** A {@link FilterSelect} over named records (e.g. builder companies), keyed by id. */
export function RecordFilter({ id, label, allLabel, choices, value, onChange }: RecordFilterProps) {
  return (
    <FilterSelect
      id={id}
      label={label}
      allLabel={choices ? allLabel : 'Loading…'}
      value={value ? String(value) : ''}
      disabled={!choices}
      onChange={onChange}
    >
      {choices?.map((c) => (
        <option key={c.id} value={c.id}>
          {c.name}
        </option>
      ))}
    </FilterSelect>
  );
}
