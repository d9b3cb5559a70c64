import type { Schedule, ScheduleBlock } from '../../../../shared/api/production';
import { formatDay } from '../../../../shared/api/terms';

type Load = Schedule['load'][number];

/** The board's lookups, built once per answer instead of a search per cell and per block. */
export interface BoardIndex {
  /** Blocks of one table-day, keyed `tableId|date`. */
  blocks: Map<string, ScheduleBlock[]>;
  /** Load of one table-day, keyed `tableId|date`. */
  load: Map<string, Load>;
  /** Orders planned to finish after their promised date. */
  late: Set<number>;
  /** Column headings ("Wed 2 Dec") by date. */
  dayLabels: Map<string, string>;
  /** The most blocks on one day of each table, by table id. */
  most: Map<number, number>;
}

/** The key of one table-day. */
export const cellKey = (tableId: number, date: string) => `${tableId}|${date}`;

/** Groups the board's blocks and load by table-day, the late orders and the day headings. */
export function indexBoard(board: Schedule): BoardIndex {
  const blocks = new Map<string, ScheduleBlock[]>();
  const most = new Map<number, number>();
  for (const b of board.blocks) {
    const k = cellKey(b.tableId, b.date);
    const list = blocks.get(k);
    if (list) list.push(b);
    else blocks.set(k, [b]);
    most.set(b.tableId, Math.max(most.get(b.tableId) ?? 0, list ? list.length : 1));
  }
  return {
    blocks,
    load: new Map(board.load.map((l) => [cellKey(l.tableId, l.date), l])),
    late: new Set(board.orders.filter((o) => o.late).map((o) => o.id)),
    dayLabels: new Map(board.days.map((d) => [d, formatDay(d, 'weekdayNoYear')])),
    most,
  };
}
