import { describe, expect, it } from 'vitest';
import { testMailer } from '../../support/db';

describe('mail through the local SMTP fake', () => {
  it('delivers a message with its attachment over real SMTP on loopback', async () => {
    const mailer = await testMailer();
    const to = `builder-${Date.now()}@example.test`;
    await mailer.send({
      to,
      subject: 'Your truss quote',
      text: 'Attached.',
      attachments: [
        {
          filename: 'quote.pdf',
          content: Buffer.from('%PDF-1.4 test'),
          contentType: 'application/pdf',
        },
      ],
    });
    const got = mailer.fake!.messages().find((m) => m.to.includes(to));
    expect(got).toMatchObject({
      subject: 'Your truss quote',
      attachments: [{ filename: 'quote.pdf', contentType: 'application/pdf' }],
    });
    expect(got!.text).toContain('Attached.');
  });
});
