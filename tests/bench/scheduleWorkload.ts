/**
 * The scheduler benchmarks' workload (invented demo data): 300 released orders over 10 weeks on 4
 * tables, 1–5 marks per order, 4–30 trusses per mark, 15–45 crew-minutes per truss, 20 min set-up.
 */
import { addCalendarDays, type ScheduleInput } from '../../shared/engine/schedule';

// A fixed pseudo-random sequence (mulberry32) so every run plans the same workload.
function rng(seed: number) {
  return () => {
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** The same workload every run (fixed seed). */
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
