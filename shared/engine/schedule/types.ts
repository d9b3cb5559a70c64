/** Inputs and outputs of the production scheduler (dates are ISO `YYYY-MM-DD`, plant-local days). */

/** An assembly table (line): its crew works `shifts` shifts of `hoursPerShift` each working day. */
export interface ScheduleTable {
  id: number;
  name: string;
  crew: number;
  shifts: number;
  hoursPerShift: number;
}

/** When the plant works: weekdays (0 = Sunday … 6 = Saturday) and closed dates. */
export interface WorkCalendar {
  workingDays: readonly number[];
  closures: readonly string[];
}

/**
 * One order's trusses of one mark, kept together on one table. `minutesPerTruss` is labour
 * (crew-minutes) per truss; `setupMinutes` is paid once, when the group starts.
 */
export interface MarkGroup {
  key: string;
  mark: string;
  quantity: number;
  minutesPerTruss: number;
  setupMinutes: number;
}

/** A manual move: the order starts on this table on this day (never before its release). */
export interface SchedulePin {
  tableId: number;
  date: string;
}

export interface ScheduleOrder {
  id: number;
  /** The first day its work may be planned (the day it was released). */
  releasedOn: string;
  /** The promised delivery date; null plans it after every dated order. */
  promisedOn: string | null;
  groups: readonly MarkGroup[];
  pin?: SchedulePin | null;
}

export interface ScheduleInput {
  /** The first day that may be planned (today). */
  start: string;
  /** How many calendar days after `start` the plan may reach. */
  horizonDays: number;
  tables: readonly ScheduleTable[];
  calendar: WorkCalendar;
  orders: readonly ScheduleOrder[];
}

/** Work of one group on one table on one day. `quantity` is the trusses finished that day. */
export interface Placement {
  orderId: number;
  groupKey: string;
  mark: string;
  tableId: number;
  date: string;
  minutes: number;
  setupMinutes: number;
  quantity: number;
  pinned: boolean;
}

/** Where an order landed: its first and last days, and whether it makes its promised date. */
export interface OrderPlan {
  orderId: number;
  startOn: string | null;
  finishOn: string | null;
  promisedOn: string | null;
  /** True when the last truss is built after the promised date, or not within the horizon. */
  late: boolean;
  /** The date it can make (its last day of work), or null when beyond the horizon. */
  canMakeOn: string | null;
  /** Groups that did not fit within the horizon (or need more than a table's whole day per truss). */
  unplaced: string[];
}

/** Used and available crew-minutes of one table on one working day. */
export interface DayLoad {
  tableId: number;
  date: string;
  capacity: number;
  used: number;
}

export interface SchedulePlan {
  placements: Placement[];
  orders: OrderPlan[];
  load: DayLoad[];
}
