import clsx from 'clsx';
import type { Ref, TextareaHTMLAttributes } from 'react';
import { focusRing } from './focus';

/** Props of {@link Textarea}; `invalid` sets the error border and `aria-invalid`. */
export interface TextareaProps extends TextareaHTMLAttributes<HTMLTextAreaElement> {
  invalid?: boolean;
  ref?: Ref<HTMLTextAreaElement>;
}

/** A multi-line text input with the same look as {@link Input}. */
export function Textarea({ invalid, className, rows = 3, ...rest }: TextareaProps) {
  return (
    <textarea
      rows={rows}
      aria-invalid={invalid || undefined}
      className={clsx(
        'block w-full rounded border bg-white px-3 py-2 text-base text-sand-900 placeholder:text-sand-500',
        'disabled:bg-sand-100 disabled:text-sand-500',
        invalid ? 'border-danger-600' : 'border-sand-300 hover:border-sand-400',
        focusRing,
        className,
      )}
      {...rest}
    />
  );
}
