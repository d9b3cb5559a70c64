import type { AsceEdition } from '../loads/snow';
import type { WindSite } from '../loads/wind';
import type { ProfileParams } from '../profiles/types';
import type { MPa, Mm } from '../units';
import type { EnginePointLoad } from './pointLoads';

/** Area load in N/mm² (numerically MPa; 1 kPa = 0.001 N/mm²). */
export type AreaLoad = MPa;

/** The design request in engine units: lengths mm, area loads N/mm², chords as allowed lists. */
export interface EngineDesignInput {
  profile: ProfileParams;
  spacing: Mm;
  plies: number;
  loads: {
    tcll: AreaLoad;
    tcdl: AreaLoad;
    bcll: AreaLoad;
    bcdl: AreaLoad;
    bcllNonConcurrent?: AreaLoad;
    snow?: {
      pg: AreaLoad;
      ce: number;
      ct: number;
      is: number;
      slippery: boolean;
      edition: AsceEdition;
      /** Unbalanced snow on gable roofs (ASCE 7-16 §7.6.1); default true. */
      unbalanced?: boolean;
    };
    windUplift?: AreaLoad;
    /** Wind site data: the ASCE 7-16 Ch. 28 envelope cases (besides any net uplift). */
    wind?: WindSite;
  };
  /** Allowed lumber ids per role, cheapest-first choice left to sizing; absent = plant default. */
  lumber: { topChord?: string[]; bottomChord?: string[]; webs?: string[] };
  bearingWidth: Mm;
  /** Span / deflection limits, e.g. 240 for L/240. */
  deflection: { live: number; total: number };
  webBraces: string[];
  /** Concentrated loads on the chords (hung trusses on a girder, equipment); none when absent. */
  pointLoads?: EnginePointLoad[];
  /** Out-of-plane chord bracing; default: sheathing on the top chord, a ceiling on the bottom. */
  bracing?: {
    /** False when no ceiling braces the bottom chord. */
    ceiling?: boolean;
    /** Bottom-chord lateral bracing spacing without a ceiling, mm (default 10 ft). */
    bottomChordBracing?: Mm;
    /** Purlin spacing where no sheathing braces the top chord, mm. */
    purlinSpacing?: Mm;
    /** How a web that needs restraint is braced; absent: either, both named. */
    webBrace?: 'lateral' | 'tBrace';
  };
}
