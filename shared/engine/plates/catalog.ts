import { EngineError } from '../errors';
import type { PlateCatalog, PlateSpec } from './types';

/** Label every screen shows beside results from the demo catalog. */
export const DEMO_PLATE_LABEL =
  'Demo plates: design values are invented for trying the product, not from any evaluation report. Not for construction.';

// INVENTED demo values (not from any supplier or evaluation report): tooth holding for the
// four orientations AA, EA, AE, EE in lbf/in², steel tension and shear lbf/in, per gauge.
const DEMO_VALUES: Record<number, Omit<PlateSpec, 'id' | 'gauge' | 'width' | 'length'>> = {
  20: {
    lateralValue: { aa: 110, ea: 92, ae: 80, ee: 74 },
    tensionValue: 950,
    shearValue: 650,
  },
  18: {
    lateralValue: { aa: 120, ea: 100, ae: 88, ee: 80 },
    tensionValue: 1250,
    shearValue: 850,
  },
};

// Common plate sizes width × length in inches (common practice); larger ones also in 18 gauge.
const DEMO_SIZES: [number, number, number[]][] = [
  [3, 4, [20]],
  [3, 5, [20]],
  [3, 6, [20]],
  [3, 8, [20]],
  [4, 4, [20]],
  [4, 6, [20]],
  [4, 8, [20]],
  [4, 10, [20]],
  [5, 5, [20]],
  [5, 6, [20]],
  [5, 8, [20, 18]],
  [6, 6, [20]],
  [6, 8, [20, 18]],
  [6, 10, [20, 18]],
  [7, 8, [20, 18]],
  [7, 10, [20, 18]],
  [8, 10, [20, 18]],
  [8, 12, [20, 18]],
  // Heel plates of long spans run larger (common practice).
  [10, 12, [18]],
  [10, 16, [18]],
  [12, 16, [18]],
];

/** The demo catalog (`demo: true`): common sizes, INVENTED design values. */
export const DEMO_PLATE_CATALOG: PlateCatalog = {
  id: 'demo',
  label: DEMO_PLATE_LABEL,
  demo: true,
  plates: DEMO_SIZES.flatMap(([width, length, gauges]) =>
    gauges.map((gauge) => ({
      id: `${width}x${length}-${gauge}`,
      gauge,
      width,
      length,
      ...DEMO_VALUES[gauge],
      lateralValue: { ...DEMO_VALUES[gauge].lateralValue },
    })),
  ),
};

const isObject = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && !Array.isArray(v);

const positive = (v: unknown, max: number): v is number =>
  typeof v === 'number' && Number.isFinite(v) && v > 0 && v <= max;

// The four tested orientations of a plate's lateral resistance (ANSI/TPI 1-2014).
const ORIENTATIONS = ['aa', 'ea', 'ae', 'ee'] as const;

const plateIssues = (p: unknown, at: string, seen: Set<string>): string[] => {
  if (!isObject(p)) return [`${at}: not a plate`];
  const issues: string[] = [];
  const name = typeof p.id === 'string' && p.id.trim() !== '' ? p.id : undefined;
  const where = name ? `Plate ${name}` : at;
  if (!name) issues.push(`${at}: needs an id`);
  else if (seen.has(name)) issues.push(`${where}: id is used twice`);
  else seen.add(name);
  if (!Number.isInteger(p.gauge) || (p.gauge as number) < 10 || (p.gauge as number) > 28) {
    issues.push(`${where}: gauge must be a whole number 10–28`);
  }
  if (!positive(p.width, 48)) issues.push(`${where}: width must be over 0 and at most 48 in`);
  if (!positive(p.length, 48)) issues.push(`${where}: length must be over 0 and at most 48 in`);
  const lv = isObject(p.lateralValue) ? p.lateralValue : {};
  for (const o of ORIENTATIONS) {
    if (!positive(lv[o], 10_000)) {
      issues.push(`${where}: lateral value ${o.toUpperCase()} must be a positive lbf/in²`);
    }
  }
  if (!positive(p.tensionValue, 100_000))
    issues.push(`${where}: tension value must be a positive lbf/in`);
  if (!positive(p.shearValue, 100_000))
    issues.push(`${where}: shear value must be a positive lbf/in`);
  return issues;
};

/**
 * Checks a plate catalog from the plant (JSON of unknown shape) and returns it typed, or throws
 * EngineError `invalid` with `details.issues`, one readable line per problem.
 */
export const validatePlateCatalog = (value: unknown): PlateCatalog => {
  const issues: string[] = [];
  if (!isObject(value)) {
    throw new EngineError('invalid', 'A plate catalog must be an object', {
      issues: ['not an object'],
    });
  }
  if (typeof value.id !== 'string' || value.id.trim() === '') issues.push('Catalog needs an id');
  if (typeof value.label !== 'string' || value.label.trim() === '')
    issues.push('Catalog needs a label');
  if (typeof value.demo !== 'boolean')
    issues.push('Catalog must say whether it is a demo (demo: true/false)');
  if (!Array.isArray(value.plates) || value.plates.length === 0) {
    issues.push('Catalog needs at least one plate');
  } else {
    const seen = new Set<string>();
    value.plates.forEach((p, i) => issues.push(...plateIssues(p, `Plate #${i + 1}`, seen)));
  }
  if (issues.length > 0) {
    throw new EngineError(
      'invalid',
      `Plate catalog has ${issues.length} problem(s): ${issues[0]}`,
      {
        issues,
      },
    );
  }
  return value as unknown as PlateCatalog;
};
