import { hasRole } from './predicates';

/**
 * Production: the plant manager sets up the plant and holds or releases orders; the foreman runs
 * the schedule and the floor; the desk reads the schedule and promises dates.
 */
export const productionPolicy = {
  readSettings: hasRole('admin', 'foreman', 'sales'),
  writeSettings: hasRole('admin'),
  readSchedule: hasRole('admin', 'foreman', 'sales'),
  move: hasRole('admin', 'foreman'),
  promise: hasRole('admin', 'sales'),
  holdOrRelease: hasRole('admin'),
  floor: hasRole('admin', 'foreman'),
  signOffDelivery: hasRole('admin', 'foreman'),
};
