import type { ReactNode } from 'react';

/** Props of {@link EmptyState}. */
export interface EmptyStateProps {
  title: string;
  children?: ReactNode;
  action?: ReactNode;
}

/** Says plainly that there is nothing here yet, and what would put something here. */
export function EmptyState({ title, children, action }: EmptyStateProps) {
  return (
    <div className="flex flex-col items-center gap-2 px-4 py-10 text-center">
      <p className="text-base font-medium text-sand-800">{title}</p>
      {children ? <div className="max-w-md text-sm text-sand-600">{children}</div> : null}
      {action ? <div className="mt-2">{action}</div> : null}
    </div>
  );
}
