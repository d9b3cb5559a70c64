import clsx from 'clsx';
import type { ButtonHTMLAttributes } from 'react';
import { focusRing } from './focus';
import { Spinner } from './Spinner';

/** Visual weight of a button. */
export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'ghost' | 'inverse';

const variants: Record<ButtonVariant, string> = {
  primary: 'bg-timber-600 text-white hover:bg-timber-700 active:bg-timber-800',
  secondary: 'border border-sand-300 bg-white text-sand-900 hover:bg-sand-100',
  danger: 'bg-danger-600 text-white hover:bg-danger-700',
  ghost: 'text-sand-700 hover:bg-sand-100 hover:text-sand-900',
  // For the dark header bar.
  inverse:
    'border border-timber-500 bg-timber-700 text-white hover:bg-timber-600 focus-visible:outline-white',
};

/** Props of {@link Button}: native button props plus variant, size and a busy state. */
export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  size?: 'sm' | 'md';
  /** Shows a spinner and disables the button while an action runs. */
  busy?: boolean;
}

/** A button; defaults to `type="button"` so it never submits a form by accident. */
export function Button({
  variant = 'primary',
  size = 'md',
  busy = false,
  className,
  children,
  disabled,
  type = 'button',
  ...rest
}: ButtonProps) {
  return (
    <button
      type={type}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      className={clsx(
        'inline-flex items-center justify-center gap-2 rounded font-medium whitespace-nowrap transition-colors',
        'disabled:cursor-not-allowed disabled:opacity-60',
        // Controls do not print: a printed page is a document.
        'print:hidden',
        size === 'sm' ? 'h-8 px-3 text-sm' : 'h-10 px-4 text-base',
        variants[variant],
        focusRing,
        className,
      )}
      {...rest}
    >
      {busy ? <Spinner size="sm" label="" /> : null}
      {children}
    </button>
  );
}
