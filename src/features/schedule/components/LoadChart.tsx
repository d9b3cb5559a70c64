import {
  Bar,
  BarChart,
  CartesianGrid,
  Legend,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import type { Schedule } from '../../../../shared/api/production';

type Load = Pick<Schedule, 'load'>;

/** Weekly planned hours against capacity, all tables together (lazy-loaded with recharts). */
export default function LoadChart({ board }: { board: Load }) {
  const weeks = new Map<string, { week: string; planned: number; capacity: number }>();
  for (const l of board.load) {
    const d = new Date(`${l.date}T00:00:00Z`);
    const monday = new Date(d.getTime() - ((d.getUTCDay() + 6) % 7) * 86_400_000);
    const week = monday.toISOString().slice(5, 10);
    const w = weeks.get(week) ?? { week, planned: 0, capacity: 0 };
    w.planned += l.used / 60;
    w.capacity += l.capacity / 60;
    weeks.set(week, w);
  }
  const data = [...weeks.values()].map((w) => ({
    week: `Week of ${w.week}`,
    planned: Math.round(w.planned),
    free: Math.max(0, Math.round(w.capacity - w.planned)),
  }));
  return (
    <div className="h-64" aria-label="Planned hours against capacity by week">
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={data}>
          <CartesianGrid strokeDasharray="3 3" stroke="#e7e0d5" />
          <XAxis dataKey="week" tick={{ fontSize: 12 }} />
          <YAxis unit=" h" tick={{ fontSize: 12 }} />
          <Tooltip />
          <Legend />
          <Bar
            dataKey="planned"
            name="Planned hours"
            stackId="a"
            fill="#744b2b"
            isAnimationActive={false}
          />
          <Bar
            dataKey="free"
            name="Free hours"
            stackId="a"
            fill="#dfc4a8"
            isAnimationActive={false}
          />
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}
