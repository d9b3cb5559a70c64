import type { LineSummary } from '../../../../shared/api/orders';
import { Button, focusRing, LinkButton } from '../../../components/ui';
import { designDrawingPath } from '../../../lib/design-drawing';

/** Props of {@link LineActions}. */
export interface LineActionsProps {
  orderId: number;
  line: LineSummary;
  first: boolean;
  last: boolean;
  /** The line whose action is running, so only that row shows busy. */
  busy: boolean;
  onCopy: (line: LineSummary) => void;
  onDelete: (line: LineSummary) => void;
  onMove: (line: LineSummary, step: -1 | 1) => void;
}

/** The actions of one truss line; names carry the mark so each button is unique for a screen reader. */
export function LineActions({
  orderId,
  line,
  first,
  last,
  busy,
  onCopy,
  onDelete,
  onMove,
}: LineActionsProps) {
  return (
    <div className="flex flex-nowrap items-center gap-0.5">
      <LinkButton
        size="sm"
        variant="secondary"
        to={`/orders/${orderId}/lines/${line.id}`}
        aria-label={`Edit ${line.mark}`}
      >
        Edit
      </LinkButton>
      <a
        href={designDrawingPath(orderId, line)}
        target="_blank"
        rel="noopener"
        aria-label={`Truss design drawing of ${line.mark} (PDF)`}
        title="Truss design drawing (PDF)"
        className={`inline-flex h-8 items-center rounded px-2 text-sm font-medium text-timber-700 underline hover:bg-sand-100 ${focusRing}`}
      >
        PDF
      </a>
      <Button
        size="sm"
        variant="ghost"
        disabled={busy}
        onClick={() => onCopy(line)}
        aria-label={`Copy ${line.mark}`}
      >
        Copy
      </Button>
      <Button
        size="sm"
        variant="ghost"
        disabled={busy}
        onClick={() => onDelete(line)}
        aria-label={`Delete ${line.mark}`}
      >
        Delete
      </Button>
      <Button
        size="sm"
        variant="ghost"
        disabled={busy || first}
        onClick={() => onMove(line, -1)}
        aria-label={`Move ${line.mark} up`}
        title="Move up"
      >
        <span aria-hidden="true">↑</span>
      </Button>
      <Button
        size="sm"
        variant="ghost"
        disabled={busy || last}
        onClick={() => onMove(line, 1)}
        aria-label={`Move ${line.mark} down`}
        title="Move down"
      >
        <span aria-hidden="true">↓</span>
      </Button>
    </div>
  );
}
