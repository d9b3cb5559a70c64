import type { AreaLoads, DesignCriteria } from './jobs';

/** The loads a job sets for its trusses, in the plant's units (psf or kPa). */
export interface JobDesignLoads extends AreaLoads {
  groundSnow: number | null;
  windUplift: number | null;
}

/** The job's loads: the plant defaults with the job's overrides, plus its site snow and wind. */
export function jobDesignLoads(defaults: AreaLoads, criteria: DesignCriteria): JobDesignLoads {
  const o = criteria.loads ?? {};
  return {
    tcll: o.tcll ?? defaults.tcll,
    tcdl: o.tcdl ?? defaults.tcdl,
    bcll: o.bcll ?? defaults.bcll,
    bcdl: o.bcdl ?? defaults.bcdl,
    groundSnow: criteria.groundSnow ?? null,
    windUplift: criteria.windUplift ?? null,
  };
}

const LABELS: Record<keyof JobDesignLoads, string> = {
  tcll: 'TCLL',
  tcdl: 'TCDL',
  bcll: 'BCLL',
  bcdl: 'BCDL',
  groundSnow: 'ground snow',
  windUplift: 'wind uplift',
};

/** "TCLL 20 → 30 psf, ground snow none → 25 psf": what changed between two sets of job loads. */
export function describeLoadChange(
  before: JobDesignLoads,
  after: JobDesignLoads,
  unit: string,
): string {
  const v = (x: number | null) => (x === null ? 'none' : String(x));
  return (Object.keys(LABELS) as (keyof JobDesignLoads)[])
    .filter((k) => before[k] !== after[k])
    .map((k) => `${LABELS[k]} ${v(before[k])} → ${v(after[k])} ${unit}`)
    .join(', ');
}

interface LoadsOfDesign {
  tcll?: unknown;
  tcdl?: unknown;
  bcll?: unknown;
  bcdl?: unknown;
  snow?: { pg?: unknown } & Record<string, unknown>;
  windUplift?: unknown;
}

/** Whether a stored design input was made with these job loads (same units assumed). */
export function designUsesJobLoads(design: Record<string, unknown>, job: JobDesignLoads) {
  const l = (design.loads ?? {}) as LoadsOfDesign;
  const num = (x: unknown) => (typeof x === 'number' ? x : null);
  const wind = num(l.windUplift);
  return (
    num(l.tcll) === job.tcll &&
    num(l.tcdl) === job.tcdl &&
    num(l.bcll) === job.bcll &&
    num(l.bcdl) === job.bcdl &&
    num(l.snow?.pg) === job.groundSnow &&
    (wind === job.windUplift || (wind === 0 && job.windUplift === null))
  );
}

/**
 * A design input with the job's loads put in: the area loads, ground snow (keeping the line's own
 * snow factors) and wind uplift. Everything else — geometry, lumber, non-concurrent BCLL — stays.
 */
export function withJobLoads(
  design: Record<string, unknown>,
  job: JobDesignLoads,
): Record<string, unknown> {
  const l = { ...((design.loads ?? {}) as LoadsOfDesign) } as Record<string, unknown>;
  l.tcll = job.tcll;
  l.tcdl = job.tcdl;
  l.bcll = job.bcll;
  l.bcdl = job.bcdl;
  const snow = (l.snow ?? {}) as Record<string, unknown>;
  if (job.groundSnow === null) delete l.snow;
  else l.snow = { ...snow, pg: job.groundSnow };
  if (job.windUplift === null) delete l.windUplift;
  else l.windUplift = job.windUplift;
  return { ...design, loads: l };
}
