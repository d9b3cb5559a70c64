import {
  designInputSchema,
  toEngineInput,
  type DesignInputDraft,
  type EngineDesignInput,
} from '../../../../../shared/api/design';

/** The checked engine input of a draft request (defaults applied, SI). */
export const engineInput = (draft: DesignInputDraft): EngineDesignInput =>
  toEngineInput(designInputSchema.parse(draft));

/** Typical residential loads "20/10/0/10" psf (DESIGN.md §1, common practice). */
export const TYPICAL_LOADS = { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 };

/** A 24 ft 4/12 Fink at 24 in o.c., standard 4 in heel, 12 in overhangs (common practice). */
export const lightFink = (extra: Partial<DesignInputDraft> = {}): DesignInputDraft => ({
  units: 'imperial',
  profile: 'fink',
  span: 24 * 12,
  pitch: 4,
  heelHeight: 4,
  overhang: 12,
  spacing: 24,
  loads: TYPICAL_LOADS,
  ...extra,
});

/**
 * A 16 ft 4/12 king-post truss at 24 in o.c., no heel, no overhang, every member 2x4 SPF
 * No.1/No.2: each top chord is one piece hinged at heel and peak (a simple beam for hand checks).
 */
export const kingPost16 = (loads: DesignInputDraft['loads']): DesignInputDraft => ({
  units: 'imperial',
  profile: 'kingPost',
  span: 16 * 12,
  pitch: 4,
  spacing: 24,
  loads,
  lumber: { topChord: '2x4 SPF-1/2', bottomChord: '2x4 SPF-1/2', webs: '2x4 SPF-1/2' },
});

/**
 * A 40 ft 6/12 Fink, 5 in heel, 18 in overhangs, 24 in o.c., "20/10/0/10" psf and pg = 70 psf:
 * heavy snow that needs chords deeper than 2x4 (common practice for such a truss).
 */
export const HEAVY_SNOW_FINK_40: DesignInputDraft = {
  units: 'imperial',
  profile: 'fink',
  span: 40 * 12,
  pitch: 6,
  heelHeight: 5,
  overhang: 18,
  spacing: 24,
  loads: { ...TYPICAL_LOADS, snow: { pg: 70 } },
};

/** A 28 ft 6/12 Fink at 24 in o.c. without overhangs or loads (geometry and point loads only). */
export const fink28 = (extra: Partial<DesignInputDraft> = {}): DesignInputDraft => ({
  units: 'imperial',
  profile: 'fink',
  span: 28 * 12,
  pitch: 6,
  spacing: 24,
  loads: { tcll: 0, tcdl: 0, bcll: 0, bcdl: 0 },
  ...extra,
});

/** A 28 ft 6/12 Fink with 24 in overhangs, 24 in o.c., "20/10/0/10" psf. */
export const FINK_28_OVERHANGS: DesignInputDraft = {
  units: 'imperial',
  profile: 'fink',
  span: 28 * 12,
  pitch: 6,
  overhang: 24,
  spacing: 24,
  loads: TYPICAL_LOADS,
};

/** A 32 ft 6/12 scissor truss, 3/12 bottom chords, 12 in overhangs, 24 in o.c., "20/10/0/10" psf. */
export const SCISSOR_32: DesignInputDraft = {
  units: 'imperial',
  profile: 'scissor',
  span: 32 * 12,
  pitch: 6,
  bottomPitch: 3,
  overhang: 12,
  spacing: 24,
  loads: TYPICAL_LOADS,
};
