import { useQueryClient } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { Link, useParams, useSearchParams } from 'react-router';
import { reviewSchema, type LineDetail, type ReviewQueueItem } from '../../../../shared/api/orders';
import { isPresentedDesign } from '../../../components/truss/from-design';
import { DesignResults } from '../../../components/truss/DesignResults';
import { drawingOfStoredLine } from '../../../components/truss/run-design';
import { TrussDrawing } from '../../../components/truss/TrussDrawing';
import {
  Alert,
  Badge,
  Button,
  Card,
  controlClass,
  ErrorMessage,
  PageHeader,
  Spinner,
} from '../../../components/ui';
import { formatDateTime } from '../../../lib/format';
import { reviewKeys } from '../../../lib/query-keys';
import { useReviewLine } from '../api/get-line';
import { useLineOrder } from '../api/find-line-order';
import { useSubmitReview, type ReviewDecision } from '../api/submit-review';
import { orderIdFromSearch } from '../review-link';
import { designDrawingPath } from '../../../lib/design-drawing';
import { DecisionOutcome, type Outcome } from './DecisionOutcome';
import { SignOffSummary } from './SignOffSummary';

/**
 * The order of a line: from `?order=`, else from any cached page of the queue, else asked of the
 * server (a typed or shared link).
 */
function useOrderIdOf(lineId: number): {
  orderId: number | undefined;
  lookup: ReturnType<typeof useLineOrder>;
} {
  const [search] = useSearchParams();
  const queryClient = useQueryClient();
  let known = orderIdFromSearch(search);
  if (known === undefined) {
    const pages = queryClient.getQueriesData<{ items: ReviewQueueItem[] }>({
      queryKey: reviewKeys.lists(),
    });
    for (const [, page] of pages) {
      const item = page?.items.find((i) => i.id === lineId);
      if (item) known = item.order.id;
    }
  }
  const lookup = useLineOrder(
    lineId,
    known === undefined && Number.isInteger(lineId) && lineId > 0,
  );
  return { orderId: known ?? lookup.data?.orderId, lookup };
}

function ReviewState({ line }: { line: LineDetail }) {
  if (line.reviewState === 'approved') {
    return (
      <Alert tone="success" title="Approved and locked">
        Approved{line.reviewedBy ? ` by ${line.reviewedBy}` : ''} on{' '}
        {formatDateTime(line.reviewedAt)}. A change needs a new design and a new review.
      </Alert>
    );
  }
  if (line.reviewState === 'returned') {
    return (
      <Alert tone="warning" title="Sent back to the sales desk">
        {line.reviewComment ?? ''} ({line.reviewedBy ?? 'reviewer'},{' '}
        {formatDateTime(line.reviewedAt)})
      </Alert>
    );
  }
  return null;
}

function Decision({
  line,
  orderId,
  onDecided,
}: {
  line: LineDetail;
  orderId: number;
  onDecided: (outcome: Outcome) => void;
}) {
  const review = useSubmitReview(orderId, line.id);
  const [comment, setComment] = useState('');
  const [message, setMessage] = useState<string | null>(null);
  const decide = (decision: ReviewDecision['decision']) => {
    // The same schema as the server: a return needs a comment.
    const parsed = reviewSchema.safeParse({
      decision,
      comment,
      designVersion: line.designVersion,
    });
    if (!parsed.success) {
      setMessage(parsed.error.issues[0]?.message ?? 'Check the comment');
      return;
    }
    setMessage(null);
    // A promise, not a mutate callback: the approved line unmounts this card before callbacks run.
    review
      .mutateAsync(parsed.data)
      .then((reviewed) =>
        onDecided({ decision, mark: reviewed.mark, comment: parsed.data.comment }),
      )
      .catch(() => undefined); // the error shows through review.error
  };
  return (
    <Card title="Decision" className="print:hidden">
      <div className="flex flex-col gap-3">
        {!line.designOk ? (
          <Alert tone="danger">
            This design fails at least one check; send it back with what to change.
          </Alert>
        ) : null}
        <label htmlFor="review-comment" className="text-sm font-medium text-sand-800">
          Comment
        </label>
        <textarea
          id="review-comment"
          rows={3}
          value={comment}
          onChange={(e) => setComment(e.target.value)}
          aria-invalid={message ? true : undefined}
          aria-describedby={message ? 'review-comment-error' : undefined}
          className={`${controlClass(!!message)} h-auto py-2`}
          placeholder="Required when sending back: say what needs to change"
        />
        {message ? (
          <p id="review-comment-error" className="text-sm text-danger-700">
            {message}
          </p>
        ) : null}
        {review.error ? <ErrorMessage error={review.error} /> : null}
        <div className="flex flex-wrap gap-2">
          <Button
            busy={review.isPending && review.variables?.decision === 'approve'}
            onClick={() => decide('approve')}
          >
            Approve
          </Button>
          <Button
            variant="secondary"
            busy={review.isPending && review.variables?.decision === 'return'}
            onClick={() => decide('return')}
          >
            Send back
          </Button>
        </div>
      </div>
    </Card>
  );
}

/** `/reviews/:lineId`: the stored design drawn from the server's result, and the decision. */
export function ReviewPage() {
  const lineId = Number(useParams().lineId);
  const { orderId, lookup } = useOrderIdOf(lineId);
  const [outcome, setOutcome] = useState<(Outcome & { lineId: number }) | null>(null);
  const decided = outcome?.lineId === lineId ? outcome : null;
  const line = useReviewLine(orderId, lineId);
  const result = line.data?.result;
  const drawing = useMemo(
    () =>
      line.data && isPresentedDesign(result) ? drawingOfStoredLine(line.data.design, result) : null,
    [line.data, result],
  );
  const back = (
    <Link
      to="/reviews"
      className="text-sm font-medium text-timber-700 underline underline-offset-2"
    >
      Back to the queue
    </Link>
  );
  if (orderId === undefined) {
    return (
      <>
        <PageHeader title="Design review" actions={back} />
        {lookup.error ? (
          <ErrorMessage
            title="Could not open the design"
            error={lookup.error}
            onRetry={() => void lookup.refetch()}
          />
        ) : lookup.isFetching ? (
          <Spinner label="Finding the design…" />
        ) : (
          <Alert tone="warning">This link names no truss line. Open a design from the queue.</Alert>
        )}
      </>
    );
  }
  if (line.error) {
    return (
      <>
        <PageHeader title="Design review" actions={back} />
        <ErrorMessage
          title="Could not load the design"
          error={line.error}
          onRetry={() => void line.refetch()}
        />
      </>
    );
  }
  if (!line.data) return <Spinner label="Loading the design…" />;
  const l = line.data;
  return (
    <>
      <PageHeader
        title={`Design review: ${l.mark}`}
        description={
          <span className="flex flex-wrap items-center gap-2">
            {l.description} · {l.quantity} × {l.plies} ply · engine {l.engineVersion}
            <Badge
              tone={
                l.reviewState === 'approved'
                  ? 'success'
                  : l.reviewState === 'returned'
                    ? 'warning'
                    : 'info'
              }
            >
              {l.reviewState === 'approved'
                ? 'Approved'
                : l.reviewState === 'returned'
                  ? 'Sent back'
                  : 'Waiting for review'}
            </Badge>
          </span>
        }
        actions={back}
      />
      <div className="flex flex-col gap-4">
        {decided ? <DecisionOutcome outcome={decided} lineId={lineId} /> : <ReviewState line={l} />}
        <SignOffSummary line={l} orderId={orderId} />
        <Card title="Drawing">
          {drawing && isPresentedDesign(result) ? (
            <TrussDrawing
              model={drawing}
              units={result.units.system}
              title={`Stored design of ${l.mark}: ${l.description}`}
            />
          ) : (
            <p className="py-8 text-center text-sand-600">
              This line has no stored design result to draw.
            </p>
          )}
          <p className="mt-3 text-sm">
            <a
              className="font-medium text-timber-700 underline"
              href={designDrawingPath(orderId, l)}
              target="_blank"
              rel="noopener"
            >
              Open the truss design drawing (PDF)
            </a>
          </p>
        </Card>
        {l.reviewState === 'approved' || decided ? null : (
          <Decision line={l} orderId={orderId} onDecided={(o) => setOutcome({ ...o, lineId })} />
        )}
        {isPresentedDesign(result) ? <DesignResults design={result} /> : null}
      </div>
    </>
  );
}
