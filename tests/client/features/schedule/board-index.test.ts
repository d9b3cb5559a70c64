import { describe, expect, it } from 'vitest';
import { scheduleSchema } from '../../../../shared/api/production';
import { cellKey, indexBoard } from '../../../../src/features/schedule/components/board-index';

const block = (orderId: number, tableId: number, date: string) => ({
  orderId,
  number: `SO-${orderId}`,
  customer: 'Invented Homes',
  tableId,
  date,
  minutes: 60,
  trusses: 2,
  marks: ['T1'],
  pinned: false,
});
const order = (id: number, late: boolean) => ({
  id,
  number: `SO-${id}`,
  customer: 'Invented Homes',
  status: 'released',
  promisedOn: null,
  plannedFinishOn: null,
  late,
  minutes: 60,
  version: 1,
});

const board = scheduleSchema.parse({
  from: '2026-12-07',
  days: ['2026-12-07', '2026-12-08'],
  tables: [{ id: 1, name: 'North', crew: 2, shifts: 1, hoursPerShift: 8, capacity: 960 }],
  load: [
    { tableId: 1, date: '2026-12-07', used: 120, capacity: 960 },
    { tableId: 1, date: '2026-12-08', used: 60, capacity: 960 },
  ],
  blocks: [block(1, 1, '2026-12-07'), block(2, 1, '2026-12-07'), block(2, 1, '2026-12-08')],
  orders: [order(1, false), order(2, true)],
});

describe('the board index', () => {
  it('groups blocks and load by table-day, keeping the answer’s order', () => {
    const index = indexBoard(board);
    expect(index.blocks.get(cellKey(1, '2026-12-07'))!.map((b) => b.orderId)).toEqual([1, 2]);
    expect(index.blocks.get(cellKey(1, '2026-12-08'))!.map((b) => b.orderId)).toEqual([2]);
    expect(index.blocks.get(cellKey(2, '2026-12-07'))).toBeUndefined();
    expect(index.load.get(cellKey(1, '2026-12-08'))!.used).toBe(60);
    expect([...index.late]).toEqual([2]);
  });

  it('counts the most blocks on one day per table (the height of its row)', () => {
    expect(indexBoard(board).most).toEqual(new Map([[1, 2]]));
  });

  it('heads each day with its weekday, day and month (UTC, whatever the device’s zone)', () => {
    const index = indexBoard(board);
    expect(index.dayLabels.get('2026-12-07')).toBe('Mon 7 Dec');
    expect(index.dayLabels.get('2026-12-08')).toBe('Tue 8 Dec');
    expect(board.held).toEqual([]);
  });
});
