import { designInputSchema } from '../../../../shared/api/design';
import type { LineDetail } from '../../../../shared/api/orders';
import { designInputFacts, lumberFacts } from '../../../components/truss/design-facts';
import { Card, DetailList, TextLink, type DetailItem } from '../../../components/ui';
import { useReviewContext } from '../api/get-context';

/**
 * What the reviewer signs off on, in one place: the job and its plans, the loads, spacing, heel,
 * overhangs and lumber of the stored design.
 */
export function SignOffSummary({ line, orderId }: { line: LineDetail; orderId: number }) {
  const { order, job } = useReviewContext(orderId);
  const parsed = designInputSchema.safeParse(line.design);
  const o = order.data;
  const j = job.data;
  const jobItems: DetailItem[] = [
    {
      label: 'Job',
      value: j ? (
        <>
          {j.name}
          <span className="block text-sm text-sand-700">{j.address}</span>
        </>
      ) : (
        (o?.job.name ?? '…')
      ),
    },
    { label: 'Builder', value: o?.customer.name ?? '…' },
    {
      label: 'Order',
      value: o ? <TextLink to={`/orders/${orderId}`}>Order {o.number}</TextLink> : '…',
    },
    {
      label: 'Plans',
      value: o ? (
        <TextLink to={`/jobs/${o.job.id}/files`}>
          Plans of {o.job.name}
          {j?.planRevision ? ` (revision ${j.planRevision})` : ''}
        </TextLink>
      ) : (
        '…'
      ),
    },
  ];
  if (!parsed.success) {
    return (
      <Card title="What you sign off on">
        <DetailList items={jobItems} />
        <p className="mt-3 text-sm text-danger-700">
          The stored design input could not be read; open the line in the editor.
        </p>
      </Card>
    );
  }
  const d = parsed.data;
  const trussItems: DetailItem[] = [...designInputFacts(d, line), ...lumberFacts(line.result, d)];
  return (
    <Card title="What you sign off on">
      <div className="flex flex-col gap-5">
        <DetailList items={jobItems} />
        <div className="border-t border-sand-200 pt-4">
          <DetailList items={trussItems} />
        </div>
      </div>
    </Card>
  );
}
