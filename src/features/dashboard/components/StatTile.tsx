import type { ReactNode } from 'react';
import { Spinner } from '../../../components/ui';

/** Props of {@link StatTile}. `value` undefined shows a spinner; null shows a dash (failed). */
export interface StatTileProps {
  label: string;
  value: number | null | undefined;
  detail?: ReactNode;
}

/** One headline number on a landing page. */
export function StatTile({ label, value, detail }: StatTileProps) {
  return (
    <div className="rounded-md border border-sand-200 bg-white px-4 py-3 shadow-card">
      <p className="text-sm font-medium text-sand-600">{label}</p>
      <p className="mt-1 text-2xl font-semibold text-sand-900 tabular-nums">
        {value === undefined ? <Spinner size="sm" label="" /> : value === null ? '—' : value}
      </p>
      {detail ? <div className="mt-1 text-xs text-sand-600">{detail}</div> : null}
    </div>
  );
}
