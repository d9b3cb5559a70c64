import { useState } from 'react';
import type { ReadyOrder } from '../../../../shared/api/production';
import { Alert, Button, Card } from '../../../components/ui';
import { formatDate } from '../../../lib/format';
import { DeliveryDialog } from './DeliveryDialog';

/** The board's list of orders ready to go out; the foreman signs off each delivery. */
export function ReadyToDeliver({
  orders,
  canSignOff,
}: {
  orders: ReadyOrder[];
  canSignOff: boolean;
}) {
  const [signing, setSigning] = useState<ReadyOrder | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  // Kept while signing: the list empties when the board refetches, before the dialog hears back.
  if (orders.length === 0 && !notice && !signing) return null;
  return (
    <Card title="Ready to deliver" className="mb-4">
      {notice ? (
        <Alert tone="success" className="mb-3">
          {notice}
        </Alert>
      ) : null}
      <ul className="divide-y divide-sand-100">
        {orders.map((o) => (
          <li key={o.id} className="flex flex-wrap items-center justify-between gap-3 py-2">
            <div>
              <span className="font-semibold">{o.number}</span> · {o.customer}
              <div className="text-sm text-sand-600">
                {o.promisedOn ? `Promised ${formatDate(o.promisedOn)}` : 'No promised date'} ·{' '}
                {o.loaded ? 'all loaded' : 'still loading'}
              </div>
            </div>
            {canSignOff ? (
              <Button
                className="min-h-12 px-5"
                disabled={!o.loaded}
                title={o.loaded ? undefined : 'Load every truss first'}
                onClick={() => setSigning(o)}
              >
                Sign off delivery
              </Button>
            ) : null}
          </li>
        ))}
      </ul>
      {signing ? (
        <DeliveryDialog order={signing} open onClose={() => setSigning(null)} onDone={setNotice} />
      ) : null}
    </Card>
  );
}
