import type { ScheduleTable, WorkCalendar } from './types';

const DAY_MS = 86_400_000;

/** Days since 1970-01-01 of an ISO date (UTC, so no daylight-saving drift). */
export function dayNumber(iso: string): number {
  return Math.floor(Date.parse(`${iso}T00:00:00Z`) / DAY_MS);
}

/** The ISO date of a day number. */
export function isoDay(n: number): string {
  return new Date(n * DAY_MS).toISOString().slice(0, 10);
}

/** The ISO date `days` calendar days after `iso`. */
export function addCalendarDays(iso: string, days: number): string {
  return isoDay(dayNumber(iso) + days);
}

/** The plant's working dates from `start` for `horizonDays` calendar days, closures removed. */
export function workingDates(start: string, horizonDays: number, calendar: WorkCalendar): string[] {
  const first = dayNumber(start);
  const closed = new Set(calendar.closures);
  const weekdays = new Set(calendar.workingDays);
  const out: string[] = [];
  for (let n = first; n < first + horizonDays; n++) {
    const iso = isoDay(n);
    // 1970-01-01 was a Thursday (weekday 4).
    if (weekdays.has((n + 4) % 7) && !closed.has(iso)) out.push(iso);
  }
  return out;
}

/** Crew-minutes a table offers on one working day: crew × shifts × hours × 60. */
export function tableDayMinutes(table: ScheduleTable): number {
  return table.crew * table.shifts * table.hoursPerShift * 60;
}
