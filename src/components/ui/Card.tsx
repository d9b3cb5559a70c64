import clsx from 'clsx';
import type { ReactNode } from 'react';

/** Props of {@link Card}. */
export interface CardProps {
  title?: ReactNode;
  actions?: ReactNode;
  children: ReactNode;
  className?: string;
  /** Drops the body padding, for tables that run edge to edge. */
  flush?: boolean;
}

/** A white panel with an optional title row. */
export function Card({ title, actions, children, className, flush }: CardProps) {
  return (
    <section className={clsx('rounded-md border border-sand-200 bg-white shadow-card', className)}>
      {title || actions ? (
        <header className="flex items-center justify-between gap-3 border-b border-sand-200 px-4 py-3">
          {title ? <h2 className="text-lg font-semibold text-sand-900">{title}</h2> : <span />}
          {actions ? <div className="print:hidden">{actions}</div> : null}
        </header>
      ) : null}
      <div className={flush ? undefined : 'p-4'}>{children}</div>
    </section>
  );
}
