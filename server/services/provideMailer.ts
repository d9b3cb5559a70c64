/** SMTP_URL, or the local SMTP fake on 127.0.0.1:2525 (SMTP_FAKE_PORT) started with the app. */
import { createMailer, type Mailer } from './mail';
import { startSmtpFake } from './smtpFake';

export const SMTP_FAKE_PORT = Number(process.env.SMTP_FAKE_PORT ?? 2525);

export async function provideMailer(): Promise<Mailer> {
  if (process.env.SMTP_URL) return createMailer({ url: process.env.SMTP_URL });
  const fake = await startSmtpFake(SMTP_FAKE_PORT);
  return createMailer({ url: fake.url, fake });
}
