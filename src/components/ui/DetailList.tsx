import type { ReactNode } from 'react';

/** One label/value pair of a {@link DetailList}. */
export interface DetailItem {
  label: string;
  value: ReactNode;
}

/** Read-only facts as a description list: label above value, two columns on wide screens. */
export function DetailList({ items }: { items: DetailItem[] }) {
  return (
    <dl className="grid gap-x-6 gap-y-4 sm:grid-cols-2">
      {items.map((item) => (
        <div key={item.label} className="min-w-0">
          <dt className="text-xs font-semibold tracking-wide text-sand-600 uppercase">
            {item.label}
          </dt>
          <dd className="mt-0.5 text-base break-words whitespace-pre-line text-sand-900">
            {item.value}
          </dd>
        </div>
      ))}
    </dl>
  );
}
