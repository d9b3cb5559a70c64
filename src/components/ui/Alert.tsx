import clsx from 'clsx';
import type { ReactNode } from 'react';
import { isApiError } from '../../lib/api-client';

/** Colour intent of an {@link Alert}. */
export type AlertTone = 'info' | 'success' | 'warning' | 'danger';

const tones: Record<AlertTone, string> = {
  info: 'border-info-200 bg-info-50 text-info-800',
  success: 'border-success-200 bg-success-50 text-success-800',
  warning: 'border-warning-200 bg-warning-50 text-warning-800',
  danger: 'border-danger-200 bg-danger-50 text-danger-800',
};

/** Props of {@link Alert}. */
export interface AlertProps {
  tone?: AlertTone;
  title?: string;
  children: ReactNode;
  className?: string;
}

/** A boxed message. Danger alerts use role="alert" so screen readers announce them at once. */
export function Alert({ tone = 'info', title, children, className }: AlertProps) {
  return (
    <div
      role={tone === 'danger' ? 'alert' : 'status'}
      className={clsx('rounded border px-4 py-3 text-sm', tones[tone], className)}
    >
      {title ? <p className="font-semibold">{title}</p> : null}
      <div>{children}</div>
    </div>
  );
}

/** Turns any thrown value into a sentence a person can act on. */
export function errorText(error: unknown): string {
  if (isApiError(error)) return error.message;
  if (error instanceof Error && error.message) return error.message;
  return 'Something went wrong. Try again.';
}

/** Props of {@link ErrorMessage}. */
export interface ErrorMessageProps {
  error: unknown;
  title?: string;
  onRetry?: () => void;
  className?: string;
}

/** A danger alert for a failed load or action, with an optional retry. */
export function ErrorMessage({ error, title, onRetry, className }: ErrorMessageProps) {
  return (
    <Alert tone="danger" title={title} className={className}>
      <span>{errorText(error)}</span>
      {onRetry ? (
        <button
          type="button"
          onClick={onRetry}
          className="ml-2 font-medium underline underline-offset-2 focus-visible:outline-2 focus-visible:outline-focus"
        >
          Try again
        </button>
      ) : null}
    </Alert>
  );
}
