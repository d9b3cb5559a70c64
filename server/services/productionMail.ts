/**
 * E-mails production sends to builders (release, promised and planned delivery dates). Written to
 * the mail outbox inside the transaction of the change that causes them, so the PostgreSQL job
 * queue sends each exactly when that change commits (`server/services/mailQueue.ts`).
 */
import { formatDay as formatCalendarDay } from '../../shared/api/terms';
import type { Transaction } from 'sequelize';
import { queueMail } from './mailQueue';

/** One production e-mail to a builder, about one order. */
export interface BuilderMail {
  plantId: number;
  orderId: number;
  /** `production.released`, `production.promised` or `production.planned`. */
  kind: string;
  to: string;
  subject: string;
  text: string;
}

/** Queue builder e-mails in the caller's transaction. */
export async function queueBuilderMail(t: Transaction, mails: readonly BuilderMail[]) {
  for (const m of mails)
    await queueMail(t, {
      plantId: m.plantId,
      orderId: m.orderId,
      kind: m.kind,
      to: m.to,
      subject: m.subject,
      body: m.text,
    });
}

/** "2027-03-04" → "Thu 4 Mar 2027" (the day, never shifted by time zones). */
export const formatDay = (iso: string): string => formatCalendarDay(iso, 'weekday');
