/**
 * Scheduler benchmark (`npm run bench`): re-plan 300 released orders over 10 weeks on 4 tables
 * (goal: under 1 s). Invented demo workload: 1–5 marks per order, 4–30 trusses per mark, 15–45
 * crew-minutes per truss, 20 min set-up; 4 tables of 2 crew × 2 shifts × 8 h; about 80 % loaded.
 */
import { addCalendarDays, planSchedule, type ScheduleInput } from '../../shared/engine/schedule';

// A fixed pseudo-random sequence (mulberry32) so every run plans the same workload.
function rng(seed: number) {
  return () => {
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export function benchInput(orders = 300): ScheduleInput {
  const r = rng(13);
  const int = (a: number, b: number) => a + Math.floor(r() * (b - a + 1));
  const start = '2027-03-01';
  return {
    start,
    horizonDays: 70,
    tables: [1, 2, 3, 4].map((id) => ({
      id,
      name: `Table ${id}`,
      crew: 3,
      shifts: 2,
      hoursPerShift: 8,
    })),
    calendar: { workingDays: [1, 2, 3, 4, 5], closures: ['2027-04-02'] },
    orders: Array.from({ length: orders }, (_, i) => {
      const release = int(0, 55);
      return {
        id: i + 1,
        releasedOn: addCalendarDays(start, release),
        promisedOn: addCalendarDays(start, release + int(5, 20)),
        groups: Array.from({ length: int(1, 5) }, (_, j) => ({
          key: `${i + 1}-${j}`,
          mark: `T${j + 1}`,
          quantity: int(4, 30),
          minutesPerTruss: int(15, 45),
          setupMinutes: 20,
        })),
      };
    }),
  };
}

const input = benchInput();
for (let i = 0; i < 20; i++) planSchedule(input);
const samples: number[] = [];
const end = performance.now() + 3000;
let plan = planSchedule(input);
while (performance.now() < end) {
  const t0 = performance.now();
  plan = planSchedule(input);
  samples.push(performance.now() - t0);
}
samples.sort((a, b) => a - b);
const at = (q: number) => samples[Math.min(samples.length - 1, Math.floor(q * samples.length))];
const capacity = plan.load.reduce((s, l) => s + l.capacity, 0);
const used = plan.load.reduce((s, l) => s + l.used, 0);
console.log(
  `schedule: re-plan ${input.orders.length} orders, ${plan.placements.length} placements, ` +
    `4 tables × ${plan.load.length / 4} days (${Math.round((100 * used) / capacity)} % loaded, ` +
    `${plan.orders.filter((o) => o.late).length} late): median ${at(0.5).toFixed(2)} ms, ` +
    `p95 ${at(0.95).toFixed(2)} ms (${samples.length} runs; goal < 1000 ms)`,
);
