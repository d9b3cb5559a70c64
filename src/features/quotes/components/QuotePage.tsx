import { Alert, Badge, Card, QueryState, TextLink, focusRing } from '../../../components/ui';
import { TERMS, formatTermsDate, validUntilText } from '../../../../shared/api/terms';
import { formatDateTime } from '../../../lib/format';
import { useOrder } from '../api/get-order';
import { useQuote } from '../api/get-quote';
import { quotePdfPath } from '../api/quote-pdf';
import { quotesPath } from '../quote-path';
import { QuoteLines } from './QuoteLines';
import { QuoteTotals } from './QuoteTotals';
import { SendQuote } from './SendQuote';

/** Props of {@link QuotePage}. */
export interface QuotePageProps {
  orderId: number;
  number: number;
  /** Staff send quotes; builders read them. */
  canSend: boolean;
}

/** `/orders/:orderId/quotes/:number`: one revision as the builder receives it. */
export function QuotePage({ orderId, number, canSend }: QuotePageProps) {
  const quote = useQuote(orderId, number);
  const order = useOrder(orderId);
  const builder = order.data?.customer;

  return (
    <QueryState query={quote} what="the quote">
      {(q) => (
        <>
          <p className="mb-2 text-sm">
            <TextLink to={quotesPath(orderId)}>
              ← Quotes for order {order.data?.number ?? ''}
            </TextLink>
          </p>
          <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
            <div className="min-w-0">
              <div className="flex flex-wrap items-center gap-3">
                <h1 className="text-2xl font-semibold tracking-tight text-sand-900">
                  {q.reference}
                </h1>
                {q.superseded ? <Badge>Superseded</Badge> : <Badge tone="success">Current</Badge>}
                {q.sentAt ? <Badge tone="info">Sent</Badge> : null}
              </div>
              <p className="mt-1 text-base text-sand-600">
                {order.data ? `${order.data.customer.name} · ${order.data.job.name} · ` : ''}
                created {formatDateTime(q.createdAt)}
                {q.createdBy ? ` by ${q.createdBy}` : ''} · {validUntilText(q.validUntil)}
              </p>
            </div>
            <div className="flex flex-wrap items-center gap-2">
              <a
                href={quotePdfPath(orderId, number)}
                target="_blank"
                rel="noopener"
                className={`inline-flex h-10 items-center justify-center rounded border border-sand-300 bg-white px-4 font-medium text-sand-900 hover:bg-sand-100 ${focusRing}`}
              >
                Open PDF
              </a>
              {canSend && !q.superseded && builder ? (
                <SendQuote quote={q} builder={builder} />
              ) : null}
            </div>
          </div>
          <div className="flex flex-col gap-4">
            {q.superseded ? (
              <Alert tone="warning" title="A newer revision replaces this quote">
                It stays on record as it was made.{' '}
                <TextLink to={quotesPath(orderId)}>See all revisions</TextLink>
              </Alert>
            ) : null}
            {q.sentAt ? (
              <Alert tone="success" title="Sent to the builder">
                E-mailed to {q.sentTo ?? 'the builder company'} on {formatDateTime(q.sentAt)}.
              </Alert>
            ) : null}
            <Card title="Truss lines" flush>
              <QuoteLines lines={q.lines} currency={q.currency} />
              <div className="border-t border-sand-200 p-4">
                <QuoteTotals quote={q} />
              </div>
            </Card>
            <div className="grid gap-4 lg:grid-cols-2">
              <Card title="Terms">
                <p className="mb-3 text-base text-sand-900">
                  {TERMS.validUntil} <strong>{formatTermsDate(q.validUntil)}</strong>.
                </p>
                <p className="text-base whitespace-pre-line text-sand-700">
                  {q.terms || 'No further terms.'}
                </p>
              </Card>
              <Card title="Cautions">
                {q.cautions.length ? (
                  <ul className="list-disc space-y-2 pl-5 text-base text-sand-800">
                    {q.cautions.map((caution) => (
                      <li key={caution}>{caution}</li>
                    ))}
                  </ul>
                ) : (
                  <p className="text-sand-600">No cautions recorded with this quote.</p>
                )}
              </Card>
            </div>
          </div>
        </>
      )}
    </QueryState>
  );
}
