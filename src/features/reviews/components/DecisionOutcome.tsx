import { useEffect, useRef } from 'react';
import { Alert, LinkButton, Spinner, TextLink } from '../../../components/ui';
import { useNextInQueue } from '../api/next-in-queue';
import { reviewPath } from '../review-link';

/** What the reviewer just decided on a line. */
export interface Outcome {
  decision: 'approve' | 'return';
  mark: string;
  comment: string;
}

/** After a decision: what happened, and the next line waiting in the queue (or that none is). */
export function DecisionOutcome({ outcome, lineId }: { outcome: Outcome; lineId: number }) {
  const next = useNextInQueue(lineId, true);
  const ref = useRef<HTMLDivElement>(null);
  // The decision card is gone: keyboard focus moves to what replaced it.
  useEffect(() => ref.current?.focus(), []);
  const approved = outcome.decision === 'approve';
  const item = next.isFetching ? undefined : next.data;
  return (
    <div ref={ref} tabIndex={-1} className="outline-none" data-testid="decision-outcome">
      <Alert
        tone={approved ? 'success' : 'warning'}
        title={
          approved
            ? `Approved ${outcome.mark}: the design is locked`
            : `Sent ${outcome.mark} back to the sales desk`
        }
      >
        <p>
          {approved
            ? 'The approval is recorded in the order’s history with your name and the design version you reviewed.'
            : `Your comment goes with it: “${outcome.comment}”. The desk sees it on its home page and on the order.`}
        </p>
        <div className="mt-3 flex flex-wrap items-center gap-3 print:hidden">
          {item === undefined ? (
            <Spinner label="Finding the next design…" />
          ) : item === null ? (
            <>
              <span className="font-medium">Nothing else is waiting for review.</span>
              <TextLink to="/reviews">Back to the queue</TextLink>
            </>
          ) : (
            <>
              <LinkButton to={reviewPath(item.id, item.order.id)}>
                Next in queue: {item.mark}
              </LinkButton>
              <span>
                {item.description} · order {item.order.number} · {item.job.name} (
                {item.customer.name})
              </span>
              <TextLink to="/reviews">Back to the queue</TextLink>
            </>
          )}
        </div>
      </Alert>
    </div>
  );
}
