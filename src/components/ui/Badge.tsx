import clsx from 'clsx';
import type { ReactNode } from 'react';

/** Colour intent of a {@link Badge}. */
export type BadgeTone = 'neutral' | 'brand' | 'success' | 'warning' | 'danger' | 'info';

const tones: Record<BadgeTone, string> = {
  neutral: 'bg-sand-100 text-sand-700 border-sand-200',
  brand: 'bg-timber-50 text-timber-700 border-timber-200',
  success: 'bg-success-50 text-success-800 border-success-200',
  warning: 'bg-warning-50 text-warning-800 border-warning-200',
  danger: 'bg-danger-50 text-danger-800 border-danger-200',
  info: 'bg-info-50 text-info-800 border-info-200',
};

/** A small status label. */
export function Badge({ tone = 'neutral', children }: { tone?: BadgeTone; children: ReactNode }) {
  return (
    <span
      className={clsx(
        'inline-flex items-center rounded-sm border px-2 py-0.5 text-xs font-medium whitespace-nowrap',
        tones[tone],
      )}
    >
      {children}
    </span>
  );
}
