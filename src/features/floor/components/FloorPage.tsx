import { formatDate } from '../../../lib/format';
import { useQueryClient } from '@tanstack/react-query';
import clsx from 'clsx';
import { useCallback, useEffect, useState } from 'react';
import {
  STAGES,
  type FloorLine,
  type ProgressInput,
  type Stage,
} from '../../../../shared/api/production';
import { Alert, QueryState } from '../../../components/ui';
import { useFloorDay } from '../api/get-today';
import { floorKeys } from '../api/keys';
import { enqueue, flushOutbox, readOutbox } from '../api/outbox';

const RETRY_MS = 5000;

/** Server counts plus the taps still waiting in the outbox. */
function shownCounts(line: FloorLine, queue: ProgressInput[]) {
  const counts = { ...line.counts } as Record<Stage, number>;
  for (const c of queue) if (c.lineId === line.lineId) counts[c.stage] += c.delta;
  return counts;
}

function LineCard({
  line,
  queue,
  onTap,
}: {
  line: FloorLine;
  queue: ProgressInput[];
  onTap: (line: FloorLine, stage: Stage, delta: number) => void;
}) {
  const counts = shownCounts(line, queue);
  return (
    <section
      className="rounded-lg border-2 border-sand-300 bg-white p-4"
      aria-label={`${line.orderNumber} ${line.mark}`}
    >
      <div className="mb-3 flex items-baseline justify-between gap-4">
        <h2 className="text-2xl font-bold text-sand-900">
          {line.mark} <span className="text-lg font-medium text-sand-600">× {line.quantity}</span>
        </h2>
        <p className="text-base text-sand-700">
          {line.orderNumber} · {line.customer} · build {line.plannedToday} today
        </p>
      </div>
      <p className="mb-3 text-sm text-sand-600">{line.description}</p>
      <div className="grid grid-cols-5 gap-2">
        {STAGES.filter((s) => s !== 'delivered').map((stage, i, all) => {
          const before = i === 0 ? line.quantity : counts[all[i - 1]];
          const done = counts[stage] >= line.quantity;
          // Waiting on the stage before (nothing more cut to assemble, …): greyed, not "done".
          const blocked = !done && counts[stage] >= before;
          return (
            <div key={stage} className="flex flex-col gap-1">
              <button
                type="button"
                disabled={done || blocked}
                onClick={() => onTap(line, stage, 1)}
                className={clsx(
                  'min-h-20 rounded-lg border-2 px-2 text-lg font-semibold',
                  done && 'border-success-200 bg-success-50 text-success-800',
                  blocked && 'border-sand-300 bg-sand-100 text-sand-600',
                  !done &&
                    !blocked &&
                    'border-timber-600 bg-timber-600 text-white active:bg-timber-800',
                )}
              >
                <span className="block text-2xl">
                  {counts[stage]} of {line.quantity}
                </span>
                <span className="block text-base">{stage}</span>
              </button>
              <button
                type="button"
                disabled={counts[stage] <= 0}
                onClick={() => onTap(line, stage, -1)}
                className="min-h-12 rounded-lg border-2 border-sand-300 bg-sand-50 text-base text-sand-800 disabled:opacity-40"
                aria-label={`Undo one ${stage} of ${line.mark}`}
              >
                − 1
              </button>
            </div>
          );
        })}
        <div className="flex items-center justify-center rounded-lg bg-sand-100 p-2 text-center text-sm text-sand-700">
          {counts.delivered} of {line.quantity} delivered
        </div>
      </div>
    </section>
  );
}

/** Today's work per table for the tablet on the floor: tap a stage to count one more truss. */
export function FloorPage() {
  const query = useFloorDay();
  const queryClient = useQueryClient();
  const [tableId, setTableId] = useState<number | null>(null);
  const [queue, setQueue] = useState<ProgressInput[]>(() => readOutbox());
  const [refused, setRefused] = useState<string[]>([]);
  const [offline, setOffline] = useState(false);

  const flush = useCallback(async () => {
    if (readOutbox().length === 0) return;
    const r = await flushOutbox();
    setOffline(r.offline);
    if (r.refused.length) setRefused((old) => [...old, ...r.refused.map((x) => x.message)]);
    setQueue(readOutbox());
    if (r.sent || r.refused.length)
      await queryClient.invalidateQueries({ queryKey: floorKeys.all });
  }, [queryClient]);

  useEffect(() => {
    const onOnline = () => void flush();
    window.addEventListener('online', onOnline);
    const timer = setInterval(() => void flush(), RETRY_MS);
    // Whatever an earlier visit left queued goes out as soon as the page opens.
    const first = setTimeout(() => void flush(), 0);
    return () => {
      window.removeEventListener('online', onOnline);
      clearInterval(timer);
      clearTimeout(first);
    };
  }, [flush]);

  const onTap = (line: FloorLine, stage: Stage, delta: number) => {
    enqueue({ lineId: line.lineId, stage, delta });
    setQueue(readOutbox());
    void flush();
  };

  return (
    <div className="mx-auto max-w-[1000px]">
      <QueryState query={query} what="today’s work">
        {(day) => {
          const current = day.tables.find((t) => t.id === tableId) ?? day.tables[0];
          return (
            <>
              <div className="mb-4 flex items-center justify-between gap-4">
                <h1 className="text-3xl font-bold text-sand-900">Today · {formatDate(day.date)}</h1>
                <a
                  href={`/api/floor/sheet.pdf?date=${day.date}`}
                  className="min-h-14 rounded-lg border-2 border-sand-300 bg-white px-4 py-3 text-lg text-sand-800"
                >
                  Daily sheet (PDF)
                </a>
                <div className="flex gap-2" role="tablist" aria-label="Tables">
                  {day.tables.map((t) => (
                    <button
                      key={t.id}
                      type="button"
                      role="tab"
                      aria-selected={t.id === current?.id}
                      onClick={() => setTableId(t.id)}
                      className={clsx(
                        'min-h-14 min-w-28 rounded-lg border-2 px-4 text-lg font-semibold',
                        t.id === current?.id
                          ? 'border-timber-700 bg-timber-700 text-white'
                          : 'border-sand-300 bg-white text-sand-800',
                      )}
                    >
                      {t.name} ({t.lines.length})
                    </button>
                  ))}
                </div>
              </div>
              {queue.length ? (
                <Alert tone="warning" className="mb-4 text-base">
                  {queue.length} change{queue.length > 1 ? 's' : ''} waiting
                  {offline ? ' for the network' : ''}; {queue.length > 1 ? 'they are' : 'it is'}{' '}
                  sent as soon as it answers and never counted twice.
                </Alert>
              ) : null}
              {refused.map((m, i) => (
                <Alert key={i} tone="danger" className="mb-2 text-base">
                  Not recorded: {m}
                </Alert>
              ))}
              <div className="flex flex-col gap-4">
                {current?.lines.length ? (
                  current.lines.map((l) => (
                    <LineCard key={`${l.lineId}`} line={l} queue={queue} onTap={onTap} />
                  ))
                ) : (
                  <p className="rounded-lg bg-sand-100 p-6 text-lg text-sand-700">
                    Nothing planned on this table today.
                  </p>
                )}
              </div>
            </>
          );
        }}
      </QueryState>
    </div>
  );
}
