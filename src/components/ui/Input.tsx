import clsx from 'clsx';
import type { InputHTMLAttributes, Ref } from 'react';
import { focusRing } from './focus';

/** Props of {@link Input}; `invalid` sets the error border and `aria-invalid`. */
export interface InputProps extends InputHTMLAttributes<HTMLInputElement> {
  invalid?: boolean;
  ref?: Ref<HTMLInputElement>;
}

/** Shared look of text inputs and selects. */
export const controlClass = (invalid?: boolean, size: 'sm' | 'md' = 'md') =>
  clsx(
    'block w-full rounded border bg-white text-sand-900 placeholder:text-sand-500',
    size === 'sm' ? 'h-8 px-2 text-sm' : 'h-10 px-3 text-base',
    'disabled:bg-sand-100 disabled:text-sand-500',
    invalid ? 'border-danger-600' : 'border-sand-300 hover:border-sand-400',
    focusRing,
  );

/** A text input. */
export function Input({ invalid, className, ...rest }: InputProps) {
  return (
    <input
      aria-invalid={invalid || undefined}
      className={clsx(controlClass(invalid), className)}
      {...rest}
    />
  );
}
