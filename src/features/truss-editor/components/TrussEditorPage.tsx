import { useParams } from 'react-router';
import { ErrorMessage, PageHeader, Spinner } from '../../../components/ui';
import { useJob } from '../api/get-job';
import { useLine } from '../api/get-line';
import { useOrder } from '../api/get-order';
import { usePlant } from '../api/get-plant';
import { designToFormValues } from '../form/convert';
import { nextFreeMark } from '../../../../shared/api/marks';
import { newTrussFormValues } from '../form/values';
import { TrussEditor } from './TrussEditor';

const positiveId = (text: string | undefined) => {
  const n = Number(text);
  return Number.isInteger(n) && n > 0 ? n : undefined;
};

/**
 * `/orders/:orderId/lines/new` and `/orders/:orderId/lines/:lineId`: loads the order, its job
 * (for the starting loads), the plant (for units) and the stored line, then opens the editor.
 */
export function TrussEditorPage() {
  const params = useParams();
  const orderId = positiveId(params.orderId) ?? 0;
  const lineId = params.lineId === undefined ? undefined : (positiveId(params.lineId) ?? 0);
  const order = useOrder(orderId);
  const job = useJob(order.data?.job.id);
  const plant = usePlant();
  const line = useLine(orderId, lineId);
  const queries = [order, job, plant, ...(lineId === undefined ? [] : [line])];
  const failed = queries.find((q) => q.error);

  if (failed) {
    return (
      <>
        <PageHeader title="Truss editor" />
        <ErrorMessage
          title="Could not open the truss"
          error={failed.error}
          onRetry={() => queries.forEach((q) => void q.refetch())}
        />
      </>
    );
  }
  if (!order.data || !job.data || !plant.data || (lineId !== undefined && !line.data)) {
    return (
      <>
        <PageHeader title="Truss editor" />
        <Spinner label="Loading the truss…" />
      </>
    );
  }
  const units = plant.data.units;
  const { effectiveLoads, criteria } = job.data;
  const base = {
    ...newTrussFormValues(units, {
      ...effectiveLoads,
      groundSnow: criteria.groundSnow,
      windUplift: criteria.windUplift,
    }),
    mark: nextFreeMark(order.data.lines.map((l) => l.mark)),
  };
  const stored = line.data;
  const initial = stored ? designToFormValues(stored.design, stored, base) : base;
  const label = `Order ${order.data.number} · ${order.data.job.name} · ${order.data.customer.name}${
    stored ? ` · line ${stored.mark}` : ' · new line'
  }`;
  return (
    <TrussEditor
      key={`${orderId}-${lineId ?? 'new'}-${stored?.updatedAt ?? ''}`}
      orderId={orderId}
      lineId={lineId}
      orderLabel={label}
      units={units}
      designRules={plant.data.designRules}
      initial={initial}
      returnedNote={
        stored?.reviewState === 'returned'
          ? (stored.reviewComment ?? 'No comment given.')
          : undefined
      }
      lockedNote={
        stored?.reviewState === 'approved'
          ? 'This design is approved and locked. A change needs a new design and a new review.'
          : undefined
      }
    />
  );
}
