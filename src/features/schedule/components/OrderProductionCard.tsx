import { useState } from 'react';
import type { OrderDetail } from '../../../../shared/api/orders';
import { Alert, Button, Card, DetailList } from '../../../components/ui';
import { formatDate } from '../../../lib/format';
import { DeliveryDialog } from './DeliveryDialog';
import { HoldReleaseDialog } from './HoldReleaseDialog';
import { PromiseDialog } from './PromiseDialog';

/** What the signed-in role may do here (the server checks the same). */
export interface ProductionPermissions {
  /** Sales and the plant manager promise delivery dates. */
  canPromise: boolean;
  /** The plant manager holds and releases by hand. */
  canHoldRelease: boolean;
  /** The foreman and the plant manager sign off a delivery. */
  canSignOff: boolean;
}

type Open = 'promise' | 'hold' | 'release' | 'delivery' | null;

const PROMISABLE = ['accepted', 'deposit_paid', 'released', 'in_production', 'ready'];
const HOLDABLE = ['accepted', 'deposit_paid', 'released', 'in_production'];
const BEFORE_RELEASE = ['accepted', 'deposit_paid'];

/**
 * The order's production facts and changes for the desk and the plant: promised and planned
 * delivery, hold and release by hand, and the delivery sign-off. Shown once the builder accepted.
 */
export function OrderProductionCard({
  order,
  canPromise,
  canHoldRelease,
  canSignOff,
}: { order: OrderDetail } & ProductionPermissions) {
  const [open, setOpen] = useState<Open>(null);
  const [notice, setNotice] = useState<string | null>(null);
  if (!PROMISABLE.includes(order.status) && order.status !== 'delivered') return null;
  const close = () => setOpen(null);
  const late =
    order.promisedOn && order.plannedDeliveryOn && order.plannedDeliveryOn > order.promisedOn;
  const buttons = [
    canPromise && PROMISABLE.includes(order.status) ? (
      <Button key="promise" size="sm" variant="secondary" onClick={() => setOpen('promise')}>
        {order.promisedOn ? 'Change promised date' : 'Promise a date'}
      </Button>
    ) : null,
    canHoldRelease && order.onHold ? (
      <Button key="release" size="sm" onClick={() => setOpen('release')}>
        Release
      </Button>
    ) : null,
    canHoldRelease && !order.onHold && BEFORE_RELEASE.includes(order.status) ? (
      <Button key="release" size="sm" variant="secondary" onClick={() => setOpen('release')}>
        Release by hand
      </Button>
    ) : null,
    canHoldRelease && !order.onHold && HOLDABLE.includes(order.status) ? (
      <Button key="hold" size="sm" variant="secondary" onClick={() => setOpen('hold')}>
        Hold
      </Button>
    ) : null,
    canSignOff && order.status === 'ready' ? (
      <Button key="delivery" size="sm" onClick={() => setOpen('delivery')}>
        Sign off delivery
      </Button>
    ) : null,
  ].filter(Boolean);

  return (
    <Card
      title="Production"
      actions={buttons.length ? <div className="flex flex-wrap gap-2">{buttons}</div> : null}
    >
      {notice ? (
        <Alert tone="success" className="mb-4">
          {notice}
        </Alert>
      ) : null}
      {order.onHold ? (
        <Alert tone="warning" title="On hold" className="mb-4">
          <p>{order.holdReason ?? 'No reason given.'}</p>
          <p>It is off the schedule until released.</p>
        </Alert>
      ) : null}
      <DetailList
        items={[
          {
            label: 'Promised delivery',
            value: order.promisedOn ? formatDate(order.promisedOn) : 'Not promised yet',
          },
          {
            label: 'Planned delivery',
            value: order.plannedDeliveryOn
              ? `${formatDate(order.plannedDeliveryOn)}${late ? ' — after the promised date' : ''}`
              : 'Not on the schedule',
          },
        ]}
      />
      {open === 'promise' ? (
        <PromiseDialog order={order} open onClose={close} onDone={setNotice} />
      ) : null}
      {open === 'hold' || open === 'release' ? (
        <HoldReleaseDialog mode={open} order={order} open onClose={close} onDone={setNotice} />
      ) : null}
      {open === 'delivery' ? (
        <DeliveryDialog order={order} open onClose={close} onDone={setNotice} />
      ) : null}
    </Card>
  );
}
