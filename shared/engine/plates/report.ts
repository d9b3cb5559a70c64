import type { JointPlateDesign, SteelLine } from './types';

const LINE: Record<SteelLine, string> = {
  heel: 'across the heel line',
  splice: 'across the splice',
  chordFace: "across the chord's face",
  joint: 'across the joint line',
};

/**
 * What governs a joint's plate, in words for the plate report: the teeth on a member at its
 * angle to the plate (and the heel reduction), or the steel in tension, shear or both combined
 * across a section, e.g. "teeth: W2 at 45° to the plate" or "steel combined: W1, W2 across the
 * chord's face".
 */
export const plateGovernsText = (d: JointPlateDesign): string => {
  const g = d.governs;
  if (g.check === 'teeth') {
    const m = d.members.find((c) => c.member === g.member);
    if (!m) return `teeth: ${g.member}`;
    const angle = `${Math.round((m.plateToLoad * 180) / Math.PI)}° to the plate`;
    const grain =
      m.loadToGrain > 0 ? `, ${Math.round((m.loadToGrain * 180) / Math.PI)}° to the grain` : '';
    const heel = m.heelFactor < 1 ? `, heel reduction ${m.heelFactor.toFixed(2)}` : '';
    return `teeth: ${g.member} at ${angle}${grain}${heel}`;
  }
  const s = d.steel.find((c) => c.kind === g.check && c.member === g.member);
  return `steel ${g.check}: ${g.member}${s ? ` ${LINE[s.line]}` : ''}`;
};
