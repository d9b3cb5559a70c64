import {
  lazy,
  startTransition,
  Suspense,
  useCallback,
  useDeferredValue,
  useEffect,
  useMemo,
  useState,
} from 'react';
import type { ScheduleBlock } from '../../../../shared/api/production';
import {
  Alert,
  Button,
  Card,
  ErrorMessage,
  PageHeader,
  QueryState,
  Spinner,
} from '../../../components/ui';
import { useScheduleLoad } from '../api/get-load';
import { useSchedule } from '../api/get-schedule';
import { useMoveOrder, type MoveResult } from '../api/move-order';
import { BoardGrid } from './BoardGrid';
import { indexBoard } from './board-index';
import { moveWarnings } from './board-warnings';
import { HeldOrders } from './HeldOrders';
import { OrderPanel } from './OrderPanel';
import { ReadyToDeliver } from './ReadyToDeliver';

const LoadChart = lazy(() => import('./LoadChart'));
const DAYS = 10;
const CHART_DAYS = 70;

interface Pending {
  block: ScheduleBlock;
  target: { tableId: number; date: string };
  warnings: string[];
}

/** Runs `f` when the browser is idle (or soon, where it cannot say), in a transition. */
function whenIdle(f: () => void): () => void {
  const run = () => startTransition(f);
  if ('requestIdleCallback' in window) {
    const id = window.requestIdleCallback(run, { timeout: 1500 });
    return () => window.cancelIdleCallback(id);
  }
  const id = setTimeout(run, 50);
  return () => clearTimeout(id);
}

/** What the signed-in role may do on the board (the server checks the same). */
export interface BoardPermissions {
  /** Foreman and plant manager drag orders and sign off deliveries. */
  canMove: boolean;
  /** The plant manager holds and releases orders. */
  canHoldRelease: boolean;
}

/**
 * The schedule board: tables × working days, load against capacity, an order per block. The grid
 * is drawn first (a week at a time); the load chart and its library only once the grid is done.
 */
export function SchedulePage({ canMove, canHoldRelease }: BoardPermissions) {
  const query = useSchedule(undefined, DAYS);
  const chart = useScheduleLoad(undefined, CHART_DAYS);
  // The board is drawn in a background render React can interrupt, not in one long task.
  const board = useDeferredValue(query.data);
  const index = useMemo(() => (board ? indexBoard(board) : null), [board]);
  const move = useMoveOrder();
  const [pending, setPending] = useState<Pending | null>(null);
  const [result, setResult] = useState<(MoveResult & { number: string }) | null>(null);
  const [selected, setSelected] = useState<ScheduleBlock | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const [gridDone, setGridDone] = useState(false);
  const [chartShown, setChartShown] = useState(false);
  useEffect(
    () => (gridDone && !chartShown ? whenIdle(() => setChartShown(true)) : undefined),
    [gridDone, chartShown],
  );
  const onComplete = useCallback(() => setGridDone(true), []);
  const onSelect = useCallback((b: ScheduleBlock) => setSelected(b), []);

  const doMove = (p: Pending) => {
    setPending(null);
    move.mutate(
      { orderId: p.block.orderId, ...p.target },
      { onSuccess: (r) => setResult({ ...r, number: p.block.number }) },
    );
  };
  const onDrop = (block: ScheduleBlock, target: Pending['target']) => {
    if (!board) return;
    const p = { block, target, warnings: moveWarnings(board, block, target) };
    if (p.warnings.length) setPending(p);
    else doMove(p);
  };

  return (
    <div>
      <PageHeader
        title="Schedule"
        description={
          canMove
            ? 'Drag an order to another day or table; it then starts there and the rest re-plans around it. Tap an order for its details.'
            : 'Tables and days with their load; the foreman moves orders. Tap an order for its details.'
        }
      />
      {pending ? (
        <Alert tone="warning" title="This move breaks the plan" className="mb-4">
          <ul className="list-disc pl-5">
            {pending.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
          <div className="mt-2 flex gap-2">
            <Button size="sm" onClick={() => doMove(pending)}>
              Move anyway
            </Button>
            <Button size="sm" variant="secondary" onClick={() => setPending(null)}>
              Cancel
            </Button>
          </div>
        </Alert>
      ) : null}
      {move.error ? <ErrorMessage error={move.error} className="mb-4" /> : null}
      {result ? (
        <Alert tone={result.late ? 'warning' : 'success'} className="mb-4">
          {result.late
            ? `Order ${result.number} now finishes ${result.plannedFinishOn ?? 'beyond the plan'}, after its promised ${result.promisedOn}.`
            : `Order ${result.number} moved; it finishes ${result.plannedFinishOn}.`}
        </Alert>
      ) : null}
      {notice ? (
        <Alert tone="success" className="mb-4">
          {notice}
        </Alert>
      ) : null}
      {board ? <ReadyToDeliver orders={board.ready} canSignOff={canMove} /> : null}
      {board ? (
        <HeldOrders orders={board.held} canRelease={canHoldRelease} onDone={setNotice} />
      ) : null}
      {selected ? (
        <OrderPanel
          block={selected}
          order={board?.orders.find((o) => o.id === selected.orderId)}
          canHoldRelease={canHoldRelease}
          onClose={() => setSelected(null)}
          onDone={setNotice}
        />
      ) : null}
      <QueryState query={query} what="the schedule">
        {() =>
          board && index ? (
            <Card className="overflow-x-auto p-0">
              <BoardGrid
                board={board}
                index={index}
                canMove={canMove}
                selectedOrder={selected?.orderId ?? null}
                onSelect={onSelect}
                onDrop={onDrop}
                onComplete={onComplete}
              />
            </Card>
          ) : (
            <Spinner className="p-4" label="Drawing the schedule…" />
          )
        }
      </QueryState>
      <h2 className="mt-8 mb-2 text-lg font-semibold">Load in the coming weeks</h2>
      <QueryState query={chart} what="the load chart">
        {(load) => (
          <Card>
            {chartShown ? (
              <Suspense fallback={<Spinner label="Loading chart" />}>
                <LoadChart board={load} />
              </Suspense>
            ) : (
              <Spinner label="Loading chart" />
            )}
          </Card>
        )}
      </QueryState>
    </div>
  );
}
