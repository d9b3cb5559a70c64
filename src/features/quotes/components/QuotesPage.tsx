import { useNavigate } from 'react-router';
import { Alert, Button, Card, ErrorMessage, QueryState, TextLink } from '../../../components/ui';
import { isApiError } from '../../../lib/api-client';
import { useCreateQuote } from '../api/create-quote';
import { useOrder } from '../api/get-order';
import { useQuotes } from '../api/list-quotes';
import { quotePath } from '../quote-path';
import { QuoteRevisions } from './QuoteRevisions';

/** Props of {@link QuotesPage}. */
export interface QuotesPageProps {
  orderId: number;
  /** The sales desk and the plant manager make quotes; builders read theirs. */
  canCreate: boolean;
}

/** `/orders/:orderId/quotes`: the order's builder and job, "Create quote" and the revisions. */
export function QuotesPage({ orderId, canCreate }: QuotesPageProps) {
  const order = useOrder(orderId);
  const quotes = useQuotes(orderId);
  const create = useCreateQuote(orderId);
  const navigate = useNavigate();
  const unchanged =
    isApiError(create.error) && create.error.code === 'quote_unchanged'
      ? { message: create.error.message, number: Number(create.error.fields?.number) }
      : null;
  // A new revision opens at once: the next step is reading it and sending it to the builder.
  const onCreate = () =>
    create.mutate(undefined, {
      onSuccess: (quote) => void navigate(quotePath(orderId, quote.number)),
    });

  return (
    <QueryState query={order} what="the order">
      {(o) => (
        <>
          <p className="mb-2 text-sm">
            <TextLink to={`/orders/${o.id}`}>← Order {o.number}</TextLink>
          </p>
          <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
            <div className="min-w-0">
              <h1 className="text-2xl font-semibold tracking-tight text-sand-900">
                Quotes for order {o.number}
              </h1>
              <p className="mt-1 text-base text-sand-600">
                {o.customer.name} · {o.job.name} · {o.lineCount} line
                {o.lineCount === 1 ? '' : 's'}, {o.trussCount} truss
                {o.trussCount === 1 ? '' : 'es'}
              </p>
            </div>
            {canCreate ? (
              <Button onClick={onCreate} busy={create.isPending}>
                Create quote
              </Button>
            ) : null}
          </div>
          {unchanged ? (
            <Alert tone="info" title="Nothing has changed" className="mb-4">
              <p>{unchanged.message}</p>
              <p className="mt-2">
                <TextLink to={quotePath(orderId, unchanged.number)}>
                  Open revision {unchanged.number}
                </TextLink>
              </p>
            </Alert>
          ) : create.error ? (
            <ErrorMessage className="mb-4" title="The quote was not created" error={create.error} />
          ) : null}
          <Card title="Revisions" flush>
            <QueryState query={quotes} what="the quotes">
              {(q) => <QuoteRevisions quotes={q.items} canCreate={canCreate} />}
            </QueryState>
          </Card>
          {canCreate ? (
            <p className="mt-3 text-sm text-sand-600">
              Each quote is a fixed snapshot of prices, designs and terms. Changed the order? Create
              a new quote; the earlier ones stay on record as superseded.
            </p>
          ) : null}
        </>
      )}
    </QueryState>
  );
}
