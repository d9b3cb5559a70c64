import type { MailState } from '../../../../shared/api/portal';
import { Badge, Card, QueryState, type BadgeTone } from '../../../components/ui';
import { formatDateTime } from '../../../lib/format';
import { useOrderMail } from '../api/order-mail';

const STATE: Record<MailState['status'], { label: string; tone: BadgeTone }> = {
  queued: { label: 'Queued', tone: 'info' },
  retrying: { label: 'Retrying', tone: 'warning' },
  sent: { label: 'Sent', tone: 'success' },
  failed: { label: 'Failed', tone: 'danger' },
};

/** What each message was, in words the desk uses. */
const KIND: Record<string, string> = {
  quote: 'Quote',
  'acceptance.builder': 'Acceptance confirmation',
  'acceptance.desk': 'Acceptance (desk copy)',
  'changes.desk': 'Request for changes',
  receipt: 'Receipt',
  'refund.receipt': 'Refund receipt',
  'production.released': 'Released to production',
  'production.promised': 'Promised date',
  'production.planned': 'Planned delivery date',
};

function when(m: MailState) {
  if (m.status === 'sent') return `sent ${formatDateTime(m.sentAt)}`;
  const tries = m.attempts === 1 ? '1 try' : `${m.attempts} tries`;
  return `queued ${formatDateTime(m.createdAt)}${m.attempts > 0 ? ` · ${tries}` : ''}`;
}

/** "E-mail about this order": every message the order caused and whether it reached the mail server. */
export function MailStatus({ orderId }: { orderId: number }) {
  const mail = useOrderMail(orderId);
  return (
    <Card title="E-mail about this order" flush className="print:hidden">
      <QueryState query={mail} what="the order's e-mail">
        {({ items }) =>
          items.length === 0 ? (
            <p className="p-4 text-sm text-sand-600">
              No e-mail has been sent about this order yet.
            </p>
          ) : (
            <ul className="divide-y divide-sand-200" data-testid="order-mail">
              {items.map((m) => (
                <li
                  key={m.id}
                  className="flex flex-wrap items-start justify-between gap-3 px-4 py-3"
                >
                  <div className="min-w-0">
                    <p className="text-sm font-medium text-sand-900">{m.subject}</p>
                    <p className="text-xs text-sand-600">
                      {KIND[m.kind] ?? m.kind} · to {m.to} · {when(m)}
                    </p>
                    {m.lastError && m.status !== 'sent' ? (
                      <p className="mt-1 text-xs text-danger-700">Last error: {m.lastError}</p>
                    ) : null}
                  </div>
                  <Badge tone={STATE[m.status].tone}>{STATE[m.status].label}</Badge>
                </li>
              ))}
            </ul>
          )
        }
      </QueryState>
    </Card>
  );
}
