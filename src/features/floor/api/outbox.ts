import { z } from 'zod';
import { progressSchema, type ProgressInput } from '../../../../shared/api/production';
import { api, isApiError } from '../../../lib/api-client';

/**
 * The floor's outbox: every tap is stored in localStorage with its own id before it is sent, and
 * stays there until the server has answered it. The server records each id once, so sending a
 * change again after a lost answer never counts it twice.
 */
const STORAGE_KEY = 'spanwise.floor.outbox';
const queued = z.array(progressSchema);

export function readOutbox(): ProgressInput[] {
  try {
    const parsed = queued.safeParse(JSON.parse(localStorage.getItem(STORAGE_KEY) ?? '[]'));
    return parsed.success ? parsed.data : [];
  } catch {
    return [];
  }
}

function writeOutbox(items: ProgressInput[]) {
  localStorage.setItem(STORAGE_KEY, JSON.stringify(items));
}

/** Queue one change (a new client id) and return it. */
export function enqueue(change: Omit<ProgressInput, 'clientId'>): ProgressInput {
  const item = { ...change, clientId: crypto.randomUUID() };
  writeOutbox([...readOutbox(), item]);
  return item;
}

export interface FlushResult {
  sent: number;
  refused: { change: ProgressInput; message: string }[];
  offline: boolean;
}

/** `POST /api/floor/progress` of one queued change. */
const sendProgress = (change: ProgressInput) =>
  api.request('/api/floor/progress', { method: 'POST', body: change });

/**
 * Send queued changes in order. A refused change (400/403/404/409) leaves the queue with its
 * message; a network failure, a lapsed sign-in or a server error stops the flush and keeps the
 * rest for the next try.
 */
export async function flushOutbox(): Promise<FlushResult> {
  const result: FlushResult = { sent: 0, refused: [], offline: false };
  for (const change of readOutbox()) {
    try {
      await sendProgress(change);
      result.sent++;
    } catch (e) {
      if (isApiError(e) && [400, 403, 404, 409].includes(e.status)) {
        result.refused.push({ change, message: e.message });
      } else {
        result.offline = true;
        break;
      }
    }
    writeOutbox(readOutbox().filter((c) => c.clientId !== change.clientId));
  }
  return result;
}
