import {
  DndContext,
  KeyboardSensor,
  PointerSensor,
  useDraggable,
  useDroppable,
  useSensor,
  useSensors,
  type DragEndEvent,
} from '@dnd-kit/core';
import clsx from 'clsx';
import { lazy, Suspense, useState } from 'react';
import type { Schedule, ScheduleBlock } from '../../../../shared/api/production';
import {
  Alert,
  Button,
  Card,
  ErrorMessage,
  PageHeader,
  QueryState,
  Spinner,
} from '../../../components/ui';
import { useSchedule } from '../api/get-schedule';
import { useMoveOrder, type MoveResult } from '../api/move-order';
import { hours, moveWarnings } from './board-warnings';
import { ReadyToDeliver } from './ReadyToDeliver';

const LoadChart = lazy(() => import('./LoadChart'));
const DAYS = 10;

interface Pending {
  block: ScheduleBlock;
  target: { tableId: number; date: string };
  warnings: string[];
}

function Block({
  block,
  late,
  canMove,
}: {
  block: ScheduleBlock;
  late: boolean;
  canMove: boolean;
}) {
  const id = `${block.orderId}|${block.tableId}|${block.date}`;
  const { attributes, listeners, setNodeRef, transform, isDragging } = useDraggable({
    id,
    data: block,
    disabled: !canMove,
  });
  return (
    <div
      ref={setNodeRef}
      {...listeners}
      {...attributes}
      data-testid={`block-${block.orderId}-${block.date}`}
      style={transform ? { transform: `translate(${transform.x}px, ${transform.y}px)` } : undefined}
      className={clsx(
        'mb-1 rounded border px-2 py-1 text-xs shadow-sm',
        late
          ? 'border-danger-200 bg-danger-50 text-danger-800'
          : 'border-timber-200 bg-timber-50 text-sand-900',
        canMove && 'cursor-grab touch-none',
        isDragging && 'relative z-10 opacity-80',
      )}
      aria-label={`Order ${block.number}, ${block.trusses} trusses, ${hours(block.minutes)}${late ? ', late' : ''}`}
    >
      <div className="font-semibold">
        {block.number}
        {block.pinned ? ' ·  moved' : ''}
      </div>
      <div className="truncate">{block.customer}</div>
      <div>
        {block.marks.join(', ')} · {block.trusses} · {hours(block.minutes)}
      </div>
    </div>
  );
}

function Cell({
  board,
  tableId,
  date,
  canMove,
}: {
  board: Schedule;
  tableId: number;
  date: string;
  canMove: boolean;
}) {
  const { setNodeRef, isOver } = useDroppable({
    id: `${tableId}|${date}`,
    data: { tableId, date },
  });
  const load = board.load.find((l) => l.tableId === tableId && l.date === date);
  const share = load && load.capacity > 0 ? load.used / load.capacity : 0;
  const blocks = board.blocks.filter((b) => b.tableId === tableId && b.date === date);
  return (
    <td
      ref={setNodeRef}
      data-testid={`cell-${tableId}-${date}`}
      className={clsx('h-28 min-w-32 border border-sand-200 p-1 align-top', isOver && 'bg-info-50')}
    >
      <div className="mb-1 flex items-center gap-1 text-[11px] text-sand-600">
        <div className="h-1.5 flex-1 rounded bg-sand-100">
          <div
            className={clsx('h-1.5 rounded', share > 0.999 ? 'bg-warning-700' : 'bg-success-700')}
            style={{ width: `${Math.min(100, share * 100)}%` }}
          />
        </div>
        {load ? `${hours(load.used)} / ${hours(load.capacity)}` : null}
      </div>
      {blocks.map((b) => (
        <Block
          key={`${b.orderId}-${b.date}`}
          block={b}
          late={board.orders.find((o) => o.id === b.orderId)?.late ?? false}
          canMove={canMove}
        />
      ))}
    </td>
  );
}

/** The schedule board: tables × working days, load against capacity, an order per block. */
export function SchedulePage({ canMove }: { canMove: boolean }) {
  const query = useSchedule(undefined, DAYS);
  const chart = useSchedule(undefined, 70);
  const move = useMoveOrder();
  const [pending, setPending] = useState<Pending | null>(null);
  const [result, setResult] = useState<(MoveResult & { number: string }) | null>(null);
  const sensors = useSensors(
    useSensor(PointerSensor, { activationConstraint: { distance: 6 } }),
    useSensor(KeyboardSensor),
  );

  const doMove = (p: Pending) => {
    setPending(null);
    move.mutate(
      { orderId: p.block.orderId, ...p.target },
      { onSuccess: (r) => setResult({ ...r, number: p.block.number }) },
    );
  };

  const onDragEnd = (board: Schedule) => (e: DragEndEvent) => {
    const block = e.active.data.current as ScheduleBlock | undefined;
    const target = e.over?.data.current as { tableId: number; date: string } | undefined;
    if (!block || !target) return;
    if (block.tableId === target.tableId && block.date === target.date) return;
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
            ? 'Drag an order to another day or table; it then starts there and the rest re-plans around it.'
            : 'Tables and days with their load; the foreman moves orders.'
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
      {query.data ? <ReadyToDeliver orders={query.data.ready} canSignOff={canMove} /> : null}
      <QueryState query={query} what="the schedule">
        {(board) => (
          <Card className="overflow-x-auto p-0">
            <DndContext sensors={sensors} onDragEnd={onDragEnd(board)}>
              <table className="w-full border-collapse text-sm">
                <thead>
                  <tr>
                    <th className="w-28 border border-sand-200 bg-sand-50 p-2 text-left">Table</th>
                    {board.days.map((d) => (
                      <th
                        key={d}
                        className="border border-sand-200 bg-sand-50 p-2 text-left font-medium"
                      >
                        {new Date(`${d}T00:00:00Z`).toLocaleDateString('en-GB', {
                          weekday: 'short',
                          day: 'numeric',
                          month: 'short',
                          timeZone: 'UTC',
                        })}
                      </th>
                    ))}
                  </tr>
                </thead>
                <tbody>
                  {board.tables.map((t) => (
                    <tr key={t.id}>
                      <th className="border border-sand-200 bg-sand-50 p-2 text-left align-top">
                        {t.name}
                        <div className="text-xs font-normal text-sand-600">
                          {t.crew} crew × {t.shifts} shift{t.shifts > 1 ? 's' : ''}
                        </div>
                      </th>
                      {board.days.map((d) => (
                        <Cell key={d} board={board} tableId={t.id} date={d} canMove={canMove} />
                      ))}
                    </tr>
                  ))}
                </tbody>
              </table>
            </DndContext>
          </Card>
        )}
      </QueryState>
      <h2 className="mt-8 mb-2 text-lg font-semibold">Load in the coming weeks</h2>
      <QueryState query={chart} what="the load chart">
        {(board) => (
          <Card>
            <Suspense fallback={<Spinner label="Loading chart" />}>
              <LoadChart board={board} />
            </Suspense>
          </Card>
        )}
      </QueryState>
    </div>
  );
}
