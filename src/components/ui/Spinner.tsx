import clsx from 'clsx';

/** Props of {@link Spinner}. An empty label hides it from assistive tech (decorative). */
export interface SpinnerProps {
  size?: 'sm' | 'md';
  label?: string;
  className?: string;
}

/** A small rotating ring with a readable label so loading is never silent. */
export function Spinner({ size = 'md', label = 'Loading…', className }: SpinnerProps) {
  return (
    <span
      className={clsx('inline-flex items-center gap-2 text-sand-600', className)}
      role={label ? 'status' : undefined}
    >
      <span
        aria-hidden="true"
        className={clsx(
          'animate-spin rounded-full border-2 border-current border-r-transparent',
          size === 'sm' ? 'h-4 w-4' : 'h-5 w-5',
        )}
      />
      {label ? <span className="text-sm">{label}</span> : null}
    </span>
  );
}
