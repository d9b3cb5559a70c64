import { formatFeetInches } from '../format';
import { dressedSize, parseLumberId } from '../lumber';
import type { ProfileMember } from '../profiles/types';
import type { EngineDesignInput } from './input';

/** Bottom-chord lateral bracing spacing when there is no ceiling and none is given: 10 ft (common practice). */
export const DEFAULT_BOTTOM_CHORD_BRACING_MM = 120 * 25.4;

/**
 * Out-of-plane unbraced lengths of the chords, mm (0 = braced continuously): the top chord by
 * its sheathing unless purlins at a stated spacing carry the roof; the bottom chord by a ceiling
 * unless the job says there is none, then by lateral bracing at the stated spacing.
 */
export function chordBracing(input: EngineDesignInput): { top: number; bottom: number } {
  const b = input.bracing ?? {};
  return {
    top: b.purlinSpacing ?? 0,
    bottom: b.ceiling === false ? (b.bottomChordBracing ?? DEFAULT_BOTTOM_CHORD_BRACING_MM) : 0,
  };
}

/** The chords' bracing in one sentence for the design's notes. */
export function chordBracingNote(input: EngineDesignInput): string {
  const { top, bottom } = chordBracing(input);
  const tc =
    top > 0
      ? `Top chord braced out of plane by purlins at ${formatFeetInches(top)} o.c. (le and lu for CL = purlin spacing)`
      : 'Top chord braced out of plane by the sheathing';
  const bc =
    bottom > 0
      ? `bottom chord (no ceiling) by lateral bracing at ${formatFeetInches(bottom)} o.c. (le and lu for CL = bracing spacing)`
      : 'bottom chord by the ceiling';
  // A sheathed or ceiled chord is taken as held on both edges (CL = 1) even where uplift or a
  // panel-point moment puts its free edge in compression (common practice).
  return `${tc}; ${bc}; webs over their length unless braced.${top > 0 || bottom > 0 ? ' A chord held only at points is checked for lateral-torsional buckling with that spacing as lu (NDS 2018 §3.3.3, Table 3.3.3 le, and Eq. 3.9-4).' : ''}`;
}

/**
 * What holds a member laterally, in words a crew can build: chords by sheathing, purlins, a
 * ceiling or bracing at a spacing; a web that needs restraint by a continuous lateral brace at
 * mid-length (a 2x4 nailed across the webs of neighbouring trusses, tied back with diagonal
 * bracing) or, instead, a T-brace of the web's own size and grade nailed to its narrow face over
 * at least 90 % of its length (common practice).
 */
export function bracingText(
  member: ProfileMember,
  braced: boolean,
  lumber: string,
  input: EngineDesignInput,
): string {
  const { top, bottom } = chordBracing(input);
  if (member.role === 'topChord') {
    return top > 0
      ? `Braced out of plane by purlins at ${formatFeetInches(top)} o.c.`
      : 'Braced out of plane by the roof sheathing.';
  }
  if (member.role === 'bottomChord') {
    return bottom > 0
      ? `No ceiling: lateral bracing at ${formatFeetInches(bottom)} o.c. along the bottom chord.`
      : 'Braced out of plane by the ceiling.';
  }
  if (!braced) return 'No lateral brace needed.';
  let size = '2x4';
  try {
    size = `2x${dressedSize(parseLumberId(lumber).size).nominalWidth}`;
  } catch {
    // An unknown id keeps the smallest brace; sizing only picks known lumber.
  }
  const lateral =
    `Continuous lateral brace (2x4) at mid-length, ${formatFeetInches(member.length / 2)} from joint ${member.from}, ` +
    'nailed to this web in every truss of the run and tied back with diagonal bracing at each end';
  const tBrace = `a ${size} T-brace of the web's grade nailed to its narrow face over at least 90 % of its length.`;
  const kind = input.bracing?.webBrace;
  if (kind === 'lateral') return `${lateral}.`;
  if (kind === 'tBrace') return tBrace.charAt(0).toUpperCase() + tBrace.slice(1);
  return `${lateral}; or ${tBrace}`;
}
