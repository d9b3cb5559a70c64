/**
 * A local SMTP fake (the `smtp-server` package) on loopback: accepts every message and keeps it, so
 * demo mode and tests can read what the app sent. Never used when SMTP_URL points at a real relay.
 */
import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';
import { randomUUID } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import type { MailMessage } from '../../shared/api/pricing';
import { PLANT_HEADER } from './mail';

export interface SmtpFake {
  url: string;
  port: number;
  /** Newest first; with a plant id, only the messages that plant sent. */
  messages: (plantId?: number) => MailMessage[];
  clear: () => void;
  close: () => Promise<void>;
}

const addresses = (v: unknown): string[] => {
  const list = Array.isArray(v) ? v : v ? [v] : [];
  return list
    .flatMap((a: { value?: { address?: string }[] }) => (a.value ?? []).map((x) => x.address ?? ''))
    .filter(Boolean);
};

/** Start the fake on 127.0.0.1 (port 0 picks a free one). */
export async function startSmtpFake(port = 0): Promise<SmtpFake> {
  const kept: (MailMessage & { plantId: number | null })[] = [];
  const server = new SMTPServer({
    secure: false,
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    banner: 'Spanwise local mail fake',
    size: 40 * 1024 * 1024,
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((mail) => {
          kept.push({
            id: randomUUID(),
            plantId: Number(mail.headers.get(PLANT_HEADER.toLowerCase()) ?? NaN) || null,
            receivedAt: new Date().toISOString(),
            from: addresses(mail.from)[0] ?? '',
            to: addresses(mail.to),
            subject: mail.subject ?? '',
            text: mail.text ?? '',
            attachments: mail.attachments.map((a) => ({
              filename: a.filename ?? 'attachment',
              contentType: a.contentType,
              size: a.size,
            })),
          });
          callback();
        })
        .catch((e: Error) => callback(e));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  const actual = (server.server.address() as AddressInfo).port;
  return {
    url: `smtp://127.0.0.1:${actual}`,
    port: actual,
    messages: (plantId) =>
      kept
        .filter((m) => plantId === undefined || m.plantId === plantId)
        .map(({ plantId: _plant, ...m }) => m)
        .reverse(),
    clear: () => void kept.splice(0),
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
