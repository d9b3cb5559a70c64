/**
 * Scheduler benchmark (`npm run bench`): re-plan 300 released orders over 10 weeks on 4 tables
 * (goal: under 1 s). Invented demo workload: 1–5 marks per order, 4–30 trusses per mark, 15–45
 * crew-minutes per truss, 20 min set-up; 4 tables of 2 crew × 2 shifts × 8 h; about 80 % loaded.
 */
import { planSchedule } from '../../shared/engine/schedule';
import { benchInput } from './scheduleWorkload';

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
