import { useState } from 'react';
import type { Schedule, ScheduleBlock } from '../../../../shared/api/production';
import { Button, Card, DetailList, TextLink } from '../../../components/ui';
import { formatDate } from '../../../lib/format';
import { hours } from './board-warnings';
import { HoldReleaseDialog } from './HoldReleaseDialog';

type ScheduleOrder = Schedule['orders'][number];

/**
 * The panel of the block tapped on the board: the order's dates and this day's work; the plant
 * manager holds the order from here (it leaves the schedule and the rest re-plans).
 */
export function OrderPanel({
  block,
  order,
  canHoldRelease,
  onClose,
  onDone,
}: {
  block: ScheduleBlock;
  order: ScheduleOrder | undefined;
  canHoldRelease: boolean;
  onClose: () => void;
  onDone: (message: string) => void;
}) {
  const [holding, setHolding] = useState(false);
  const late = order?.late ?? false;
  return (
    <Card
      title={`Order ${block.number}`}
      className="mb-4"
      actions={
        <div className="flex flex-wrap gap-2">
          {canHoldRelease && order ? (
            <Button className="min-h-12 px-5" variant="danger" onClick={() => setHolding(true)}>
              Hold
            </Button>
          ) : null}
          <Button className="min-h-12 px-5" variant="secondary" onClick={onClose}>
            Close
          </Button>
        </div>
      }
    >
      <DetailList
        items={[
          { label: 'Builder', value: block.customer },
          {
            label: 'Promised delivery',
            value: order?.promisedOn ? formatDate(order.promisedOn) : 'Not promised',
          },
          {
            label: 'Planned to finish',
            value: order?.plannedFinishOn
              ? `${formatDate(order.plannedFinishOn)}${late ? ' — after the promised date' : ''}`
              : 'Beyond the plan',
          },
          {
            label: `On ${formatDate(block.date)}`,
            value: `${block.trusses} trusses (${block.marks.join(', ')}), ${hours(block.minutes)}`,
          },
        ]}
      />
      <p className="mt-3">
        <TextLink to={`/orders/${block.orderId}`}>Open the order</TextLink>
      </p>
      {holding && order ? (
        <HoldReleaseDialog
          mode="hold"
          order={order}
          open
          onClose={() => setHolding(false)}
          onDone={(m) => {
            onDone(m);
            onClose();
          }}
        />
      ) : null}
    </Card>
  );
}
