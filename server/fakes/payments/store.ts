/**
 * The fake's memory: the objects of the hosted payment API it serves (checkout sessions, payment
 * intents, refunds, events), shaped as that API returns them, plus idempotent replies.
 */
import { randomBytes } from 'node:crypto';

const ALPHABET = 'abcdefghijklmnopqrstuvwxyzABCDEFGHIJKLMNOPQRSTUVWXYZ0123456789';
/** An id in the hosted API's style: a type prefix and 24 random base-62 characters. */
export const newId = (prefix: string) =>
  `${prefix}_${Array.from(randomBytes(24), (b) => ALPHABET[b % 62]).join('')}`;
export const now = () => Math.floor(Date.now() / 1000);

type Obj = Record<string, unknown> & { id: string };

export interface Store {
  sessions: Map<string, Obj>;
  intents: Map<string, Obj>;
  refunds: Map<string, Obj>;
  events: Obj[];
  /** Idempotency-Key → the first reply, replayed for every retry with that key. */
  replies: Map<string, { status: number; body: unknown }>;
}

export const createStore = (): Store => ({
  sessions: new Map(),
  intents: new Map(),
  refunds: new Map(),
  events: [],
  replies: new Map(),
});

/** An event object as the hosted API sends and lists it. */
export function newEvent(type: string, object: Obj): Obj {
  return {
    id: newId('evt'),
    object: 'event',
    api_version: '2025-10-29.clover',
    created: now(),
    data: { object: structuredClone(object) },
    livemode: false,
    pending_webhooks: 1,
    request: { id: null, idempotency_key: null },
    type,
  };
}

/** The hosted API's error body. */
export const apiError = (
  type: 'invalid_request_error' | 'card_error' | 'api_error' | 'idempotency_error',
  message: string,
  extra: { code?: string; param?: string } = {},
) => ({ error: { type, message, ...extra } });
