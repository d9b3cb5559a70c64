import clsx from 'clsx';
import type { ReactNode } from 'react';
import { focusRing } from './focus';

/** Props of {@link SortHeader}. */
export interface SortHeaderProps {
  direction: false | 'asc' | 'desc';
  onClick: () => void;
  children: ReactNode;
}

/** A column header that sorts on click; the arrow shows the current direction. */
export function SortHeader({ direction, onClick, children }: SortHeaderProps) {
  return (
    <button
      type="button"
      onClick={onClick}
      className={clsx(
        '-mx-1 inline-flex items-center gap-1 rounded px-1 uppercase hover:text-sand-900',
        direction ? 'text-sand-900' : undefined,
        focusRing,
      )}
    >
      {children}
      <svg viewBox="0 0 10 12" className="h-3 w-2.5" aria-hidden="true">
        <path
          d="M5 1 8.5 5h-7z"
          fill="currentColor"
          opacity={direction === 'asc' ? 1 : direction ? 0.25 : 0.4}
        />
        <path
          d="M5 11 1.5 7h7z"
          fill="currentColor"
          opacity={direction === 'desc' ? 1 : direction ? 0.25 : 0.4}
        />
      </svg>
      <span className="sr-only">
        {direction === 'asc'
          ? ', sorted ascending; click to sort descending'
          : direction === 'desc'
            ? ', sorted descending; click to sort ascending'
            : ', click to sort'}
      </span>
    </button>
  );
}
