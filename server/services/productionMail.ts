/**
 * E-mails production sends to builders (release, promised and planned delivery dates). Sent
 * directly through the app's mailer after the change commits, like quotes; this one function is
 * where the PostgreSQL job queue takes over.
 */
import type { Mailer, OutgoingMail } from './mail';

export async function sendBuilderMail(mailer: Mailer | null, mails: readonly OutgoingMail[]) {
  if (!mailer) return;
  for (const m of mails) {
    try {
      await mailer.send(m);
    } catch (e) {
      // The change stands; a lost notice must not undo it.
      console.error(`Production e-mail to ${m.to} failed: ${(e as Error).message}`);
    }
  }
}

/** "2027-03-04" → "Thu 4 Mar 2027" (the day, never shifted by time zones). */
export function formatDay(iso: string): string {
  return new Date(`${iso}T00:00:00Z`).toLocaleDateString('en-GB', {
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    timeZone: 'UTC',
  });
}
