import { useState } from 'react';
import type { HeldOrder } from '../../../../shared/api/production';
import { Button, Card } from '../../../components/ui';
import { formatDate } from '../../../lib/format';
import { HoldReleaseDialog } from './HoldReleaseDialog';

/** The board's orders on hold, with the reason; the plant manager releases them from here. */
export function HeldOrders({
  orders,
  canRelease,
  onDone,
}: {
  orders: HeldOrder[];
  canRelease: boolean;
  onDone: (message: string) => void;
}) {
  const [releasing, setReleasing] = useState<HeldOrder | null>(null);
  if (orders.length === 0 && !releasing) return null;
  return (
    <Card title="On hold" className="mb-4">
      <ul className="divide-y divide-sand-100">
        {orders.map((o) => (
          <li key={o.id} className="flex flex-wrap items-center justify-between gap-3 py-2">
            <div>
              <span className="font-semibold">{o.number}</span> · {o.customer}
              <div className="text-sm text-sand-600">
                {o.holdReason ?? 'No reason given.'} ·{' '}
                {o.promisedOn ? `Promised ${formatDate(o.promisedOn)}` : 'No promised date'}
              </div>
            </div>
            {canRelease ? (
              <Button
                className="min-h-12 px-5"
                aria-label={`Release order ${o.number}`}
                onClick={() => setReleasing(o)}
              >
                Release
              </Button>
            ) : null}
          </li>
        ))}
      </ul>
      {releasing ? (
        <HoldReleaseDialog
          mode="release"
          // The list as now fetched: after a 409 the next try carries the order's current version.
          order={orders.find((o) => o.id === releasing.id) ?? releasing}
          open
          onClose={() => setReleasing(null)}
          onDone={onDone}
        />
      ) : null}
    </Card>
  );
}
