import type { ReactNode } from 'react';

/** Props of {@link PageHeader}. */
export interface PageHeaderProps {
  title: string;
  description?: ReactNode;
  actions?: ReactNode;
}

/** The page's single `<h1>` with an optional line of context and actions on the right. */
export function PageHeader({ title, description, actions }: PageHeaderProps) {
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
      <div>
        <h1 className="text-2xl font-semibold tracking-tight text-sand-900">{title}</h1>
        {description ? <p className="mt-1 text-base text-sand-600">{description}</p> : null}
      </div>
      {actions ? <div className="flex items-center gap-2 print:hidden">{actions}</div> : null}
    </div>
  );
}
