import { describe, expect, it } from 'vitest';
import { spawn } from 'node:child_process';
import { testDatabaseUrl } from '../support/db';
import { createUser, TEST_PASSWORD } from '../support/factories';

/** `npm start` as a person runs it (here against the test database via DATABASE_URL). */
describe('npm start', () => {
  it('builds, serves the app over plain http with a working sign-in, and stops on Ctrl-C', async () => {
    const user = await createUser({ role: 'sales' });
    const port = 3400 + (process.pid % 500);
    const child = spawn('node_modules/.bin/tsx', ['scripts/start.ts'], {
      env: {
        ...process.env,
        DATABASE_URL: testDatabaseUrl(),
        PORT: String(port),
        SMTP_FAKE_PORT: '0',
        DEMO: 'false',
        // The suite signs in (and fails on purpose) thousands of times from this one address.
        LOGIN_ATTEMPTS_PER_ADDRESS: '100000',
        NODE_ENV: '',
      },
      stdio: ['ignore', 'pipe', 'pipe'],
      detached: true, // its own process group, so SIGINT reaches every process as Ctrl-C would
    });
    let out = '';
    child.stdout.on('data', (d) => (out += d));
    child.stderr.on('data', (d) => (out += d));
    const exited = new Promise<number | null>((r) => child.on('exit', (code) => r(code)));
    try {
      await expect
        .poll(() => out, { timeout: 90_000, interval: 250 })
        .toContain('Spanwise is running');
      const base = `http://127.0.0.1:${port}`;
      expect((await fetch(`${base}/`)).headers.get('content-type')).toContain('text/html');
      const csrf = await fetch(`${base}/api/auth/csrf`);
      const cookie = (csrf.headers.get('set-cookie') ?? '').split(';')[0];
      const { token } = (await csrf.json()) as { token: string };
      const login = await fetch(`${base}/api/auth/login`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', 'x-csrf-token': token, cookie },
        body: JSON.stringify({ email: user.email, password: TEST_PASSWORD }),
      });
      expect(login.status, out).toBe(200);
      // Not NODE_ENV=production: the session cookie must work over http on loopback.
      expect(login.headers.get('set-cookie')).not.toMatch(/;\s*secure/i);
    } finally {
      process.kill(-child.pid!, 'SIGINT');
    }
    expect(await exited).toBe(0);
    expect(out).toContain('Stopped app and database.');
  }, 150_000);
});
