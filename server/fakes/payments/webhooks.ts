import { createHmac } from 'node:crypto';
import { now } from './store';

/**
 * Sends events to the app's webhook as the hosted service does: the JSON body signed in a
 * `Stripe-Signature: t=<unix time>,v1=<hex HMAC-SHA256 of "t.body" with the webhook secret>`
 * header, retried with growing delays (½ s doubling, at most 30 s) until the app answers 2xx.
 */
export function createSender(opts: { secret: string; url: () => string | null }) {
  let closed = false;
  const timers = new Set<NodeJS.Timeout>();
  const attempts: { eventId: string; status: number | null }[] = [];

  const sign = (payload: string) => {
    const t = now();
    const v1 = createHmac('sha256', opts.secret).update(`${t}.${payload}`).digest('hex');
    return `t=${t},v1=${v1}`;
  };

  const later = (fn: () => void, ms: number) => {
    const timer = setTimeout(() => {
      timers.delete(timer);
      fn();
    }, ms);
    timers.add(timer);
  };

  function deliver(event: { id: string }, attempt = 0) {
    if (closed) return;
    const url = opts.url();
    const retry = () =>
      later(() => deliver(event, attempt + 1), Math.min(500 * 2 ** attempt, 30_000));
    if (!url) return retry();
    const payload = JSON.stringify(event, null, 2);
    fetch(url, {
      method: 'POST',
      headers: {
        'Content-Type': 'application/json; charset=utf-8',
        'Stripe-Signature': sign(payload),
        'User-Agent': 'Spanwise-Payments-Fake/1.0',
      },
      body: payload,
    })
      .then((res) => {
        attempts.push({ eventId: event.id, status: res.status });
        if (res.status < 200 || res.status >= 300) retry();
      })
      .catch(() => {
        attempts.push({ eventId: event.id, status: null });
        retry();
      });
  }

  return {
    deliver,
    sign,
    attempts: () => [...attempts],
    close: () => {
      closed = true;
      for (const t of timers) clearTimeout(t);
      timers.clear();
    },
  };
}
