import { EngineError } from '../errors';
import { designValues, parseLumberId, sectionProperties, dressedSize } from '../lumber';
import { beamStability, MAX_BEAM_SLENDERNESS } from './beamStability';
import { columnDesignValue, MAX_SLENDERNESS } from './columnStability';
import { compressionBendingIndex, tensionBendingIndex } from './interaction';
import { shearStress } from './shear';

/** One member, one load combination (NDS 2018 ASD; N, mm, MPa). */
export interface MemberCheckInput {
  lumberId: string;
  /** Pieces side by side (girders); they multiply the section. */
  plies: number;
  /** Axial force, N, tension positive. */
  axial: number;
  /** Largest absolute in-plane bending moment, N·mm (strong axis). */
  moment: number;
  /**
   * The part of `moment` that acts at a panel point (a support of the continuous chord), N·mm.
   * When given, the compression + bending interaction amplifies only the span moment
   * (`moment` is then taken as the span moment unless `spanMoment` says otherwise).
   */
  supportMoment?: number;
  /** The largest moment inside the span, N·mm (defaults to `moment`). */
  spanMoment?: number;
  /** Effective lengths, mm: strong axis (in the truss plane, over d) and weak axis (over b). */
  leStrong: number;
  leWeak: number;
  /** Load duration factor of the combination. */
  cd: number;
  /** Cr on Fb (trusses ≤ 24 in. o.c.). */
  repetitive: boolean;
  /** Largest |V| along the member, N: checked as fv = 1.5V/A ≤ Fv′ (NDS 2018 §3.4.2). */
  shear?: number;
  /**
   * Amplify the panel-point (support) moment by 1/(1 − fc/FcE1) as well, as NDS 2018 §3.9.2
   * reads literally (stricter than the common-practice check; a plant setting).
   */
  amplifyPanelPoint?: boolean;
  /**
   * Laterally unbraced length of the compression edge in bending, mm (NDS 2018 §3.3.3): 0 or
   * absent when sheathing or a ceiling holds it throughout (CL = 1); for a chord held only by
   * purlins or bracing at a spacing, that spacing (either edge may be the compression edge,
   * whichever way the chord bends).
   */
  luBending?: number;
}

/** The check that sets the CSI. */
export type GoverningCheck =
  'tension' | 'compression' | 'bending' | 'tension+bending' | 'compression+bending' | 'shear';

/** Demand/capacity ratios; only those that apply are present. */
export interface MemberRatios {
  tension?: number;
  compression?: number;
  bending?: number;
  tensionBending?: number;
  compressionBending?: number;
  /** max(le/d)/50 for a compression member (NDS 2018 3.7.1.4); above 1 is a failure. */
  slenderness?: number;
  /** fv/Fv′ (NDS 2018 §3.4.2), when a shear is given. */
  shear?: number;
  /** RB/50 for a bending member with an unbraced compression edge (NDS 2018 §3.3.3.7). */
  beamSlenderness?: number;
  /** fc/FcE2 + (fb1/FbE)² (NDS 2018 Eq. 3.9-4), when the compression edge is unbraced. */
  lateralTorsional?: number;
}

/** Result of a member check. Stresses and design values in MPa. */
export interface MemberCheckResult {
  /** Combined stress index: the largest ratio (≤ 1 passes). */
  csi: number;
  governing: GoverningCheck;
  ratios: MemberRatios;
  slenderness: { strong: number; weak: number };
  stresses: { axial: number; bending: number };
  /** fbPrime includes CL (1 unless `luBending` is given). */
  capacities: {
    ftPrime: number;
    fcPrime: number;
    fbPrime: number;
    cp: number;
    fcEStrong: number;
    cl: number;
  };
  note?: string;
}

const GOVERNING_OF: Record<keyof MemberRatios, GoverningCheck> = {
  tension: 'tension',
  compression: 'compression',
  bending: 'bending',
  tensionBending: 'tension+bending',
  compressionBending: 'compression+bending',
  slenderness: 'compression',
  shear: 'shear',
  beamSlenderness: 'bending',
  lateralTorsional: 'compression+bending',
};

function validate(input: MemberCheckInput): void {
  const { plies, axial, moment, leStrong, leWeak } = input;
  const bad: string[] = [];
  if (!Number.isInteger(plies) || plies < 1) bad.push('plies must be a whole number ≥ 1');
  if (!Number.isFinite(axial)) bad.push('axial force must be a finite number');
  if (!Number.isFinite(moment)) bad.push('moment must be a finite number');
  if (!(leStrong >= 0) || !Number.isFinite(leStrong)) bad.push('leStrong must be ≥ 0');
  if (!(leWeak >= 0) || !Number.isFinite(leWeak)) bad.push('leWeak must be ≥ 0');
  if (bad.length > 0) {
    throw new EngineError('invalid', `Member check: ${bad.join('; ')}.`, { ...input });
  }
}

/**
 * Checks a sawn-lumber truss member for one load combination: tension (ft/Ft′), compression
 * (fc/Fc′ with Cp about each axis), bending (fb/Fb′ with CL from `luBending`, NDS 2018 §3.3.3) and
 * the NDS 2018 3.9.1 / 3.9.2 interactions (with Eq. 3.9-4 when the compression edge is unbraced). Weak-axis slenderness uses one ply's thickness: nailed plies are not credited
 * as a solid column (conservative; NDS 15.3 built-up column rules are not applied).
 */
export function checkMember(input: MemberCheckInput): MemberCheckResult {
  validate(input);
  const { lumberId, plies, axial, leStrong, leWeak, cd, repetitive } = input;
  const moment = Math.abs(input.moment);
  const { size } = parseLumberId(lumberId);
  const dv = designValues(lumberId, { cd, repetitive });
  const section = sectionProperties(size, plies);
  const plyThickness = dressedSize(size).thickness;

  const column = columnDesignValue({
    fcStar: dv.fcStar,
    eminPrime: dv.emin,
    leStrong,
    d: section.d,
    leWeak,
    b: plyThickness,
  });
  const fa = Math.abs(axial) / section.area;
  const fb = moment / section.sx;
  const ratios: MemberRatios = {};
  const notes: string[] = [];
  // Fb* = dv.fb (every factor but CL); Fb′ = Fb** = CL·Fb* for sawn lumber (no CV).
  const beam = beamStability({
    lu: moment > 0 ? (input.luBending ?? 0) : 0,
    d: section.d,
    b: plyThickness,
    fbStar: dv.fb,
    eminPrime: dv.emin,
  });
  const fbPrime = dv.fb * beam.cl;
  if (beam.rb > MAX_BEAM_SLENDERNESS) {
    ratios.beamSlenderness = beam.rb / MAX_BEAM_SLENDERNESS;
    notes.push(
      `RB = ${beam.rb.toFixed(1)} exceeds ${MAX_BEAM_SLENDERNESS} (NDS 2018 §3.3.3.7): brace the chord closer.`,
    );
  }

  if (axial > 0) {
    ratios.tension = fa / dv.ft;
    if (moment > 0) {
      ratios.bending = fb / fbPrime;
      // NDS 2018 3.9.1: Fb* excludes CL, Fb** includes it.
      ratios.tensionBending = tensionBendingIndex(fa, dv.ft, fb, dv.fb, fbPrime);
    }
  } else if (axial < 0) {
    ratios.compression = fa / column.fcPrime;
    const worst = Math.max(column.slendernessStrong, column.slendernessWeak);
    if (worst > MAX_SLENDERNESS) {
      ratios.slenderness = worst / MAX_SLENDERNESS;
      const axis = column.slendernessWeak >= column.slendernessStrong ? 'weak' : 'strong';
      notes.push(
        `le/d = ${worst.toFixed(1)} about the ${axis} axis exceeds ${MAX_SLENDERNESS} (NDS 2018 3.7.1.4): ` +
          'add a lateral brace or use a larger size.',
      );
    }
    if (moment > 0) {
      ratios.bending = fb / fbPrime;
      // NDS 2018 3.9.2's amplifier 1/(1 − fc/FcE1) stands for the chord bowing between its
      // supports. At a panel point the chord is held in plane, so the support moment enters
      // unamplified: (fc/Fc′)² + fb/Fb′ (common practice for continuous truss chords).
      const split = input.supportMoment !== undefined;
      const fbSpan = split ? Math.abs(input.spanMoment ?? input.moment) / section.sx : fb;
      const cb = compressionBendingIndex(fa, column.fcPrime, fbSpan, fbPrime, column.fcEStrong);
      const fbSupport = split ? Math.abs(input.supportMoment!) / section.sx : 0;
      const atPanelPoint = !split
        ? 0
        : input.amplifyPanelPoint
          ? compressionBendingIndex(fa, column.fcPrime, fbSupport, fbPrime, column.fcEStrong).index
          : (fa / column.fcPrime) ** 2 + fbSupport / fbPrime;
      ratios.compressionBending = Math.max(cb.index, atPanelPoint);
      // NDS 2018 Eq. 3.9-4 (from memory): fc/FcE2 + (fb1/FbE)² ≤ 1, lateral-torsional buckling of
      // a chord whose compression edge is held only at points; FbE is infinite when it is braced.
      if (beam.le > 0) ratios.lateralTorsional = fa / column.fcEWeak + (fb / beam.fbE) ** 2;
      if (cb.buckles)
        notes.push(
          'fc ≥ FcE about the bending axis (NDS 2018 3.9.2): the member buckles in plane.',
        );
    }
  } else {
    ratios.bending = fb / fbPrime;
  }
  if (input.shear) ratios.shear = shearStress(input.shear, section.area) / dv.fv;

  // The largest ratio governs; on a tie the later (combined) check is reported. Every branch
  // above sets at least one ratio, so the first one seeds the search. for…in, not
  // Object.entries: the same (insertion) order without allocating pairs per check.
  let governing: GoverningCheck = 'tension';
  let csi = -Infinity;
  for (const key in ratios) {
    const value = ratios[key as keyof MemberRatios]!;
    if (value >= csi) {
      csi = value;
      governing = GOVERNING_OF[key as keyof MemberRatios];
    }
  }
  // Weak-axis governing implies leWeak > 0 (a braced axis has Cp = 1 and never governs).
  if (axial < 0 && column.governingAxis === 'weak' && csi > 1) {
    notes.push('Weak-axis buckling governs Fc′: a lateral brace would shorten le (weak).');
  }

  const result: MemberCheckResult = {
    csi,
    governing,
    ratios,
    slenderness: { strong: column.slendernessStrong, weak: column.slendernessWeak },
    stresses: { axial: axial >= 0 ? fa : -fa, bending: fb },
    capacities: {
      ftPrime: dv.ft,
      fcPrime: column.fcPrime,
      fbPrime,
      cp: column.cp,
      fcEStrong: column.fcEStrong,
      cl: beam.cl,
    },
  };
  // Set, not spread in: on Node 20 a spread costs more than the rest of a simple check.
  if (notes.length > 0) result.note = notes.join(' ');
  return result;
}
