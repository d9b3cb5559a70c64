import type { PointLoadKindInput, WebBraceKind } from '../../../../shared/api/design';
import type { ProfileKind } from '../../../../shared/engine/profiles/types';

/** One row of the point-load table, as typed: position (feet-inches or mm), loads (lb or kN). */
export interface PointLoadRow {
  x: string;
  chord: 'top' | 'bottom';
  dead: string;
  live: string;
  kind: PointLoadKindInput;
}

/**
 * What the truss form holds: the text exactly as typed (so `28'-6 1/2"` stays on screen) plus
 * the few choices. {@link formToRequest} turns it into numbers for `designInputSchema`.
 */
export interface TrussFormValues {
  mark: string;
  quantity: string;
  plies: string;
  profile: ProfileKind;
  span: string;
  pitch: string;
  heelHeight: string;
  overhangLeft: string;
  overhangRight: string;
  spacing: string;
  bottomPitch: string;
  depth: string;
  panels: string;
  tcll: string;
  tcdl: string;
  bcll: string;
  bcdl: string;
  bcllNonConcurrent: string;
  snowPg: string;
  snowCe: string;
  snowCt: string;
  snowIs: string;
  snowSlippery: boolean;
  windUplift: string;
  /** '' = auto-size from the plant's list; else one lumber id such as "2x4 SPF-1/2". */
  lumberTop: string;
  lumberBottom: string;
  lumberWebs: string;
  /** Member ids of braced webs, separated by commas or spaces. */
  webBraces: string;
  bearingWidth: string;
  deflectionLive: string;
  deflectionTotal: string;
  /** A ceiling braces the bottom chord; else lateral bracing at `bottomChordBracing` (blank: 10 ft). */
  ceiling: boolean;
  bottomChordBracing: string;
  /** Sheathing braces the top chord; else purlins at `purlinSpacing` (required then). */
  sheathing: boolean;
  purlinSpacing: string;
  webBrace: WebBraceKind;
  /** Concentrated loads on the chords; their messages are under `pointLoads`. */
  pointLoads: PointLoadRow[];
}

/** A field of the truss form. */
export type TrussFormField = keyof TrussFormValues;

/** Messages per field, in the user's units. */
export type TrussFormErrors = Partial<Record<TrussFormField, string>>;

/** Where a new line's loads start: the job's effective loads and site criteria (plant units). */
export interface LoadDefaults {
  tcll: number;
  tcdl: number;
  bcll: number;
  bcdl: number;
  groundSnow?: number | null;
  windUplift?: number | null;
}

const text = (v: number | null | undefined) => (v === null || v === undefined ? '' : String(v));

/**
 * The form of a new truss line. Geometry defaults are common practice (DESIGN.md §1): a 28 ft
 * Fink at 6/12 with 12 in overhangs, 24 in o.c.; bearing 3.5 in; deflection L/240 live and
 * L/180 total as the design contract defaults to.
 */
export function newTrussFormValues(
  units: 'imperial' | 'metric',
  loads: LoadDefaults,
): TrussFormValues {
  const imperial = units === 'imperial';
  return {
    mark: '',
    quantity: '1',
    plies: '1',
    profile: 'fink',
    span: imperial ? `28'-0"` : '8500',
    pitch: '6/12',
    heelHeight: imperial ? '0"' : '0',
    overhangLeft: imperial ? `1'-0"` : '300',
    overhangRight: imperial ? `1'-0"` : '300',
    spacing: imperial ? '24"' : '610',
    bottomPitch: '3/12',
    depth: imperial ? `2'-0"` : '600',
    panels: '8',
    tcll: text(loads.tcll),
    tcdl: text(loads.tcdl),
    bcll: text(loads.bcll),
    bcdl: text(loads.bcdl),
    bcllNonConcurrent: '',
    snowPg: text(loads.groundSnow),
    snowCe: '',
    snowCt: '',
    snowIs: '',
    snowSlippery: false,
    windUplift: text(loads.windUplift),
    lumberTop: '',
    lumberBottom: '',
    lumberWebs: '',
    webBraces: '',
    bearingWidth: imperial ? '3 1/2"' : '89',
    deflectionLive: '240',
    deflectionTotal: '180',
    ceiling: true,
    bottomChordBracing: '',
    sheathing: true,
    purlinSpacing: '',
    webBrace: 'either',
    pointLoads: [],
  };
}
