import type { MailMessage } from '../../../shared/api/pricing';

/** Messages newest first (by `receivedAt`); the fake keeps them in arrival order. */
export function newestFirst(messages: readonly MailMessage[]): MailMessage[] {
  return [...messages].sort(
    (a, b) => Date.parse(b.receivedAt) - Date.parse(a.receivedAt) || b.id.localeCompare(a.id),
  );
}

/** A byte count as people read it ("18.2 KB"), in 1024-byte units like file managers. */
export function formatSize(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  const units = ['KB', 'MB', 'GB'];
  let value = bytes / 1024;
  let unit = 0;
  while (value >= 1024 && unit < units.length - 1) {
    value /= 1024;
    unit += 1;
  }
  return `${value.toFixed(value < 10 ? 1 : 0)} ${units[unit]}`;
}
