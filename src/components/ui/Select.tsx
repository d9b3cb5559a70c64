import clsx from 'clsx';
import type { Ref, SelectHTMLAttributes } from 'react';
import { controlClass } from './Input';

/** Props of {@link Select}. */
export interface SelectProps extends SelectHTMLAttributes<HTMLSelectElement> {
  invalid?: boolean;
  /** Compact height for table rows. */
  controlSize?: 'sm' | 'md';
  ref?: Ref<HTMLSelectElement>;
}

/** A native select (keyboard- and screen-reader-friendly by default). */
export function Select({ invalid, controlSize, className, children, ...rest }: SelectProps) {
  return (
    <select
      aria-invalid={invalid || undefined}
      className={clsx(controlClass(invalid, controlSize), 'pr-8', className)}
      {...rest}
    >
      {children}
    </select>
  );
}
