import type { Sequelize } from 'sequelize';

/** One named check of a service the app depends on: resolves when it is fine, throws when not. */
export type HealthProbe = () => Promise<void>;

/**
 * `GET /api/health` reports each service separately: `db` always, and `mail` (the queue) and
 * `payments` when the app was given their probes (`createApp({ healthProbes })` or
 * `app.locals.healthProbes.set(name, probe)`); a service without a probe reports "not configured".
 */
export async function healthReport(
  sequelize: Sequelize,
  probes: Map<string, HealthProbe>,
): Promise<{ ok: boolean; checks: Record<string, string> }> {
  const named = new Map<string, HealthProbe | null>([
    ['db', async () => void (await sequelize.query('SELECT 1'))],
    ['mail', null],
    ['payments', null],
  ]);
  for (const [name, probe] of probes) named.set(name, probe);
  const checks: Record<string, string> = {};
  let ok = true;
  await Promise.all(
    [...named].map(async ([name, probe]) => {
      if (!probe) return void (checks[name] = 'not configured');
      try {
        await withTimeout(probe(), 3000);
        checks[name] = 'ok';
      } catch {
        checks[name] = 'unreachable';
        ok = false;
      }
    }),
  );
  return { ok, checks };
}

const withTimeout = <T>(p: Promise<T>, ms: number) =>
  Promise.race([
    p,
    new Promise<never>((_, reject) => setTimeout(() => reject(new Error('timed out')), ms).unref()),
  ]);
