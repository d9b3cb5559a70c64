import { dayNumber, isoDay } from './calendar';

/**
 * In-plant inspection cadence: at least three trusses inspected per set-up location per shift per
 * week (ANSI/TPI 1-2014, Section 3.3.2 — read from a published summary of Chapter 3; confirm
 * against the plant's copy of the standard).
 */
export const INSPECTIONS_PER_SHIFT_PER_WEEK = 3;

/** Monday of the ISO week holding `iso`. */
export function weekStart(iso: string): string {
  const n = dayNumber(iso);
  // 1970-01-01 was a Thursday: weekday (Mon = 0) is (n + 3) mod 7.
  return isoDay(n - ((n + 3) % 7));
}

export interface StationDue {
  tableId: number;
  required: number;
  done: number;
  due: number;
}

/** How many inspections each station still owes this week. */
export function inspectionsDue(
  tables: readonly { id: number; shifts: number }[],
  doneThisWeek: ReadonlyMap<number, number>,
): StationDue[] {
  return tables.map((t) => {
    const required = INSPECTIONS_PER_SHIFT_PER_WEEK * t.shifts;
    const done = doneThisWeek.get(t.id) ?? 0;
    return { tableId: t.id, required, done, due: Math.max(0, required - done) };
  });
}
