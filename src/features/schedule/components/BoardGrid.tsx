import {
  DndContext,
  DragOverlay,
  KeyboardSensor,
  PointerSensor,
  useDraggable,
  useDroppable,
  useSensor,
  useSensors,
  type DragEndEvent,
  type DragStartEvent,
} from '@dnd-kit/core';
import clsx from 'clsx';
import { memo, startTransition, useEffect, useState } from 'react';
import type { Schedule, ScheduleBlock } from '../../../../shared/api/production';
import { cellKey, type BoardIndex } from './board-index';
import { hours } from './board-warnings';

/** Days added to the grid per step: one working week, about what a tablet shows at once. */
const STEP = 5;
const TABLE_COLUMN = 112;
const DAY_COLUMN = 136;
/** A block's height (three 16 px lines, padding, border) and the gap below it, in px. */
const BLOCK = 58;
const BLOCK_GAP = 4;
/** The load bar's line above a day's blocks, and the least height of a table's row. */
const LOAD_LINE = 20;
const MIN_ROW = 104;

/**
 * The height of a table's cells: the fullest of its days, the same for every day. Fixed heights
 * let each cell skip its contents' style, layout and paint while off screen
 * (`content-visibility: auto`) without its row changing height when it scrolls into view.
 */
const rowHeight = (most: number) => Math.max(MIN_ROW, LOAD_LINE + most * (BLOCK + BLOCK_GAP));

type Select = (block: ScheduleBlock) => void;

/** How a block looks, on the grid and under the pointer while dragged. */
const blockClass = (late: boolean) =>
  clsx(
    'overflow-hidden rounded border px-2 py-1 text-xs leading-4 shadow-sm',
    late
      ? 'border-danger-200 bg-danger-50 text-danger-800'
      : 'border-timber-200 bg-timber-50 text-sand-900',
  );

function BlockFace({ block }: { block: ScheduleBlock }) {
  return (
    <>
      {/* One line each, so every block has the same height: the number gives way to "moved". */}
      <div className="flex items-baseline gap-1">
        <span className="truncate font-semibold">{block.number}</span>
        {block.pinned ? <span className="shrink-0 text-[10px] text-sand-600">· moved</span> : null}
      </div>
      <div className="truncate">{block.customer}</div>
      <div className="truncate">
        {block.marks.join(', ')} · {block.trusses} · {hours(block.minutes)}
      </div>
    </>
  );
}

const Block = memo(function Block({
  block,
  late,
  canMove,
  selected,
  onSelect,
}: {
  block: ScheduleBlock;
  late: boolean;
  canMove: boolean;
  selected: boolean;
  onSelect: Select;
}) {
  // While dragged the block stays in place, faded; a copy follows the pointer (DragOverlay), as
  // the cell's containment clips anything drawn outside it.
  const { attributes, listeners, setNodeRef, isDragging } = useDraggable({
    id: `${block.orderId}|${block.tableId}|${block.date}`,
    data: block,
    disabled: !canMove,
  });
  return (
    <div
      ref={setNodeRef}
      {...listeners}
      {...attributes}
      // A tap without a drag (the pointer sensor waits for 6 px) opens the order's panel.
      onClick={() => onSelect(block)}
      data-testid={`block-${block.orderId}-${block.date}`}
      style={{ height: BLOCK, marginBottom: BLOCK_GAP }}
      className={clsx(
        blockClass(late),
        'cursor-pointer',
        canMove && 'cursor-grab touch-none',
        selected && 'ring-2 ring-focus',
        isDragging && 'opacity-40',
      )}
      aria-label={`Order ${block.number}, ${block.trusses} trusses, ${hours(block.minutes)}${late ? ', late' : ''}`}
    >
      <BlockFace block={block} />
    </div>
  );
});

const NO_BLOCKS: ScheduleBlock[] = [];

const Cell = memo(function Cell({
  tableId,
  date,
  height,
  load,
  blocks,
  late,
  canMove,
  selectedOrder,
  onSelect,
}: {
  tableId: number;
  date: string;
  height: number;
  load: Schedule['load'][number] | undefined;
  blocks: ScheduleBlock[];
  late: Set<number>;
  canMove: boolean;
  selectedOrder: number | null;
  onSelect: Select;
}) {
  const { setNodeRef, isOver } = useDroppable({
    id: `${tableId}|${date}`,
    data: { tableId, date },
  });
  const share = load && load.capacity > 0 ? load.used / load.capacity : 0;
  return (
    <td
      ref={setNodeRef}
      data-testid={`cell-${tableId}-${date}`}
      className={clsx('border border-sand-200 p-1 align-top', isOver && 'bg-info-50')}
    >
      <div style={{ height, contentVisibility: 'auto' }}>
        <div className="mb-1 flex h-4 items-center gap-1 text-[11px] leading-4 text-sand-600">
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
            late={late.has(b.orderId)}
            canMove={canMove}
            selected={b.orderId === selectedOrder}
            onSelect={onSelect}
          />
        ))}
      </div>
    </td>
  );
});

/**
 * How many of the board's days to draw: the first week at once, then a week at a time in a
 * transition, so no single task builds the whole grid and the first days show soonest.
 */
function useDaysShown(total: number) {
  const [shown, setShown] = useState(Math.min(total, STEP));
  useEffect(() => {
    if (shown >= total) return;
    const id = setTimeout(() => startTransition(() => setShown((n) => n + STEP)), 0);
    return () => clearTimeout(id);
  }, [shown, total]);
  return Math.min(shown, total);
}

/** Props of {@link BoardGrid}. */
export interface BoardGridProps {
  board: Schedule;
  index: BoardIndex;
  canMove: boolean;
  selectedOrder: number | null;
  onSelect: Select;
  onDrop: (block: ScheduleBlock, target: { tableId: number; date: string }) => void;
  /** Called once every day is drawn (the page then starts its slower parts). */
  onComplete?: () => void;
}

/** Tables × working days: each day's load against capacity and a block per order, draggable. */
export function BoardGrid({
  board,
  index,
  canMove,
  selectedOrder,
  onSelect,
  onDrop,
  onComplete,
}: BoardGridProps) {
  const sensors = useSensors(
    useSensor(PointerSensor, { activationConstraint: { distance: 6 } }),
    useSensor(KeyboardSensor),
  );
  const shown = useDaysShown(board.days.length);
  const days = board.days.slice(0, shown);
  const complete = shown >= board.days.length;
  useEffect(() => {
    if (complete) onComplete?.();
  }, [complete, onComplete]);
  const [dragged, setDragged] = useState<ScheduleBlock | null>(null);
  const onDragStart = (e: DragStartEvent) =>
    setDragged((e.active.data.current as ScheduleBlock | undefined) ?? null);
  const onDragEnd = (e: DragEndEvent) => {
    setDragged(null);
    const block = e.active.data.current as ScheduleBlock | undefined;
    const target = e.over?.data.current as { tableId: number; date: string } | undefined;
    if (!block || !target) return;
    if (block.tableId === target.tableId && block.date === target.date) return;
    onDrop(block, target);
  };
  return (
    <DndContext
      sensors={sensors}
      onDragStart={onDragStart}
      onDragEnd={onDragEnd}
      onDragCancel={() => setDragged(null)}
    >
      <table
        className="table-fixed border-collapse text-sm"
        style={{ width: `max(100%, ${TABLE_COLUMN + DAY_COLUMN * board.days.length}px)` }}
      >
        <colgroup>
          <col style={{ width: TABLE_COLUMN }} />
          {board.days.map((d) => (
            <col key={d} style={{ width: DAY_COLUMN }} />
          ))}
        </colgroup>
        <thead>
          <tr>
            <th className="border border-sand-200 bg-sand-50 p-2 text-left">Table</th>
            {days.map((d) => (
              <th key={d} className="border border-sand-200 bg-sand-50 p-2 text-left font-medium">
                {index.dayLabels.get(d)}
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
              {days.map((d) => {
                const k = cellKey(t.id, d);
                return (
                  <Cell
                    key={d}
                    tableId={t.id}
                    date={d}
                    height={rowHeight(index.most.get(t.id) ?? 0)}
                    load={index.load.get(k)}
                    blocks={index.blocks.get(k) ?? NO_BLOCKS}
                    late={index.late}
                    canMove={canMove}
                    selectedOrder={selectedOrder}
                    onSelect={onSelect}
                  />
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
      <DragOverlay dropAnimation={null}>
        {dragged ? (
          <div
            className={clsx(
              blockClass(index.late.has(dragged.orderId)),
              'cursor-grabbing shadow-lg',
            )}
          >
            <BlockFace block={dragged} />
          </div>
        ) : null}
      </DragOverlay>
    </DndContext>
  );
}
