/** Settings from the environment, read once. Every variable is listed in the README. */
export interface Config {
  port: number;
  host: string;
  production: boolean;
  demo: boolean;
  sessionSecret: string;
  sessionIdleMinutes: number;
  loginAttemptsPer15Min: number;
  /** Failed sign-ins per 15 minutes from one address across all e-mails. */
  loginAttemptsPerAddress: number;
  /** Proxy hops in front of the app whose X-Forwarded-For is believed (0: none). */
  trustProxy: number;
  /** Absolute address people open Spanwise at (QR codes on truss tags point here). */
  publicUrl: string;
}

export function readConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const production = env.NODE_ENV === 'production';
  const sessionSecret = env.SESSION_SECRET ?? (production ? '' : 'spanwise-dev-session-secret');
  if (!sessionSecret) throw new Error('SESSION_SECRET must be set when NODE_ENV=production');
  return {
    port: Number(env.PORT ?? 3000),
    host: env.HOST ?? '127.0.0.1',
    production,
    demo: env.DEMO !== 'false',
    sessionSecret,
    sessionIdleMinutes: Number(env.SESSION_IDLE_MINUTES ?? 120),
    loginAttemptsPer15Min: Number(env.LOGIN_ATTEMPTS ?? 10),
    loginAttemptsPerAddress: Number(env.LOGIN_ATTEMPTS_PER_ADDRESS ?? 50),
    trustProxy: Number(env.TRUST_PROXY ?? (production ? 1 : 0)),
    // Default: where the app itself listens (http://127.0.0.1:3000 unless HOST/PORT say otherwise).
    publicUrl: (env.PUBLIC_URL ?? `http://${env.HOST ?? '127.0.0.1'}:${env.PORT ?? 3000}`).replace(
      /\/+$/,
      '',
    ),
  };
}
