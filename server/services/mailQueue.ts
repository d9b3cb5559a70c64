/**
 * Mail through the PostgreSQL job queue (pg-boss), with an outbox. A command writes its messages to
 * `mail_messages` in its own transaction, so a message exists exactly when the change that caused it
 * does; the relay moves new outbox rows to the queue (right after the commit, and on a timer, so a
 * crash in between loses nothing); the worker sends each through the nodemailer mailer, retrying
 * with backoff while the SMTP server is down, and records its delivery state for the desk.
 */
import { EventEmitter } from 'node:events';
import PgBoss from 'pg-boss';
import { Op, type Transaction } from 'sequelize';
import { MailMessage } from '../models';
import type { MailAttachment } from '../models/MailMessage';
import type { Mailer, OutgoingMail } from './mail';
import { serialRun } from './serialRun';

export const MAIL_QUEUE = 'mail-send';
const RETRY = { retryLimit: 12, retryDelay: 2, retryBackoff: true } as const;

export interface MailQueue {
  boss: PgBoss;
  /** Move waiting outbox rows to the queue now. */
  relay: () => Promise<void>;
  stop: () => Promise<void>;
}

export interface NewMail {
  plantId: number;
  orderId: number | null;
  kind: string;
  to: string;
  subject: string;
  body: string;
  attachment?: MailAttachment | null;
}

/** Committed outbox rows wake the relays of this process (others find them on their timer). */
const committed = new EventEmitter();

/** Write one message to the outbox inside the caller's transaction. */
export async function queueMail(t: Transaction, mail: NewMail) {
  const row = await MailMessage.create(
    {
      plantId: mail.plantId,
      orderId: mail.orderId,
      kind: mail.kind,
      toAddress: mail.to,
      subject: mail.subject,
      body: mail.body,
      attachment: mail.attachment ?? null,
    },
    { transaction: t },
  );
  t.afterCommit(() => void committed.emit('mail'));
  return row;
}

/** Renders a message's attachment when it is sent (quote PDF, receipt PDF). */
export type AttachmentRenderer = (
  a: MailAttachment,
) => Promise<NonNullable<OutgoingMail['attachments']>[number]>;

/** Send one outbox row; records the delivery state. Throws (so the queue retries) on failure. */
export async function deliver(
  id: number,
  mailer: Mailer,
  render: AttachmentRenderer,
  final: boolean,
) {
  const row = await MailMessage.findByPk(id);
  if (!row || row.status === 'sent') return;
  try {
    const attachments = row.attachment ? [await render(row.attachment)] : undefined;
    await mailer.send({
      to: row.toAddress,
      plantId: row.plantId, // the demo inbox shows each plant its own mail
      subject: row.subject,
      text: row.body,
      attachments,
    });
    await row.update({ status: 'sent', sentAt: new Date(), attempts: row.attempts + 1 });
  } catch (e) {
    await row.update({
      status: final ? 'failed' : 'retrying',
      attempts: row.attempts + 1,
      lastError: (e as Error).message.slice(0, 2000),
    });
    throw e;
  }
}

/** Move outbox rows without a job to the queue (one job per row: the row id is its key). */
async function relay(boss: PgBoss) {
  const waiting = await MailMessage.findAll({
    where: { status: { [Op.in]: ['queued', 'retrying'] }, jobId: null },
    order: [['id', 'ASC']],
    limit: 100,
  });
  for (const row of waiting) {
    const jobId = await boss.send(
      MAIL_QUEUE,
      { id: row.id },
      { ...RETRY, singletonKey: `mail-${row.id}` },
    );
    await MailMessage.update(
      { jobId: jobId ?? 'duplicate' },
      { where: { id: row.id, jobId: null } },
    );
  }
}

let lastError: string | null = null;

/**
 * Start pg-boss on the database (it keeps its own `pgboss` schema) and a worker that sends queued
 * mail through `mailer`. `pollingIntervalSeconds` is short in tests.
 */
export async function startMailQueue(opts: {
  databaseUrl: string;
  mailer: Mailer;
  render: AttachmentRenderer;
  pollingIntervalSeconds?: number;
}): Promise<MailQueue> {
  const boss = new PgBoss({ connectionString: opts.databaseUrl, max: 3 });
  boss.on('error', (e: Error) => {
    lastError = e.message;
  });
  await boss.start();
  if (!(await boss.getQueue(MAIL_QUEUE)))
    await boss.createQueue(MAIL_QUEUE, { name: MAIL_QUEUE, ...RETRY });
  await boss.work<{ id: number }>(
    MAIL_QUEUE,
    { includeMetadata: true, pollingIntervalSeconds: opts.pollingIntervalSeconds ?? 2 },
    async ([job]) => {
      await deliver(job.data.id, opts.mailer, opts.render, job.retryCount >= job.retryLimit);
    },
  );
  // One relay at a time per process; a wake-up during a run runs it once more.
  const { run, idle } = serialRun(
    () => relay(boss),
    (e) => void (lastError = e.message),
  );
  const wake = () => void run();
  committed.on('mail', wake);
  await run();
  const timer = setInterval(wake, (opts.pollingIntervalSeconds ?? 2) * 1000 * 5);
  timer.unref();
  return {
    boss,
    relay: run,
    stop: async () => {
      clearInterval(timer);
      committed.off('mail', wake);
      await idle();
      await boss.stop({ graceful: true, wait: true, timeout: 5000 });
    },
  };
}

/** Health probe: the queue's worker and how many messages wait or failed. */
export async function mailProbe(queue: MailQueue | null) {
  const [waiting, failed] = await Promise.all([
    MailMessage.count({ where: { status: { [Op.in]: ['queued', 'retrying'] } } }),
    MailMessage.count({ where: { status: 'failed' } }),
  ]);
  return {
    status: queue ? (lastError ? 'degraded' : 'ok') : 'not_running',
    waiting,
    failed,
    ...(lastError ? { error: lastError } : {}),
  };
}
