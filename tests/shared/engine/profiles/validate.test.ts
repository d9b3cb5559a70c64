import { describe, expect, it } from 'vitest';
import { EngineError } from '../../../../shared/engine/errors';
import { generateProfile } from '../../../../shared/engine/profiles/generate';
import type { ProfileParams } from '../../../../shared/engine/profiles/types';

const FT = 304.8;
const IN = 25.4;

const fink = (over: Partial<ProfileParams> = {}): ProfileParams => ({
  kind: 'fink',
  span: 24 * FT,
  pitch: 6,
  heelHeight: 0,
  overhangLeft: 12 * IN,
  overhangRight: 12 * IN,
  ...over,
});
const scissor = (over: Partial<ProfileParams> = {}) =>
  fink({ kind: 'scissor', pitch: 6, bottomPitch: 3, ...over });
const flat = (over: Partial<ProfileParams> = {}) =>
  fink({ kind: 'flat', span: 24 * FT, depth: 30 * IN, panels: 8, ...over });

/** Runs the generator and returns the EngineError it throws (fails the test if none). */
const refusal = (params: ProfileParams): EngineError => {
  try {
    generateProfile(params);
  } catch (e) {
    if (e instanceof EngineError) return e;
    throw e;
  }
  throw new Error('expected a geometry error');
};

describe('generateProfile refuses what cannot be built', () => {
  // Ranges are the product's limits from limits.ts (common practice).
  it.each<[string, ProfileParams, RegExp]>([
    ['span under 4 ft', fink({ span: 3.9 * FT }), /Span/],
    ['span over 80 ft', fink({ span: 80.5 * FT }), /Span/],
    ['mono span over 40 ft', fink({ kind: 'mono', span: 41 * FT }), /Span/],
    ['flat span over 60 ft', flat({ span: 61 * FT }), /Span/],
    ['pitch under 2/12', fink({ pitch: 1.9 }), /Pitch 1\.9\/12/],
    ['pitch over 16/12', fink({ pitch: 16.5 }), /Pitch/],
    ['negative heel', fink({ heelHeight: -1 }), /negative/],
    ['heel too short for a heel post', fink({ heelHeight: 4 * IN }), /pointed heel/],
    ['heel over 4 ft', fink({ heelHeight: 49 * IN }), /taller/],
    ['negative overhang', fink({ overhangLeft: -1 }), /Left overhang/],
    ['overhang over 4 ft', fink({ overhangRight: 49 * IN }), /Right overhang/],
    ['scissor without a bottom pitch', scissor({ bottomPitch: undefined }), /bottom-chord pitch/],
    ['scissor negative bottom pitch', scissor({ bottomPitch: -0.5 }), /negative/],
    ['scissor bottom pitch = pitch − 2/12', scissor({ pitch: 6, bottomPitch: 4 }), /too steep/],
    [
      'scissor bottom pitch above the top pitch',
      scissor({ pitch: 6, bottomPitch: 7 }),
      /too steep/,
    ],
    ['flat without depth', flat({ depth: undefined }), /depth/],
    ['flat depth under 6 in', flat({ depth: 5 * IN }), /Depth/],
    ['flat depth over 6 ft', flat({ depth: 73 * IN }), /Depth/],
    ['flat without panels', flat({ panels: undefined }), /panel count/],
    ['flat odd panels', flat({ panels: 7 }), /even number/],
    ['flat zero panels', flat({ panels: 0 }), /even number/],
    ['flat fractional panels', flat({ panels: 2.5 }), /even number/],
    ['flat over 40 panels', flat({ panels: 42 }), /even number/],
    ['span NaN', fink({ span: Number.NaN }), /Span must be a number/],
    ['pitch infinite', fink({ pitch: Number.POSITIVE_INFINITY }), /Pitch must be a number/],
    ['heel NaN', fink({ heelHeight: Number.NaN }), /Heel height must be a number/],
    ['overhang infinite', fink({ overhangLeft: Number.NEGATIVE_INFINITY }), /must be a number/],
    ['depth NaN', flat({ depth: Number.NaN }), /Depth must be a number/],
    ['stock NaN', fink({ maxStockLength: Number.NaN }), /stock length must be a number/],
    ['stock too short to cut chords', fink({ maxStockLength: 100 }), /stock length/],
    ['unknown kind', fink({ kind: 'bowstring' as never }), /Unknown truss profile/],
    // King post, 4 ft at 2/12: the post is 2 ft × 2/12 = 4 in, under the 6 in minimum.
    [
      'web shorter than 6 in',
      fink({ kind: 'kingPost', span: 4 * FT, pitch: 2 }),
      /Web BD .*4\.0 in/,
    ],
    // 60 ft, 2 panels, 6 in deep: each diagonal rises 6 in over 30 ft, about 1°.
    ['nearly parallel members', flat({ span: 60 * FT, depth: 6 * IN, panels: 2 }), /parallel/],
    // King post at 40 ft, 12/12: each top chord is 20 ft × √2 ≈ 28 ft, over the 20 ft stock.
    [
      'chord panel longer than stock',
      fink({ kind: 'kingPost', span: 40 * FT, pitch: 12 }),
      /stock/,
    ],
  ])('%s', (_name, params, message) => {
    const e = refusal(params);
    expect(e.code).toBe('geometry');
    expect(e.message).toMatch(message);
  });

  it('names the offending joint and members for a panel with nearly parallel members', () => {
    const e = refusal(flat({ span: 60 * FT, depth: 6 * IN, panels: 2 }));
    expect(e.details).toMatchObject({ joint: expect.any(String), members: expect.any(Array) });
  });

  it('accepts the edges of the ranges', () => {
    expect(() => generateProfile(fink({ span: 20 * FT, pitch: 2 }))).not.toThrow();
    expect(() => generateProfile(fink({ pitch: 16 }))).not.toThrow();
    expect(() => generateProfile(fink({ overhangLeft: 48 * IN, overhangRight: 0 }))).not.toThrow();
    expect(() => generateProfile(scissor({ pitch: 8, bottomPitch: 0 }))).not.toThrow();
    expect(() => generateProfile(scissor({ pitch: 8, bottomPitch: 5.99 }))).not.toThrow();
    expect(() => generateProfile(flat({ panels: 2, span: 8 * FT }))).not.toThrow();
  });

  it('ignores parameters meaningless for the kind', () => {
    // Flat ignores pitch and heel; pitched kinds ignore depth and panels; only scissor reads bottomPitch.
    expect(() => generateProfile(flat({ pitch: Number.NaN, heelHeight: -5 }))).not.toThrow();
    expect(() =>
      generateProfile(fink({ depth: Number.NaN, panels: 3, bottomPitch: 99 })),
    ).not.toThrow();
  });
});
