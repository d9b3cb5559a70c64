import { releaseIfReady } from '../commands/release';
import { logger } from '../logger';
import type { Mailer } from './mail';
import type { User } from '../models';

/**
 * After money arrives or a quote is accepted, release the order by itself if it may now be
 * released (every design approved, deposit paid or account terms). A separate transaction after
 * the payment's: a failure here leaves the payment recorded and is logged; the next approval,
 * payment or a manual release catches up.
 */
export async function releaseWhenReady(
  orderId: number | null,
  mailer: Mailer | null,
  actor: User | null = null,
) {
  if (orderId === null) return;
  try {
    await releaseIfReady(actor, orderId, mailer);
  } catch (err) {
    logger.warn({ err, orderId }, 'automatic release after payment failed');
  }
}
