import type { Role } from '../../shared/api/roles';

/**
 * Who may create and edit builders, jobs, orders and truss lines (the server enforces the same;
 * the client only hides what a role cannot do).
 */
export function canManageSales(role: Role): boolean {
  return role === 'admin' || role === 'sales';
}

/** Who may list builder companies (and so filter other lists by builder). */
export function canListBuilders(role: Role): boolean {
  return role === 'admin' || role === 'sales';
}
