import type { LineSummary } from '../../../../shared/api/orders';
import { Alert, Button, ErrorMessage } from '../../../components/ui';
import { useRedesignLine } from '../api/redesign-line';

/**
 * Lines designed with loads the job no longer has: why, and one click to redesign each with the
 * job's current loads. Quotes are refused until none is left.
 */
export function OutOfDateLines({
  orderId,
  lines,
  canEdit,
}: {
  orderId: number;
  lines: LineSummary[];
  canEdit: boolean;
}) {
  const redesign = useRedesignLine(orderId);
  const stale = lines.filter((l) => l.loadsOutOfDate);
  if (stale.length === 0) return null;
  const marks = stale.map((l) => l.mark).join(', ');
  return (
    <Alert tone="warning" title={`Designed with old loads: ${marks}`} className="m-4">
      <p>{stale[0].outOfDateReason}</p>
      <p className="mt-1">
        {canEdit
          ? 'Redesign each with the job’s current loads (same geometry and lumber); each needs a new review, and no quote can be made until then.'
          : 'The sales desk redesigns these with the job’s current loads before the next quote.'}
      </p>
      {canEdit ? (
        <div className="mt-3 flex flex-wrap gap-2">
          {stale.map((l) => (
            <Button
              key={l.id}
              size="sm"
              variant="secondary"
              busy={redesign.isPending && redesign.variables === l.id}
              disabled={redesign.isPending}
              onClick={() => redesign.mutate(l.id)}
            >
              Redesign {l.mark}
            </Button>
          ))}
        </div>
      ) : null}
      {redesign.error ? (
        <ErrorMessage className="mt-3" title="Not redesigned" error={redesign.error} />
      ) : null}
    </Alert>
  );
}
