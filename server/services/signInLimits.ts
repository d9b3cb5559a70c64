import { QueryTypes, type Sequelize } from 'sequelize';

export interface SignInLimitOptions {
  /** Failures per window for one e-mail from one address (typos never lock out a colleague). */
  perEmail: number;
  /** Failures per window from one address across every e-mail (a password-spraying guard). */
  perAddress: number;
  windowSeconds: number;
}

/** The counters an attempt counts against: its address, and its address with the e-mail. */
export const signInKeys = (address: string, normalisedEmail: string) => ({
  address: `addr:${address}`,
  email: `mail:${address}|${normalisedEmail}`,
});
type Keys = ReturnType<typeof signInKeys>;

/**
 * Sign-in limits whose counters live in PostgreSQL (table `sign_in_limits`), so every app server
 * behind a load balancer counts the same attempts. Only failures count: an attempt is counted
 * before it runs (so parallel guesses cannot slip past the limit) and given back when it succeeds.
 */
export function signInLimits(sequelize: Sequelize, opts: SignInLimitOptions) {
  const window = opts.windowSeconds;
  return {
    /** Count an attempt; the seconds to wait when either limit is already used up, else null. */
    async begin(keys: Keys): Promise<number | null> {
      const rows = await sequelize.query<{ key: string; failures: number; wait: number }>(
        `INSERT INTO sign_in_limits AS l (key, failures, window_start)
           VALUES (:address, 1, now()), (:email, 1, now())
         ON CONFLICT (key) DO UPDATE SET
           failures = CASE WHEN l.window_start <= now() - make_interval(secs => :window)
                           THEN 1 ELSE l.failures + 1 END,
           window_start = CASE WHEN l.window_start <= now() - make_interval(secs => :window)
                               THEN now() ELSE l.window_start END
         RETURNING key, failures,
           ceil(extract(epoch FROM l.window_start + make_interval(secs => :window) - now()))::int AS wait`,
        { replacements: { ...keys, window }, type: QueryTypes.SELECT },
      );
      const over = rows.filter(
        (r) => r.failures > (r.key === keys.address ? opts.perAddress : opts.perEmail),
      );
      return over.length ? Math.max(1, ...over.map((r) => r.wait)) : null;
    },
    /** A success: give the attempt back, clear this e-mail's failures, sweep old counters. */
    async succeeded(keys: Keys) {
      await sequelize.query(
        `UPDATE sign_in_limits SET failures = greatest(failures - 1, 0) WHERE key = :address;
         DELETE FROM sign_in_limits
          WHERE key = :email OR window_start < now() - make_interval(secs => :window * 4)`,
        { replacements: { ...keys, window } },
      );
    },
  };
}
