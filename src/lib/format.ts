import { formatDay } from '../../shared/api/terms';

/** Formats an ISO timestamp as a short local date and time ("12 Mar 2025, 14:05"); '—' when null. */
export function formatDateTime(iso: string | null | undefined): string {
  if (!iso) return '—';
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return '—';
  return date.toLocaleString('en-GB', {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
  });
}

/**
 * Formats an ISO timestamp or a calendar date as a short date ("12 Mar 2025"); '—' when null or
 * invalid. A calendar date ("2025-03-12", e.g. a delivery day) is that day wherever the reader is.
 */
export function formatDate(iso: string | null | undefined): string {
  if (!iso) return '—';
  if (/^\d{4}-\d{2}-\d{2}$/.test(iso)) return formatDay(iso);
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return '—';
  return date.toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
}
