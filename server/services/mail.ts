/** Outgoing mail through nodemailer over SMTP: SMTP_URL, or the local fake started with the app. */
import nodemailer, { type Transporter } from 'nodemailer';
import type { SmtpFake } from './smtpFake';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
  /** The plant that sends it: carried in a header so the demo inbox shows each plant its own. */
  plantId?: number;
}

/** The header naming the sending plant (read back by the local SMTP fake). */
export const PLANT_HEADER = 'X-Spanwise-Plant';

export interface Mailer {
  send: (mail: OutgoingMail) => Promise<{ messageId: string }>;
  /** Present only while the local SMTP fake is in use. */
  fake: SmtpFake | null;
  from: string;
}

/** A mailer for an SMTP URL; `fake` marks the local fake so the dev inbox can show it. */
export function createMailer(opts: { url: string; fake?: SmtpFake | null; from?: string }): Mailer {
  // The local fake speaks plain SMTP on loopback; a real relay negotiates TLS as its URL says.
  const transport: Transporter = nodemailer.createTransport(
    opts.fake ? ({ url: opts.url, ignoreTLS: true } as never) : opts.url,
  );
  const from = opts.from ?? process.env.MAIL_FROM ?? 'Spanwise <quotes@spanwise.test>';
  return {
    fake: opts.fake ?? null,
    from,
    send: async ({ plantId, ...mail }) => {
      const headers = plantId === undefined ? undefined : { [PLANT_HEADER]: String(plantId) };
      const info = await transport.sendMail({ from, ...mail, headers });
      return { messageId: info.messageId };
    },
  };
}
