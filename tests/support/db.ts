import type { Sequelize } from 'sequelize';
import { connect } from '../../server/db/sequelize';
import { createApp } from '../../server/app';
import { createMailer, type Mailer } from '../../server/services/mail';
import { startSmtpFake } from '../../server/services/smtpFake';

/** The database `npm test` started (scripts/test.ts sets TEST_DATABASE_URL). */
export function testDatabaseUrl() {
  const url = process.env.TEST_DATABASE_URL;
  if (!url)
    throw new Error('TEST_DATABASE_URL is not set: run the integration tests through `npm test`.');
  return url;
}

let shared: Sequelize | null = null;

/** One Sequelize per test file's worker. */
export function testSequelize() {
  shared ??= connect(testDatabaseUrl());
  return shared;
}

let mailer: Mailer | null = null;

/** The test worker's local SMTP fake (started on a free port on first use) and its mailer. */
export async function testMailer() {
  if (!mailer) {
    const fake = await startSmtpFake(0);
    mailer = createMailer({ url: fake.url, fake });
  }
  return mailer;
}

/** A fresh app on the test database; options override config (e.g. the sign-in limit). */
export function testApp(
  config: Parameters<typeof createApp>[0]['config'] = {},
  clientDir?: string,
  mail?: Mailer,
) {
  return createApp({
    sequelize: testSequelize(),
    databaseUrl: testDatabaseUrl(),
    config: {
      demo: false,
      loginAttemptsPer15Min: 1000,
      loginAttemptsPerAddress: 100_000,
      ...config,
    },
    clientDir,
    mailer: mail,
  });
}
