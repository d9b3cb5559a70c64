/** Production scheduling: capacity of the plant's tables and the plan of released orders. */
export * from './types';
export { dayNumber, isoDay, addCalendarDays, workingDates, tableDayMinutes } from './calendar';
export { trussMinutes, calibrationFactor, type LabourModel, type TrussWork } from './minutes';
export { planSchedule } from './plan';
export { plannedDelivery } from './delivery';
export {
  INSPECTIONS_PER_SHIFT_PER_WEEK,
  weekStart,
  inspectionsDue,
  type StationDue,
} from './inspections';
