import { useEffect, useMemo, useState } from 'react';
import { Bar, BarChart, Tooltip, XAxis, YAxis } from 'recharts';
import type { Schedule } from '../../../../shared/api/production';
import { formatDay } from '../../../../shared/api/terms';

type Load = Pick<Schedule, 'load'>;

const PLANNED = '#744b2b';
const FREE = '#dfc4a8';

interface TickProps {
  x: string | number;
  y: string | number;
  payload: { value: string | number };
}

/** An axis label as plain SVG text: recharts' own measures each word in the DOM to wrap it. */
const tick =
  (anchor: 'middle' | 'end', dy: string, unit = '') =>
  ({ x, y, payload }: TickProps) => (
    <text x={x} y={y} dy={dy} textAnchor={anchor} fontSize={12} fill="#6b6259">
      {payload.value}
      {unit}
    </text>
  );
const WEEK_TICK = tick('middle', '0.71em');
const HOURS_TICK = tick('end', '0.32em', ' h');

/** Planned and free hours per week (by its Monday), all tables together. */
function weeklyLoad(load: Load['load']) {
  const weeks = new Map<string, { week: string; planned: number; capacity: number }>();
  for (const l of load) {
    const d = new Date(`${l.date}T00:00:00Z`);
    const monday = new Date(d.getTime() - ((d.getUTCDay() + 6) % 7) * 86_400_000);
    const key = monday.toISOString().slice(0, 10);
    // A week by its Monday ("30 Nov"), short enough for every week's tick on a tablet.
    const w = weeks.get(key) ?? { week: formatDay(key, 'noYear'), planned: 0, capacity: 0 };
    w.planned += l.used / 60;
    w.capacity += l.capacity / 60;
    weeks.set(key, w);
  }
  return [...weeks.values()].map((w) => ({
    week: w.week,
    planned: Math.round(w.planned),
    free: Math.max(0, Math.round(w.capacity - w.planned)),
  }));
}

/** The chart's parts in the order they are added: axes, the two bars, the tooltip. */
const PARTS = 5;

/**
 * How many of the chart's parts to draw: one more per task. recharts keeps its state in a store
 * whose updates React renders synchronously, so the whole chart mounted at once is one long task
 * (60–90 ms of CPU under a full board); a part at a time keeps each task short.
 */
function usePartsShown() {
  const [shown, setShown] = useState(0);
  useEffect(() => {
    if (shown >= PARTS) return;
    const id = setTimeout(() => setShown((n) => n + 1), 0);
    return () => clearTimeout(id);
  }, [shown]);
  return shown;
}

const formatLabel = (week: unknown) => `Week of ${String(week)}`;

/**
 * Weekly planned hours against capacity, all tables together (lazy-loaded with recharts). Kept
 * lean, as it is drawn beside a full board: every axis tick shown (`interval={0}`), ticks as plain
 * text and no grid lines, so recharts measures no label in the DOM (each a forced layout of the
 * whole page); the legend is plain HTML; the chart sizes itself to its box (`responsive`). Its
 * parts are added one task at a time, the chart hidden until all are drawn.
 */
export default function LoadChart({ board }: { board: Load }) {
  const data = useMemo(() => weeklyLoad(board.load), [board.load]);
  const shown = usePartsShown();
  return (
    <div data-testid="load-chart" aria-label="Planned hours against capacity by week">
      <BarChart
        data={data}
        responsive
        style={{ width: '100%', height: 232, visibility: shown < PARTS ? 'hidden' : undefined }}
      >
        {shown >= 1 ? <XAxis dataKey="week" tick={WEEK_TICK} interval={0} /> : null}
        {shown >= 2 ? <YAxis tick={HOURS_TICK} interval={0} /> : null}
        {shown >= 3 ? (
          <Bar
            dataKey="planned"
            name="Planned hours"
            stackId="a"
            fill={PLANNED}
            isAnimationActive={false}
          />
        ) : null}
        {shown >= 4 ? (
          <Bar dataKey="free" name="Free hours" stackId="a" fill={FREE} isAnimationActive={false} />
        ) : null}
        {shown >= 5 ? <Tooltip labelFormatter={formatLabel} /> : null}
      </BarChart>
      <ul className="flex justify-center gap-4 text-sm text-sand-700">
        {[
          ['Planned hours', PLANNED],
          ['Free hours', FREE],
        ].map(([name, colour]) => (
          <li key={name} className="flex items-center gap-1.5">
            <span className="inline-block size-3" style={{ background: colour }} aria-hidden />
            {name}
          </li>
        ))}
        <li>weeks by their Monday</li>
      </ul>
    </div>
  );
}
