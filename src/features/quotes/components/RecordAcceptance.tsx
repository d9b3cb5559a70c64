import { useState, type FormEvent } from 'react';
import type { OrderDetail } from '../../../../shared/api/orders';
import {
  ACCEPTANCE_METHODS,
  acceptQuoteSchema,
  type Acceptance,
} from '../../../../shared/api/portal';
import {
  Alert,
  Button,
  Card,
  Dialog,
  ErrorMessage,
  Field,
  Input,
  Select,
  Textarea,
} from '../../../components/ui';
import { formatDateTime } from '../../../lib/format';
import { useQuotes } from '../api/list-quotes';
import { useRecordAcceptance } from '../api/record-acceptance';

/** How an acceptance reached the desk, in words (`portal` is the builder's own). */
const METHOD_LABELS: Record<Acceptance['method'], string> = {
  portal: 'in the portal',
  phone: 'by phone',
  paper: 'on paper',
  email: 'by e-mail',
};
const DESK_METHODS = ACCEPTANCE_METHODS.filter((m) => m !== 'portal');

/** Who accepted which revision, how, and whether the desk recorded it for the builder. */
function AcceptanceSummary({ acceptance }: { acceptance: Acceptance }) {
  return (
    <p className="text-sm text-sand-800" data-testid="order-acceptance">
      {acceptance.reference} accepted by <strong>{acceptance.name}</strong>{' '}
      {METHOD_LABELS[acceptance.method]} on {formatDateTime(acceptance.acceptedAt)}
      {acceptance.onBehalf ? ", recorded by the desk on the builder's behalf." : '.'}
    </p>
  );
}

/**
 * The dialog: the builder's person, how the acceptance came, the revision, a note. It sends the
 * order's version the page shows, so a change made meanwhile answers 409 and nothing is recorded.
 */
function RecordAcceptanceDialog({ order, onClose }: { order: OrderDetail; onClose: () => void }) {
  const quotes = useQuotes(order.id);
  const record = useRecordAcceptance(order.id);
  const open = (quotes.data?.items ?? []).filter((q) => q.sentAt && !q.superseded);
  const [number, setNumber] = useState<number | null>(null);
  const [name, setName] = useState('');
  const [method, setMethod] = useState<string>('phone');
  const [note, setNote] = useState('');
  const [agree, setAgree] = useState(false);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const revision = number ?? open[0]?.number ?? null;
  /** Edits a field and drops its message (the rest stay until the next try). */
  const edit =
    <T,>(field: string, set: (value: T) => void) =>
    (value: T) => {
      set(value);
      setErrors(({ [field]: _, ...rest }) => rest);
    };

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const parsed = acceptQuoteSchema.safeParse({
      name,
      agree,
      method,
      note: note.trim() ? note : undefined,
      version: order.version,
    });
    const found: Record<string, string> = revision
      ? {}
      : { revision: 'No sent revision can be accepted: send a quote first' };
    for (const issue of parsed.error?.issues ?? []) found[String(issue.path[0])] ??= issue.message;
    setErrors(found);
    if (!parsed.success || !revision) return;
    record.mutate({ ...parsed.data, number: revision }, { onSuccess: onClose });
  };

  return (
    <Dialog
      open
      wide
      title="Record the builder's acceptance"
      onClose={onClose}
      footer={
        <>
          <Button variant="secondary" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" form="record-acceptance" busy={record.isPending}>
            Record acceptance for the builder
          </Button>
        </>
      }
    >
      <form id="record-acceptance" onSubmit={submit} className="flex flex-col gap-4" noValidate>
        <Alert tone="info">
          You are recording this acceptance <strong>on the builder&apos;s behalf</strong>: the
          order&apos;s history and the builder&apos;s confirmation e-mail say that the desk recorded
          it, with your name and how it came.
        </Alert>
        <div className="grid gap-4 sm:grid-cols-2">
          <Field label="Builder's person who accepted" htmlFor="acc-name" error={errors.name}>
            <Input
              id="acc-name"
              value={name}
              invalid={!!errors.name}
              onChange={(e) => edit('name', setName)(e.target.value)}
            />
          </Field>
          <Field label="How it was received" htmlFor="acc-method" error={errors.method}>
            <Select
              id="acc-method"
              value={method}
              onChange={(e) => edit('method', setMethod)(e.target.value)}
            >
              {DESK_METHODS.map((m) => (
                <option key={m} value={m}>
                  {METHOD_LABELS[m].replace(/^(by|on) /, '').replace(/^./, (c) => c.toUpperCase())}
                </option>
              ))}
            </Select>
          </Field>
          <div className="sm:col-span-2">
            <Field label="Revision accepted" htmlFor="acc-revision" error={errors.revision}>
              <Select
                id="acc-revision"
                value={revision ?? ''}
                disabled={quotes.isPending}
                invalid={!!errors.revision}
                onChange={(e) => edit('revision', setNumber)(Number(e.target.value))}
              >
                {open.map((q) => (
                  <option key={q.number} value={q.number}>
                    {q.reference} (sent {formatDateTime(q.sentAt!)})
                  </option>
                ))}
              </Select>
            </Field>
          </div>
        </div>
        <Field label="Note (optional)" htmlFor="acc-note" error={errors.note}>
          <Textarea
            id="acc-note"
            rows={2}
            value={note}
            placeholder="e.g. Signed copy received by post on Tuesday"
            onChange={(e) => edit('note', setNote)(e.target.value)}
          />
        </Field>
        <label className="flex items-start gap-2 text-sm">
          <input
            type="checkbox"
            className="mt-1 h-5 w-5"
            checked={agree}
            onChange={(e) => edit('agree', setAgree)(e.target.checked)}
          />
          <span>The builder accepted this revision, its terms and its cautions.</span>
        </label>
        {errors.agree ? <p className="text-sm text-danger-700">{errors.agree}</p> : null}
        {errors.version ? <p className="text-sm text-danger-700">{errors.version}</p> : null}
        {quotes.error ? <ErrorMessage error={quotes.error} /> : null}
        {record.error ? <ErrorMessage error={record.error} /> : null}
      </form>
    </Dialog>
  );
}

/**
 * The order page's acceptance card (sales, plant manager): who accepted and how, or — while the
 * order waits on a sent quote — "Record acceptance" for a builder who answered by phone, on paper
 * or by e-mail.
 */
export function RecordAcceptanceCard({ order }: { order: OrderDetail }) {
  const [open, setOpen] = useState(false);
  if (!order.acceptance && order.status !== 'quoted') return null;
  return (
    <Card title="Quote acceptance">
      {order.acceptance ? (
        <AcceptanceSummary acceptance={order.acceptance} />
      ) : (
        <div className="flex flex-wrap items-center justify-between gap-3">
          <p className="text-sm text-sand-700">
            Waiting for the builder to accept the quote in the portal. If they accepted by phone, on
            paper or by e-mail, record it for them.
          </p>
          <Button variant="secondary" onClick={() => setOpen(true)}>
            Record acceptance…
          </Button>
        </div>
      )}
      {open ? <RecordAcceptanceDialog order={order} onClose={() => setOpen(false)} /> : null}
    </Card>
  );
}
