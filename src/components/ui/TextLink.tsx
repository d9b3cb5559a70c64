import clsx from 'clsx';
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { focusRing } from './focus';

/** Props of {@link TextLink}. */
export interface TextLinkProps {
  to: string;
  children: ReactNode;
  className?: string;
}

/** An in-app text link in the design system's link style. */
export function TextLink({ to, children, className }: TextLinkProps) {
  return (
    <Link
      to={to}
      className={clsx(
        'font-medium text-timber-700 underline-offset-2 hover:underline focus-visible:rounded',
        focusRing,
        className,
      )}
    >
      {children}
    </Link>
  );
}

/** Props of {@link LinkButton}. */
export interface LinkButtonProps extends TextLinkProps {
  variant?: 'primary' | 'secondary';
  size?: 'sm' | 'md';
  /** Accessible name when the visible text is shorter than the action ("Edit" → "Edit T1"). */
  'aria-label'?: string;
}

/** A link that looks like a button, for actions that open another page ("Add truss"). */
export function LinkButton({
  to,
  children,
  className,
  variant = 'primary',
  size = 'md',
  'aria-label': ariaLabel,
}: LinkButtonProps) {
  return (
    <Link
      to={to}
      aria-label={ariaLabel}
      className={clsx(
        'inline-flex items-center justify-center gap-2 rounded font-medium whitespace-nowrap transition-colors',
        size === 'sm' ? 'h-8 px-3 text-sm' : 'h-10 px-4 text-base',
        // A button-like link is a control: paper has no use for it.
        'print:hidden',
        variant === 'primary'
          ? 'bg-timber-600 text-white hover:bg-timber-700 active:bg-timber-800'
          : 'border border-sand-300 bg-white text-sand-900 hover:bg-sand-100',
        focusRing,
        className,
      )}
    >
      {children}
    </Link>
  );
}
