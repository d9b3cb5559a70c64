import { designInputSchema, toEngineInput, type DesignInput } from '../../shared/api/design';
import type { PresentedDesign } from '../../shared/engine/design';
import { formatFeetInches, formatMm } from '../../shared/engine/format';
import { generateProfile } from '../../shared/engine/profiles';

/**
 * What printed paper (the quote, the truss design drawing) states about one stored design besides
 * its results: the loads the builder must confirm, spacing, heels and overhangs, and the overhang
 * tips to draw. Everything in the design's own units (in or mm for coordinates).
 */

/** A point in the design's units, y up. */
export interface PaperPoint {
  x: number;
  y: number;
}

/** One drawn overhang: the top chord continued from its heel joint to the tip. */
export interface PaperOverhang {
  side: 'left' | 'right';
  heel: PaperPoint;
  tip: PaperPoint;
  /** Horizontal projection as text, e.g. `2'-0"`. */
  text: string;
}

/** The stored input with defaults filled in; null when today's schema refuses it. */
export function parsedInput(raw: Record<string, unknown>): DesignInput | null {
  const r = designInputSchema.safeParse(raw);
  return r.success ? r.data : null;
}

const MM_PER_INCH = 25.4;
const imperialOf = (input: DesignInput | null, d: PresentedDesign) =>
  input ? input.units === 'imperial' : d.units.system === 'imperial';

/** A length in the input's units (in or mm) as the shop reads it. */
export function inputLength(input: Pick<DesignInput, 'units'>, v: number): string {
  return input.units === 'imperial' ? formatFeetInches(v * MM_PER_INCH) : formatMm(v);
}

const num = (v: number) => String(Number(v.toFixed(2)));

/** "20 psf" or "0.96 kPa". */
export function areaLoadText(input: Pick<DesignInput, 'units'>, v: number): string {
  return `${num(v)} ${input.units === 'imperial' ? 'psf' : 'kPa'}`;
}

/**
 * The design loads as label/value rows: TCLL, TCDL, BCLL, BCDL, snow, wind and concentrated loads
 * (the engine designs for uniform area loads only, so it says there are none).
 */
export function loadRows(input: DesignInput): [string, string][] {
  const l = input.loads;
  const a = (v: number) => areaLoadText(input, v);
  const rows: [string, string][] = [
    ['TCLL', a(l.tcll)],
    ['TCDL', a(l.tcdl)],
    ['BCLL', a(l.bcll)],
    ['BCDL', a(l.bcdl)],
  ];
  if (l.bcllNonConcurrent !== undefined)
    rows.push(['BCLL (non-concurrent)', a(l.bcllNonConcurrent)]);
  const s = l.snow;
  rows.push([
    'Snow',
    s
      ? `Ground snow pg ${a(s.pg)}; Ce ${s.ce ?? 1}, Ct ${s.ct ?? 1}, Is ${s.is ?? 1}` +
        `${s.slippery ? ', slippery roof' : ''}; ASCE 7-${(s.edition ?? '7-16').slice(2)}`
      : 'None',
  ]);
  const w = l.wind;
  const windParts: string[] = [];
  if (w) {
    const speed = input.units === 'imperial' ? `${num(w.speed)} mph` : `${num(w.speed)} m/s`;
    windParts.push(
      `${speed}, exposure ${w.exposure}, mean roof height ${inputLength(input, w.meanRoofHeight)}` +
        `${w.kzt !== undefined ? `, Kzt ${w.kzt}` : ''}; ASCE 7-16 Ch. 28`,
    );
  }
  if (l.windUplift !== undefined) windParts.push(`net uplift ${a(l.windUplift)}`);
  rows.push(['Wind', windParts.length ? windParts.join('; ') : 'None']);
  const kinds = { roofLive: 'Lr', snow: 'S', floor: 'L' } as const;
  const force = input.units === 'imperial' ? 'lb' : 'kN';
  // One load a line: where (from the left heel, which chord), then its dead and live parts.
  const points = (input.pointLoads ?? []).map(
    (p) =>
      `${p.label ? `${p.label} at ` : 'At '}${inputLength(input, p.x)}, ${p.chord} chord: ` +
      `D ${num(p.dead)} + ${kinds[p.kind]} ${num(p.live)} ${force}`,
  );
  rows.push([
    'Concentrated loads',
    points.length
      ? `${points.join('\n')}\n(positions from the left heel)`
      : 'None (uniform area loads only)',
  ]);
  return rows;
}

/** Left and right overhang as the design input gives them (a mono's tall end has none). */
export function overhangsOf(input: DesignInput): { left: number; right: number } {
  return typeof input.overhang === 'number'
    ? { left: input.overhang, right: input.profile === 'mono' ? 0 : input.overhang }
    : input.overhang;
}

/** "2'-0" both ends", "1'-6" left, none right" or "None". */
export function overhangText(input: DesignInput): string {
  const { left, right } = overhangsOf(input);
  if (left <= 0 && right <= 0) return 'None';
  if (left === right) return `${inputLength(input, left)} each end`;
  const side = (v: number) => (v > 0 ? inputLength(input, v) : 'none');
  return `${side(left)} left, ${side(right)} right`;
}

/** "24 in. o.c." or "610 mm o.c.". */
export function spacingText(input: DesignInput): string {
  return input.units === 'imperial'
    ? `${num(input.spacing)} in. o.c.`
    : `${Math.round(input.spacing)} mm o.c.`;
}

/**
 * The overhang tips of a stored design: the top chord continued beyond each heel joint by the
 * overhang's horizontal projection, keeping the chord's slope. The stored result has no overhang
 * geometry, so the profile is generated again from the input (deterministic).
 */
export function overhangTips(input: DesignInput | null, d: PresentedDesign): PaperOverhang[] {
  if (!input) return [];
  let profile;
  try {
    // The engine draws a standard heel pointed (analysed height 0), so the joints here are that.
    const params = toEngineInput(input).profile;
    const analysed = d.heelHeight.analysed.value * (d.units.length === 'in' ? MM_PER_INCH : 1);
    profile = generateProfile({ ...params, heelHeight: analysed as typeof params.heelHeight });
  } catch {
    return [];
  }
  const at = new Map(d.joints.map((j) => [j.id, j]));
  const toUnits = (v: number) => (imperialOf(input, d) ? v / MM_PER_INCH : v);
  const out: PaperOverhang[] = [];
  for (const o of profile.overhangs) {
    const member = d.members.find((m) => m.id === o.member);
    const heel = at.get(o.heelJoint);
    if (!member || !heel || o.horizontal <= 0) continue;
    const other = at.get(member.from === o.heelJoint ? member.to : member.from);
    if (!other || other.x === heel.x) continue;
    const slope = (other.y - heel.y) / (other.x - heel.x);
    const h = toUnits(o.horizontal);
    const x = o.side === 'left' ? heel.x - h : heel.x + h;
    out.push({
      side: o.side,
      heel: { x: heel.x, y: heel.y },
      tip: { x, y: heel.y + slope * (x - heel.x) },
      text: imperialOf(input, d) ? formatFeetInches(o.horizontal) : formatMm(o.horizontal),
    });
  }
  return out;
}

/** Overall height of the truss above its bearings (the highest joint), in the design's units. */
export function overallHeight(d: PresentedDesign): number {
  return Math.max(0, ...d.joints.map((j) => j.y)) - Math.min(0, ...d.joints.map((j) => j.y));
}
