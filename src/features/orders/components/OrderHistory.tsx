import type { HistoryEntry } from '../../../../shared/api/orders';
import { Card, EmptyState } from '../../../components/ui';
import { formatDateTime } from '../../../lib/format';

/** The order's history (who, when, what), newest first whatever order the server sends. */
export function OrderHistory({ entries }: { entries: HistoryEntry[] }) {
  const newestFirst = [...entries].sort((a, b) => b.at.localeCompare(a.at) || b.id - a.id);
  return (
    <Card title="History">
      {newestFirst.length === 0 ? (
        <EmptyState title="Nothing recorded yet" />
      ) : (
        <ol className="flex flex-col gap-3">
          {newestFirst.map((entry) => (
            <li key={entry.id} className="grid gap-0.5 border-l-2 border-sand-200 pl-3 text-sm">
              <p className="text-sand-900">{entry.summary}</p>
              <p className="text-xs text-sand-600">
                <time dateTime={entry.at}>{formatDateTime(entry.at)}</time> ·{' '}
                {entry.actor ?? 'System'}
              </p>
            </li>
          ))}
        </ol>
      )}
    </Card>
  );
}
