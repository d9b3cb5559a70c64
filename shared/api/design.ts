import { z } from 'zod';
import { LUMBER_GRADES, LUMBER_SIZES } from '../engine/lumber';
import type { ProfileKind } from '../engine/profiles/types';
import { inch, inchToMm, KPA_PER_PSF, type Mm, mm, N_PER_LBF, newton } from '../engine/units';
import type { AreaLoad, EngineDesignInput } from '../engine/design/input';

/**
 * The design input contract: one truss as the sales desk describes it. Shared by the CLI,
 * `POST /api/designs/preview` and the browser form. Numbers are in the user's units:
 * imperial = inches, psf; metric = mm, kPa. `pitch` and `bottomPitch` are rise per 12.
 *
 * Defaults (common practice): spacing 24 in / 610 mm, overhang 0, heel 0, plies 1, bearing
 * 3.5 in / 89 mm, deflection L/240 live and L/180 total, snow Ce = Ct = Is = 1.0 on a
 * non-slippery roof by ASCE 7-16.
 */

/** Every profile the engine generates (mirrors `ProfileKind`). */
export const PROFILE_KINDS = [
  'kingPost',
  'queenPost',
  'fink',
  'howe',
  'fan',
  'doubleFink',
  'scissor',
  'mono',
  'flat',
] as const satisfies readonly ProfileKind[];

// Sizes and grades come from the lumber table itself, so the contract cannot drift from it.
export { LUMBER_GRADES, LUMBER_SIZES };

const LUMBER_IDS = new Set(LUMBER_SIZES.flatMap((s) => LUMBER_GRADES.map((g) => `${s} ${g}`)));

/** ASCE 7 editions the snow calculation knows. */
export const SNOW_EDITIONS = ['7-16', '7-22'] as const;

const num = (label: string) =>
  z
    .number({ error: `${label} must be a number` })
    .refine(Number.isFinite, `${label} must be a number`);

const lumberId = z
  .string({ error: 'Pick a lumber size and grade, e.g. "2x4 SPF-1/2"' })
  .trim()
  .refine((id) => LUMBER_IDS.has(id), {
    error: (iss) =>
      `"${String(iss.input)}" is not a known lumber size and grade; use e.g. "2x4 SPF-1/2"`,
  });
const lumberChoice = z.union([
  lumberId,
  z.array(lumberId).min(1, 'Allow at least one lumber size and grade'),
]);

/**
 * Wind site data for the ASCE 7-16 Ch. 28 envelope cases: basic wind speed (mph imperial, m/s
 * metric), exposure B/C/D, mean roof height (in or mm), optional Kzt and ground elevation (ft or m).
 */
const windSchema = z.object({
  speed: num('Wind speed'),
  exposure: z.enum(['B', 'C', 'D'], { error: 'Wind exposure must be B, C or D' }),
  meanRoofHeight: num('Mean roof height'),
  kzt: num('Topographic factor Kzt').optional(),
  groundElevation: num('Ground elevation').optional(),
});

/** Live-load kinds of a point load: roof live (Lr), snow (S), floor or attic live (L). */
export const POINT_LOAD_KINDS = ['roofLive', 'snow', 'floor'] as const;
export type PointLoadKindInput = (typeof POINT_LOAD_KINDS)[number];

/**
 * A concentrated load on a chord (hung trusses on a girder, equipment): `x` from the left heel
 * (in or mm), unfactored `dead` and `live` (lb imperial, kN metric) and the live load's kind.
 */
const pointLoadSchema = z.object({
  x: num('Point load position'),
  chord: z.enum(['top', 'bottom'], { error: 'A point load is on the top or bottom chord' }),
  dead: num('Point load dead load'),
  live: num('Point load live load').default(0),
  kind: z
    .enum(POINT_LOAD_KINDS, { error: 'Point load kind must be roof live, snow or floor' })
    .default('roofLive'),
  label: z.string().trim().max(40, 'A point load label has at most 40 characters').optional(),
});

/** How a web that needs lateral restraint is braced: either way, a continuous lateral brace, a T-brace. */
export const WEB_BRACE_KINDS = ['either', 'lateral', 'tBrace'] as const;
export type WebBraceKind = (typeof WEB_BRACE_KINDS)[number];

/**
 * Bracing of the chords and webs (the editor's "Bracing" section): a ceiling on the bottom chord,
 * else lateral bracing at a spacing (in or mm; default 10 ft); sheathing on the top chord, else
 * purlins at a spacing (required then); and how a braced web is restrained.
 */
export const bracingSchema = z.object({
  ceiling: z.boolean({ error: 'Ceiling must be yes or no' }).optional(),
  bottomChordBracing: num('Bottom-chord bracing spacing').optional(),
  /** False when purlins, not sheathing, carry the roof; then `purlinSpacing` is required. */
  sheathing: z.boolean({ error: 'Sheathing must be yes or no' }).optional(),
  purlinSpacing: num('Purlin spacing').optional(),
  webBrace: z
    .enum(WEB_BRACE_KINDS, {
      error: 'Web brace must be either, a continuous lateral brace or a T-brace',
    })
    .optional(),
});
export type BracingInput = z.infer<typeof bracingSchema>;

const baseSchema = z.object({
  units: z.enum(['imperial', 'metric'], { error: 'Units must be imperial or metric' }),
  profile: z.enum(PROFILE_KINDS, {
    error: `Truss type must be one of ${PROFILE_KINDS.join(', ')}`,
  }),
  span: num('Span'),
  pitch: num('Pitch').optional(),
  heelHeight: num('Heel height').default(0),
  overhang: z
    .union([
      num('Overhang'),
      z.object({ left: num('Left overhang'), right: num('Right overhang') }),
    ])
    .default(0),
  spacing: num('Spacing').optional(),
  plies: z
    .number({ error: 'Plies must be a number' })
    .int('Plies must be a whole number')
    .min(1, 'Plies must be between 1 and 4')
    .max(4, 'Plies must be between 1 and 4')
    .default(1),
  bottomPitch: num('Bottom-chord pitch').optional(),
  depth: num('Depth').optional(),
  panels: z
    .number({ error: 'Panels must be a number' })
    .int('Panels must be a whole number')
    .optional(),
  loads: z.object(
    {
      tcll: num('TCLL'),
      tcdl: num('TCDL'),
      bcll: num('BCLL'),
      bcdl: num('BCDL'),
      bcllNonConcurrent: num('Non-concurrent BCLL').optional(),
      snow: z
        .object({
          pg: num('Ground snow load'),
          ce: num('Exposure factor Ce').optional(),
          ct: num('Thermal factor Ct').optional(),
          is: num('Importance factor Is').optional(),
          slippery: z.boolean({ error: 'Slippery roof must be yes or no' }).optional(),
          edition: z
            .enum(SNOW_EDITIONS, { error: 'ASCE 7 edition must be 7-16 or 7-22' })
            .optional(),
          unbalanced: z.boolean({ error: 'Unbalanced snow must be yes or no' }).optional(),
        })
        .optional(),
      windUplift: num('Wind uplift').optional(),
      wind: windSchema.optional(),
    },
    { error: 'Enter the design loads (TCLL, TCDL, BCLL, BCDL)' },
  ),
  lumber: z
    .object({
      topChord: lumberChoice.optional(),
      bottomChord: lumberChoice.optional(),
      webs: lumberChoice.optional(),
    })
    .optional(),
  bearingWidth: num('Bearing width').optional(),
  deflection: z
    .object({
      live: num('Live-load deflection limit').optional(),
      total: num('Total-load deflection limit').optional(),
    })
    .optional(),
  webBraces: z
    .array(
      z
        .string({ error: 'A braced web is named by its member id, e.g. "BK"' })
        .trim()
        .regex(/^[A-Za-z0-9]{2,12}$/, 'A braced web is named by its member id, e.g. "BK"'),
    )
    .optional(),
  maxStockLength: num('Longest stock length').optional(),
  pointLoads: z.array(pointLoadSchema).max(20, 'At most 20 point loads').optional(),
  bracing: bracingSchema.optional(),
});

type Base = z.infer<typeof baseSchema>;
type Units = Base['units'];

/** A limit in both unit systems, with the words the message shows. */
interface Limit {
  label: string;
  imperial: [number, number, string, string];
  metric: [number, number, string, string];
}
const same = (lo: number, hi: number, a: string, b: string): Limit['imperial'] => [lo, hi, a, b];
const lim = (label: string, imperial: Limit['imperial'], metric = imperial): Limit => ({
  label,
  imperial,
  metric,
});

// Field ranges a truss plant works within (common practice; DESIGN.md §1): wide enough for
// any residential or light-commercial truss, narrow enough to catch a unit slip.
const LIMITS = {
  span: lim('Span', [48, 960, '4 ft', '80 ft'], [1200, 24400, '1.2 m', '24.4 m']),
  pitch: lim('Pitch', same(1, 24, '1/12', '24/12')),
  heelHeight: lim('Heel height', [0, 48, '0', '48 in'], [0, 1200, '0', '1200 mm']),
  overhang: lim('Overhang', [0, 48, '0', '48 in'], [0, 1200, '0', '1200 mm']),
  spacing: lim('Spacing', [12, 48, '12 in', '48 in'], [300, 1200, '300 mm', '1200 mm']),
  depth: lim('Depth', [12, 96, '12 in', '96 in'], [300, 2400, '300 mm', '2400 mm']),
  bearingWidth: lim('Bearing width', [1.5, 24, '1.5 in', '24 in'], [38, 600, '38 mm', '600 mm']),
  maxStockLength: lim(
    'Longest stock length',
    [96, 480, '8 ft', '40 ft'],
    [2400, 12200, '2.4 m', '12.2 m'],
  ),
  areaLoad: lim('', [0, 200, '0', '200 psf'], [0, 9.6, '0', '9.6 kPa']),
  snowLoad: lim('Ground snow load', [0, 300, '0', '300 psf'], [0, 14.4, '0', '14.4 kPa']),
  deflection: lim('', same(60, 1200, 'L/60', 'L/1200')),
  // Purlins and bottom-chord bracing 1–20 ft o.c. (common practice).
  bracing: lim('', [12, 240, '12 in', '20 ft'], [300, 6100, '300 mm', '6.1 m']),
} satisfies Record<string, Limit>;

const LOAD_LABELS = {
  tcll: 'TCLL',
  tcdl: 'TCDL',
  bcll: 'BCLL',
  bcdl: 'BCDL',
  bcllNonConcurrent: 'Non-concurrent BCLL',
  windUplift: 'Wind uplift',
} as const;

/** Checks ranges in the user's units, so the message speaks them ("between 4 ft and 80 ft"). */
const checkRanges = (v: Base, ctx: z.RefinementCtx): void => {
  const within = (
    path: (string | number)[],
    value: number | undefined,
    l: Limit,
    label = l.label,
  ) => {
    if (value === undefined) return;
    const [lo, hi, a, b] = l[v.units as Units];
    if (value < lo || value > hi) {
      ctx.addIssue({ code: 'custom', path, message: `${label} must be between ${a} and ${b}` });
    }
  };
  const factor = (
    path: string[],
    value: number | undefined,
    lo: number,
    hi: number,
    label: string,
  ) => {
    if (value !== undefined && (value < lo || value > hi)) {
      ctx.addIssue({ code: 'custom', path, message: `${label} must be between ${lo} and ${hi}` });
    }
  };
  within(['span'], v.span, LIMITS.span);
  if (v.profile !== 'flat') {
    if (v.pitch === undefined)
      ctx.addIssue({ code: 'custom', path: ['pitch'], message: 'Enter a pitch, e.g. 6 for 6/12' });
    within(['pitch'], v.pitch, LIMITS.pitch);
  }
  within(['heelHeight'], v.heelHeight, LIMITS.heelHeight);
  if (typeof v.overhang === 'number') within(['overhang'], v.overhang, LIMITS.overhang);
  else {
    within(['overhang', 'left'], v.overhang.left, LIMITS.overhang, 'Left overhang');
    within(['overhang', 'right'], v.overhang.right, LIMITS.overhang, 'Right overhang');
  }
  within(['spacing'], v.spacing, LIMITS.spacing);
  within(['bearingWidth'], v.bearingWidth, LIMITS.bearingWidth);
  within(['maxStockLength'], v.maxStockLength, LIMITS.maxStockLength);
  within(
    ['bracing', 'bottomChordBracing'],
    v.bracing?.bottomChordBracing,
    LIMITS.bracing,
    'Bottom-chord bracing spacing',
  );
  within(['bracing', 'purlinSpacing'], v.bracing?.purlinSpacing, LIMITS.bracing, 'Purlin spacing');
  if (v.bracing?.sheathing === false && v.bracing.purlinSpacing === undefined) {
    ctx.addIssue({
      code: 'custom',
      path: ['bracing', 'purlinSpacing'],
      message: 'Enter the purlin spacing (the top chord has no sheathing)',
    });
  }
  if (v.profile === 'scissor') {
    if (v.bottomPitch === undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['bottomPitch'],
        message: 'A scissor truss needs a bottom-chord pitch',
      });
    } else if (v.bottomPitch <= 0 || (v.pitch !== undefined && v.bottomPitch >= v.pitch)) {
      ctx.addIssue({
        code: 'custom',
        path: ['bottomPitch'],
        message: 'Bottom-chord pitch must be above 0 and below the top pitch',
      });
    }
  }
  if (v.profile === 'flat') {
    if (v.depth === undefined)
      ctx.addIssue({ code: 'custom', path: ['depth'], message: 'A flat truss needs a depth' });
    within(['depth'], v.depth, LIMITS.depth);
  }
  if (v.panels !== undefined && (v.panels < 2 || v.panels > 24 || v.panels % 2 !== 0)) {
    ctx.addIssue({
      code: 'custom',
      path: ['panels'],
      message: 'Panels must be an even number from 2 to 24',
    });
  }
  for (const key of ['tcll', 'tcdl', 'bcll', 'bcdl', 'bcllNonConcurrent', 'windUplift'] as const) {
    within(['loads', key], v.loads[key], LIMITS.areaLoad, LOAD_LABELS[key]);
  }
  const wind = v.loads.wind;
  if (wind) {
    // 85–200 mph: the ASCE 7-16 Fig. 26.5-1 maps' range, about (from memory); h ≤ 60 ft for Ch. 28.
    const [vlo, vhi, vu] = v.units === 'imperial' ? [85, 200, 'mph'] : [38, 89, 'm/s'];
    if (wind.speed < vlo || wind.speed > vhi) {
      ctx.addIssue({
        code: 'custom',
        path: ['loads', 'wind', 'speed'],
        message: `Wind speed must be between ${vlo} and ${vhi} ${vu}`,
      });
    }
    const [hlo, hhi, hu] =
      v.units === 'imperial' ? [96, 720, ['8 ft', '60 ft']] : [2400, 18300, ['2.4 m', '18.3 m']];
    if (wind.meanRoofHeight < hlo || wind.meanRoofHeight > hhi) {
      ctx.addIssue({
        code: 'custom',
        path: ['loads', 'wind', 'meanRoofHeight'],
        message: `Mean roof height must be between ${hu[0]} and ${hu[1]} (low-rise buildings)`,
      });
    }
    factor(['loads', 'wind', 'kzt'], wind.kzt, 1, 3, 'Topographic factor Kzt');
  }
  const snow = v.loads.snow;
  if (snow) {
    within(['loads', 'snow', 'pg'], snow.pg, LIMITS.snowLoad);
    // Ct 0.85–1.3 and Is 0.8–1.2: ASCE 7-16 Table 7.3-2 and Table 1.5-2 (references §3);
    // Ce 0.7–1.2: ASCE 7-16 Table 7.3-1, from memory.
    factor(['loads', 'snow', 'ce'], snow.ce, 0.7, 1.2, 'Exposure factor Ce');
    factor(['loads', 'snow', 'ct'], snow.ct, 0.85, 1.3, 'Thermal factor Ct');
    factor(['loads', 'snow', 'is'], snow.is, 0.8, 1.2, 'Importance factor Is');
  }
  // Up to 20,000 lb (89 kN) a load: a multi-ply girder's hanger loads (common practice).
  const [plo, phi, pu] = v.units === 'imperial' ? [0, 20000, 'lb'] : [0, 89, 'kN'];
  v.pointLoads?.forEach((l, i) => {
    if (l.x < 0 || l.x > v.span) {
      ctx.addIssue({
        code: 'custom',
        path: ['pointLoads', i, 'x'],
        message: 'A point load must lie between the heels (0 to the span)',
      });
    }
    for (const key of ['dead', 'live'] as const) {
      if (l[key] < plo || l[key] > phi) {
        ctx.addIssue({
          code: 'custom',
          path: ['pointLoads', i, key],
          message: `Point load ${key} load must be between 0 and ${phi.toLocaleString('en-US')} ${pu}`,
        });
      }
    }
  });
  within(
    ['deflection', 'live'],
    v.deflection?.live,
    LIMITS.deflection,
    'Live-load deflection limit',
  );
  within(
    ['deflection', 'total'],
    v.deflection?.total,
    LIMITS.deflection,
    'Total-load deflection limit',
  );
};

// Unit-dependent defaults (common practice): 24 in ≈ 610 mm spacing, 3.5 in ≈ 89 mm bearing
// (a 2x4 plate), deflection L/240 live and L/180 total (IBC Table 1604.3, non-plaster ceiling).
const DEFAULTS = {
  imperial: { spacing: 24, bearingWidth: 3.5 },
  metric: { spacing: 610, bearingWidth: 89 },
} as const;

const withDefaults = (v: Base) => ({
  ...v,
  pitch: v.pitch ?? 0,
  spacing: v.spacing ?? DEFAULTS[v.units].spacing,
  bearingWidth: v.bearingWidth ?? DEFAULTS[v.units].bearingWidth,
  deflection: { live: v.deflection?.live ?? 240, total: v.deflection?.total ?? 180 },
  webBraces: v.webBraces ?? [],
});

/** Parses and checks a design request; the output has every default filled in. */
export const designInputSchema = baseSchema.superRefine(checkRanges).transform(withDefaults);

/** A checked design request with defaults applied (user units). */
export type DesignInput = z.infer<typeof designInputSchema>;
/** What a client may send (defaults still optional). */
export type DesignInputDraft = z.input<typeof designInputSchema>;

export type { AreaLoad, EngineDesignInput } from '../engine/design/input';

const list = (c: string | string[] | undefined) => (c === undefined ? undefined : [c].flat());

/** Converts a checked request to SI, splitting the overhang into left and right. */
export const toEngineInput = (input: DesignInput): EngineDesignInput => {
  const imperial = input.units === 'imperial';
  const len = (v: number): Mm => (imperial ? inchToMm(inch(v)) : mm(v));
  // psf → kPa (exact by definition of lbf and ft), then kPa → N/mm².
  const area = (v: number): AreaLoad => ((imperial ? v * KPA_PER_PSF : v) / 1000) as AreaLoad;
  const optArea = (v: number | undefined) => (v === undefined ? undefined : area(v));
  // One overhang number is both ends of a gable; a mono's tall end has none (low end only).
  const oh =
    typeof input.overhang === 'number'
      ? { left: input.overhang, right: input.profile === 'mono' ? 0 : input.overhang }
      : input.overhang;
  const { snow } = input.loads;
  return {
    profile: {
      kind: input.profile,
      span: len(input.span),
      pitch: input.pitch,
      heelHeight: len(input.heelHeight),
      overhangLeft: len(oh.left),
      overhangRight: len(oh.right),
      ...(input.bottomPitch !== undefined && { bottomPitch: input.bottomPitch }),
      ...(input.depth !== undefined && { depth: len(input.depth) }),
      ...(input.panels !== undefined && { panels: input.panels }),
      ...(input.maxStockLength !== undefined && { maxStockLength: len(input.maxStockLength) }),
    },
    spacing: len(input.spacing),
    plies: input.plies,
    loads: {
      tcll: area(input.loads.tcll),
      tcdl: area(input.loads.tcdl),
      bcll: area(input.loads.bcll),
      bcdl: area(input.loads.bcdl),
      ...(input.loads.bcllNonConcurrent !== undefined && {
        bcllNonConcurrent: optArea(input.loads.bcllNonConcurrent),
      }),
      ...(snow && {
        snow: {
          pg: area(snow.pg),
          ce: snow.ce ?? 1,
          ct: snow.ct ?? 1,
          is: snow.is ?? 1,
          slippery: snow.slippery ?? false,
          edition: snow.edition ?? '7-16',
          ...(snow.unbalanced !== undefined && { unbalanced: snow.unbalanced }),
        },
      }),
      ...(input.loads.wind && {
        wind: {
          // mph → m/s (exact: 1 mph = 0.44704 m/s); heights in, mm; elevation ft or m → mm.
          speed: imperial ? input.loads.wind.speed * 0.44704 : input.loads.wind.speed,
          exposure: input.loads.wind.exposure,
          meanRoofHeight: len(input.loads.wind.meanRoofHeight),
          ...(input.loads.wind.kzt !== undefined && { kzt: input.loads.wind.kzt }),
          ...(input.loads.wind.groundElevation !== undefined && {
            groundElevation: mm(input.loads.wind.groundElevation * (imperial ? 304.8 : 1000)),
          }),
        },
      }),
      ...(input.loads.windUplift !== undefined && { windUplift: optArea(input.loads.windUplift) }),
    },
    lumber: {
      ...(input.lumber?.topChord && { topChord: list(input.lumber.topChord) }),
      ...(input.lumber?.bottomChord && { bottomChord: list(input.lumber.bottomChord) }),
      ...(input.lumber?.webs && { webs: list(input.lumber.webs) }),
    },
    bearingWidth: len(input.bearingWidth),
    deflection: input.deflection,
    webBraces: input.webBraces,
    ...(input.pointLoads &&
      input.pointLoads.length > 0 && {
        pointLoads: input.pointLoads.map((l) => ({
          x: len(l.x),
          chord: l.chord,
          // lb → N (exact), kN → N.
          dead: newton(imperial ? l.dead * N_PER_LBF : l.dead * 1000),
          live: newton(imperial ? l.live * N_PER_LBF : l.live * 1000),
          kind: POINT_LOAD_CASE[l.kind],
          ...(l.label && { label: l.label }),
        })),
      }),
    ...(input.bracing && {
      bracing: {
        ...(input.bracing.ceiling !== undefined && { ceiling: input.bracing.ceiling }),
        ...(input.bracing.bottomChordBracing !== undefined && {
          bottomChordBracing: len(input.bracing.bottomChordBracing),
        }),
        // Sheathing braces the top chord whatever purlin spacing is left over from before.
        ...(input.bracing.purlinSpacing !== undefined &&
          input.bracing.sheathing !== true && {
            purlinSpacing: len(input.bracing.purlinSpacing),
          }),
        ...(input.bracing.webBrace !== undefined &&
          input.bracing.webBrace !== 'either' && { webBrace: input.bracing.webBrace }),
      },
    }),
  };
};

const POINT_LOAD_CASE = { roofLive: 'Lr', snow: 'S', floor: 'L' } as const;
