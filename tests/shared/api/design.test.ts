import { describe, expect, expectTypeOf, it } from 'vitest';
import type { ProfileKind } from '../../../shared/engine/profiles/types';
import {
  PROFILE_KINDS,
  designInputSchema,
  toEngineInput,
  type DesignInputDraft,
} from '../../../shared/api/design';

// Exact conversions: 1 in = 25.4 mm; 1 psf = 0.04788025898033584 kPa (from the definitions of the
// foot and the pound-force). The metric request below spells the same truss in mm and kPa.
const PSF = 0.04788025898033584;

const imperial: DesignInputDraft = {
  units: 'imperial',
  profile: 'fink',
  span: 336,
  pitch: 6,
  heelHeight: 4,
  overhang: { left: 12, right: 18 },
  spacing: 24,
  loads: {
    tcll: 20,
    tcdl: 10,
    bcll: 0,
    bcdl: 10,
    bcllNonConcurrent: 10,
    snow: { pg: 30, ct: 1.1 },
    windUplift: 15,
  },
  lumber: { topChord: '2x4 SPF-1/2', webs: ['2x3 SPF-1/2', '2x4 SPF-1/2'] },
  bearingWidth: 5.5,
  deflection: { live: 360 },
  webBraces: ['BK'],
  maxStockLength: 240,
};

const metric: DesignInputDraft = {
  ...imperial,
  units: 'metric',
  span: 336 * 25.4,
  heelHeight: 4 * 25.4,
  overhang: { left: 12 * 25.4, right: 18 * 25.4 },
  spacing: 24 * 25.4,
  loads: {
    tcll: 20 * PSF,
    tcdl: 10 * PSF,
    bcll: 0,
    bcdl: 10 * PSF,
    bcllNonConcurrent: 10 * PSF,
    snow: { pg: 30 * PSF, ct: 1.1 },
    windUplift: 15 * PSF,
  },
  bearingWidth: 5.5 * 25.4,
  maxStockLength: 240 * 25.4,
};

/** Compares two plain-data trees, numbers to a relative tolerance. */
const expectClose = (a: unknown, b: unknown, path = ''): void => {
  if (typeof a === 'number' && typeof b === 'number') {
    expect(a, path).toBeWithin(b, { rel: 1e-12, abs: 1e-15 });
  } else if (a && b && typeof a === 'object' && typeof b === 'object') {
    expect(Object.keys(a).sort(), path).toEqual(Object.keys(b).sort());
    for (const k of Object.keys(a)) {
      expectClose(
        (a as Record<string, unknown>)[k],
        (b as Record<string, unknown>)[k],
        `${path}.${k}`,
      );
    }
  } else {
    expect(a, path).toEqual(b);
  }
};

const issuesOf = (input: unknown) => {
  const r = designInputSchema.safeParse(input);
  expect(r.success).toBe(false);
  return r.error!.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
};

describe('toEngineInput', () => {
  it('maps imperial and metric spellings of one truss to the same SI values', () => {
    const a = toEngineInput(designInputSchema.parse(imperial));
    const b = toEngineInput(designInputSchema.parse(metric));
    expectClose(a, b);
  });

  it('converts to mm and N/mm² and lists allowed lumber', () => {
    const e = toEngineInput(designInputSchema.parse(imperial));
    expect(e.profile.span).toBeWithin(8534.4); // 28 ft = 336 in = 8534.4 mm
    expect(e.profile.overhangLeft).toBeWithin(304.8);
    expect(e.profile.overhangRight).toBeWithin(457.2);
    expect(e.profile.maxStockLength).toBeWithin(6096);
    // 20 psf = 0.9576 kPa = 0.0009576 N/mm².
    expect(e.loads.tcll).toBeWithin(20 * PSF * 1e-3, { rel: 1e-12 });
    expect(e.loads.snow).toEqual({
      pg: expect.any(Number),
      ce: 1,
      ct: 1.1,
      is: 1,
      slippery: false,
      edition: '7-16',
    });
    expect(e.lumber).toEqual({
      topChord: ['2x4 SPF-1/2'],
      webs: ['2x3 SPF-1/2', '2x4 SPF-1/2'],
    });
    expect(e.deflection).toEqual({ live: 360, total: 180 });
    expect(e.webBraces).toEqual(['BK']);
  });

  it('fills the documented defaults in the user units', () => {
    const base = {
      profile: 'fink',
      span: 336,
      pitch: 4,
      loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
    };
    const imp = toEngineInput(designInputSchema.parse({ ...base, units: 'imperial' }));
    expect(imp.spacing).toBeWithin(609.6); // 24 in
    expect(imp.bearingWidth).toBeWithin(88.9); // 3.5 in
    expect(imp.profile.overhangLeft).toBe(0);
    expect(imp.profile.heelHeight).toBe(0);
    expect(imp.plies).toBe(1);
    expect(imp.deflection).toEqual({ live: 240, total: 180 });
    const met = toEngineInput(
      designInputSchema.parse({
        ...base,
        units: 'metric',
        span: 8534,
        loads: { tcll: 1, tcdl: 0.5, bcll: 0, bcdl: 0.5 },
      }),
    );
    expect(met.spacing).toBe(610);
    expect(met.bearingWidth).toBe(89);
  });

  it('splits a single overhang into equal left and right', () => {
    const e = toEngineInput(designInputSchema.parse({ ...imperial, overhang: 24 }));
    expect(e.profile.overhangLeft).toBeWithin(609.6);
    expect(e.profile.overhangRight).toBeWithin(609.6);
  });
});

describe('designInputSchema messages', () => {
  it('speaks the sales desk units', () => {
    expect(issuesOf({ ...imperial, span: 1200 })).toContainEqual({
      path: 'span',
      message: 'Span must be between 4 ft and 80 ft',
    });
    expect(issuesOf({ ...metric, span: 500 })).toContainEqual({
      path: 'span',
      message: 'Span must be between 1.2 m and 24.4 m',
    });
    expect(issuesOf({ ...imperial, loads: { ...imperial.loads, tcll: -5 } })).toContainEqual({
      path: 'loads.tcll',
      message: 'TCLL must be between 0 and 200 psf',
    });
  });

  it('names wrong types, unknown lumber and missing pieces plainly', () => {
    const issues = issuesOf({
      ...imperial,
      units: 'cubits',
      span: 'long',
      lumber: { topChord: '2x4 Balsa' },
      loads: undefined,
    });
    const messages = issues.map((i) => i.message);
    expect(messages).toContain('Units must be imperial or metric');
    expect(messages).toContain('Span must be a number');
    expect(messages).toContain(
      '"2x4 Balsa" is not a known lumber size and grade; use e.g. "2x4 SPF-1/2"',
    );
    expect(messages).toContain('Enter the design loads (TCLL, TCDL, BCLL, BCDL)');
  });

  it('checks profile-specific fields', () => {
    expect(issuesOf({ ...imperial, profile: 'scissor' })).toContainEqual({
      path: 'bottomPitch',
      message: 'A scissor truss needs a bottom-chord pitch',
    });
    expect(issuesOf({ ...imperial, profile: 'scissor', bottomPitch: 7 })[0].message).toBe(
      'Bottom-chord pitch must be above 0 and below the top pitch',
    );
    expect(issuesOf({ ...imperial, profile: 'flat', pitch: undefined })).toEqual([
      { path: 'depth', message: 'A flat truss needs a depth' },
    ]);
    expect(issuesOf({ ...imperial, pitch: undefined })).toContainEqual({
      path: 'pitch',
      message: 'Enter a pitch, e.g. 6 for 6/12',
    });
    expect(issuesOf({ ...imperial, panels: 5 })[0].message).toBe(
      'Panels must be an even number from 2 to 24',
    );
    expect(issuesOf({ ...imperial, plies: 1.5 })[0].message).toBe('Plies must be a whole number');
  });

  it('accepts a flat truss without a pitch', () => {
    const e = toEngineInput(
      designInputSchema.parse({
        ...imperial,
        profile: 'flat',
        pitch: undefined,
        depth: 24,
        panels: 8,
      }),
    );
    expect(e.profile.pitch).toBe(0);
    expect(e.profile.depth).toBeWithin(609.6);
    expect(e.profile.panels).toBe(8);
  });
});

describe('PROFILE_KINDS', () => {
  it('lists every engine profile kind', () => {
    expectTypeOf<(typeof PROFILE_KINDS)[number]>().toEqualTypeOf<ProfileKind>();
    expect(new Set(PROFILE_KINDS).size).toBe(PROFILE_KINDS.length);
  });
});
