import { formatDate } from '../../../lib/format';
import { designDrawingPath } from '../../../lib/design-drawing';
import { useNavigate } from 'react-router';
import { TERMS, validUntilText } from '../../../../shared/api/terms';
import { TrussDrawing } from '../../../components/truss/TrussDrawing';
import { Alert, Card, PageHeader, QueryState } from '../../../components/ui';
import { useBuilderQuote } from '../api/get-quote';
import { daysLeft, drawingFromQuote } from '../drawing';
import { AcceptForm } from './AcceptForm';
import { ChangesForm } from './ChangesForm';

const money = (v: number, c: string) =>
  new Intl.NumberFormat('en-US', { style: 'currency', currency: c }).format(v);

/** A sent quote made for the builder's phone: drawings, quantities, totals, deposit, terms, accept. */
export function BuilderQuotePage({ orderId, number }: { orderId: number; number: number }) {
  const query = useBuilderQuote(orderId, number);
  const navigate = useNavigate();
  return (
    <QueryState query={query} what="the quote">
      {(q) => {
        const left = daysLeft(q.validUntil);
        return (
          <>
            <PageHeader title={`Quote ${q.reference}`} />
            <div className="space-y-4">
              {q.acceptance ? (
                <Alert tone="success">
                  Accepted by {q.acceptance.name} on {formatDate(q.acceptance.acceptedAt)}.
                </Alert>
              ) : q.superseded ? (
                <Alert tone="warning">This revision is superseded and cannot be accepted.</Alert>
              ) : q.expired ? (
                <Alert tone="warning">
                  This quote expired on {q.validUntil} and cannot be accepted; ask for a new one.
                </Alert>
              ) : q.refusal ? (
                <Alert tone="warning">{q.refusal}</Alert>
              ) : (
                <Alert tone="info">
                  {validUntilText(q.validUntil)} ({left === 1 ? '1 day' : `${left} days`} left).
                </Alert>
              )}
              <Card title="Trusses">
                <ul className="space-y-4">
                  {q.designs.map((d, i) => (
                    <li key={d.mark}>
                      <p className="font-medium">
                        {d.mark} × {q.lines[i]?.quantity} — {d.description}
                      </p>
                      <TrussDrawing
                        model={drawingFromQuote(d, q.units)}
                        units={q.units}
                        title={`${d.mark}: ${d.description}`}
                      />
                    </li>
                  ))}
                </ul>
              </Card>
              <Card title="Price">
                <dl className="grid grid-cols-[1fr_auto] gap-1 text-sm">
                  {q.lines.map((l) => (
                    <div key={l.mark} className="contents">
                      <dt>
                        {l.mark} × {l.quantity} at {money(l.unitPrice, q.currency)}
                      </dt>
                      <dd className="text-right">{money(l.lineTotal, q.currency)}</dd>
                    </div>
                  ))}
                  <dt>Delivery</dt>
                  <dd className="text-right">{money(q.delivery, q.currency)}</dd>
                  <dt>Tax</dt>
                  <dd className="text-right">{money(q.tax, q.currency)}</dd>
                  <dt className="font-semibold">Total</dt>
                  <dd className="text-right font-semibold" data-testid="quote-total">
                    {money(q.total, q.currency)}
                  </dd>
                  <dt>
                    {TERMS.depositDue} {TERMS.onAcceptance}
                  </dt>
                  <dd className="text-right">
                    {q.depositDue > 0 ? money(q.depositDue, q.currency) : TERMS.noDeposit}
                  </dd>
                </dl>
                <p className="mt-3">
                  <a
                    className="font-medium text-timber-700 underline"
                    href={`/api/orders/${orderId}/quotes/${number}/pdf`}
                    target="_blank"
                    rel="noreferrer"
                  >
                    Open the PDF
                  </a>
                </p>
                <p className="mt-2 text-sm">
                  Truss design drawings:{' '}
                  {q.lines.map((l, i) => (
                    <span key={l.mark}>
                      {i > 0 ? ', ' : ''}
                      <a
                        className="font-medium text-timber-700 underline"
                        href={designDrawingPath(orderId, { mark: l.mark })}
                        target="_blank"
                        rel="noreferrer"
                        aria-label={`Truss design drawing of ${l.mark} (PDF)`}
                      >
                        {l.mark}
                      </a>
                    </span>
                  ))}
                </p>
              </Card>
              <Card title="Terms">
                <p className="text-sm whitespace-pre-line">{q.terms}</p>
              </Card>
              <Card title="Cautions">
                <ul className="list-disc space-y-1 pl-5 text-sm">
                  {q.cautions.map((c) => (
                    <li key={c}>{c}</li>
                  ))}
                </ul>
              </Card>
              {!q.acceptance && !q.refusal ? (
                <>
                  <Card title="Accept this quote">
                    <AcceptForm
                      orderId={orderId}
                      number={number}
                      onAccepted={() => void navigate(`/portal/orders/${orderId}`)}
                    />
                  </Card>
                  <Card title="Something to change?">
                    <ChangesForm orderId={orderId} number={number} />
                  </Card>
                </>
              ) : null}
            </div>
          </>
        );
      }}
    </QueryState>
  );
}
