import type { DesignInput } from '../../../shared/api/design';
import { formatFeetInches } from '../../../shared/engine/format';
import { PROFILE_KIND_LABELS } from '../../../shared/engine/profiles/kinds';
import { inch, inchToMm } from '../../../shared/engine/units';
import { isPresentedDesign } from './from-design';

/** One fact of a design input as a label and its text. */
export interface DesignFact {
  label: string;
  value: string;
}

/** A length of the design input (in or mm) as the desk types it: 2'-0" or 610 mm. */
function lengthText(d: DesignInput, value: number): string {
  return d.units === 'imperial'
    ? formatFeetInches(inchToMm(inch(value)))
    : `${Math.round(value).toLocaleString('en-US')} mm`;
}

/** An area load of the design input, psf or kPa. */
function loadText(d: DesignInput, value: number): string {
  return d.units === 'imperial' ? `${value} psf` : `${value} kPa`;
}

function overhangText(d: DesignInput): string {
  const o = typeof d.overhang === 'number' ? { left: d.overhang, right: d.overhang } : d.overhang;
  if (o.left === 0 && o.right === 0) return 'None';
  if (o.left === o.right) return `${lengthText(d, o.left)} each end`;
  return `Left ${lengthText(d, o.left)} · right ${lengthText(d, o.right)}`;
}

function snowText(d: DesignInput): string {
  const s = d.loads.snow;
  if (!s) return 'None';
  return `Ground snow ${loadText(d, s.pg)} (ASCE ${s.edition ?? '7-16'})`;
}

function windText(d: DesignInput): string {
  const w = d.loads.wind;
  if (w) {
    const speed = d.units === 'imperial' ? `${w.speed} mph` : `${w.speed} m/s`;
    return `${speed}, exposure ${w.exposure}, mean roof height ${lengthText(d, w.meanRoofHeight)}`;
  }
  if (d.loads.windUplift !== undefined) return `Uplift ${loadText(d, d.loads.windUplift)}`;
  return 'None';
}

/** The chords' and webs' bracing as entered (a ceiling and sheathing unless the line says not). */
function bracingText(d: DesignInput): string {
  const b = d.bracing ?? {};
  const top =
    b.sheathing !== true && b.purlinSpacing !== undefined
      ? `Top chord: purlins at ${lengthText(d, b.purlinSpacing)} o.c.`
      : 'Top chord sheathed';
  const bottom =
    b.ceiling === false
      ? `no ceiling, bottom chord braced at ${lengthText(
          d,
          b.bottomChordBracing ?? (d.units === 'imperial' ? 120 : 3048),
        )} o.c.`
      : 'ceiling on the bottom chord';
  const webs =
    b.webBrace === 'lateral'
      ? 'braced webs: continuous lateral brace'
      : b.webBrace === 'tBrace'
        ? 'braced webs: T-brace'
        : 'braced webs: lateral brace or T-brace';
  return `${top} · ${bottom} · ${webs}`;
}

/**
 * The facts of a design input a reviewer signs off on and a printed design states: truss, spacing,
 * heel, overhangs, the area loads, snow, wind and bracing.
 */
export function designInputFacts(
  d: DesignInput,
  line: { quantity: number; plies: number },
): DesignFact[] {
  const loads = d.loads;
  const kind = PROFILE_KIND_LABELS[d.profile as keyof typeof PROFILE_KIND_LABELS] ?? d.profile;
  return [
    {
      label: 'Truss',
      value: `${kind}, span ${lengthText(d, d.span)}${
        d.profile === 'flat' ? '' : `, pitch ${d.pitch}/12`
      } · ${line.quantity} × ${line.plies} ply`,
    },
    { label: 'Spacing', value: `${lengthText(d, d.spacing)} o.c.` },
    { label: 'Heel', value: lengthText(d, d.heelHeight) },
    { label: 'Overhangs', value: overhangText(d) },
    { label: 'TCLL', value: loadText(d, loads.tcll) },
    { label: 'TCDL', value: loadText(d, loads.tcdl) },
    {
      label: 'BCLL',
      value:
        loadText(d, loads.bcll) +
        (loads.bcllNonConcurrent
          ? ` (${loadText(d, loads.bcllNonConcurrent)} non-concurrent)`
          : ''),
    },
    { label: 'BCDL', value: loadText(d, loads.bcdl) },
    { label: 'Snow', value: snowText(d) },
    { label: 'Wind', value: windText(d) },
    { label: 'Bracing', value: bracingText(d) },
  ];
}

/** Lumber per chord and the webs: what the design uses (a presented result), else as requested. */
export function lumberFacts(result: unknown, d: DesignInput): DesignFact[] {
  const byRole = new Map<string, Set<string>>();
  if (isPresentedDesign(result)) {
    for (const m of result.members) {
      const set = byRole.get(m.role) ?? new Set<string>();
      set.add(m.lumber);
      byRole.set(m.role, set);
    }
  }
  const requested = (c: string | string[] | undefined) =>
    c === undefined ? 'Cheapest that passes' : [c].flat().join(', ');
  const used = (role: string, fallback: string) => {
    const set = byRole.get(role);
    return set && set.size > 0 ? [...set].join(', ') : fallback;
  };
  return [
    { label: 'Top chord', value: used('topChord', requested(d.lumber?.topChord)) },
    { label: 'Bottom chord', value: used('bottomChord', requested(d.lumber?.bottomChord)) },
    { label: 'Webs', value: used('web', requested(d.lumber?.webs)) },
  ];
}
