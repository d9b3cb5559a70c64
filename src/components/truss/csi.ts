/**
 * The stress-index ramp of the drawing and tables. Our own sequential ramp (tokens `csi-1` …
 * `csi-5` of tailwind.config.ts): each band darker than the one below it, so the heaviest-looking
 * member is the most stressed; pale blue while a member has room, amber to burnt orange as it nears
 * capacity, red with hatching when it fails. Blue against amber stays distinct for the common
 * colour-vision deficiencies, and a failing member is also hatched and tagged so colour is never
 * the only cue.
 */

/** One band of the ramp. `upTo` is inclusive; the failing band has `upTo: Infinity`. */
export interface CsiBand {
  id: 'low' | 'moderate' | 'high' | 'near' | 'fails';
  upTo: number;
  /** Legend text, e.g. "≤ 0.50". */
  label: string;
  /** SVG stroke class of the member band. */
  stroke: string;
  /** Fill class of the legend swatch and table badge. */
  fill: string;
  fails: boolean;
}

/** The bands, lowest first (common practice: CSI ≤ 1.00 passes). */
export const CSI_BANDS: readonly CsiBand[] = [
  {
    id: 'low',
    upTo: 0.5,
    label: '≤ 0.50',
    stroke: 'stroke-csi-1',
    fill: 'fill-csi-1',
    fails: false,
  },
  {
    id: 'moderate',
    upTo: 0.75,
    label: '≤ 0.75',
    stroke: 'stroke-csi-2',
    fill: 'fill-csi-2',
    fails: false,
  },
  {
    id: 'high',
    upTo: 0.9,
    label: '≤ 0.90',
    stroke: 'stroke-csi-3',
    fill: 'fill-csi-3',
    fails: false,
  },
  {
    id: 'near',
    upTo: 1,
    label: '≤ 1.00',
    stroke: 'stroke-csi-4',
    fill: 'fill-csi-4',
    fails: false,
  },
  {
    id: 'fails',
    upTo: Infinity,
    label: '> 1.00 fails',
    stroke: 'stroke-csi-5',
    fill: 'fill-csi-5',
    fails: true,
  },
];

/**
 * The band of a combined stress index. A member fails above 1.00 exactly, as the engine
 * decides; NaN (no result) counts as failing, never as safe.
 */
export function csiBand(csi: number): CsiBand {
  if (!Number.isFinite(csi)) return CSI_BANDS[CSI_BANDS.length - 1];
  return CSI_BANDS.find((b) => csi <= b.upTo) ?? CSI_BANDS[CSI_BANDS.length - 1];
}

/**
 * CSI as the tables show it: two decimals ("0.87"); "—" when there is no result. A failing
 * index that would round to "1.00" shows as "> 1.00", so the text never contradicts the verdict.
 */
export function formatCsi(csi: number | undefined | null): string {
  if (csi === undefined || csi === null || !Number.isFinite(csi)) return '—';
  const text = csi.toFixed(2);
  return csi > 1 && Number(text) <= 1 ? '> 1.00' : text;
}
