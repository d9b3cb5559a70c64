import { EngineError } from '../errors';
import { designValues, parseLumberId, sectionProperties, dressedSize } from '../lumber';
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
}

/** Result of a member check. Stresses and design values in MPa. */
export interface MemberCheckResult {
  /** Combined stress index: the largest ratio (≤ 1 passes). */
  csi: number;
  governing: GoverningCheck;
  ratios: MemberRatios;
  slenderness: { strong: number; weak: number };
  stresses: { axial: number; bending: number };
  capacities: { ftPrime: number; fcPrime: number; fbPrime: number; cp: number; fcEStrong: number };
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
 * (fc/Fc′ with Cp about each axis), bending (fb/Fb′, CL = 1) and the NDS 2018 3.9.1 / 3.9.2
 * interactions. Weak-axis slenderness uses one ply's thickness: nailed plies are not credited
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

  if (axial > 0) {
    ratios.tension = fa / dv.ft;
    if (moment > 0) {
      ratios.bending = fb / dv.fb;
      ratios.tensionBending = tensionBendingIndex(fa, dv.ft, fb, dv.fb);
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
      ratios.bending = fb / dv.fb;
      // NDS 2018 3.9.2's amplifier 1/(1 − fc/FcE1) stands for the chord bowing between its
      // supports. At a panel point the chord is held in plane, so the support moment enters
      // unamplified: (fc/Fc′)² + fb/Fb′ (common practice for continuous truss chords).
      const split = input.supportMoment !== undefined;
      const fbSpan = split ? Math.abs(input.spanMoment ?? input.moment) / section.sx : fb;
      const cb = compressionBendingIndex(fa, column.fcPrime, fbSpan, dv.fb, column.fcEStrong);
      const fbSupport = split ? Math.abs(input.supportMoment!) / section.sx : 0;
      const atPanelPoint = !split
        ? 0
        : input.amplifyPanelPoint
          ? compressionBendingIndex(fa, column.fcPrime, fbSupport, dv.fb, column.fcEStrong).index
          : (fa / column.fcPrime) ** 2 + fbSupport / dv.fb;
      ratios.compressionBending = Math.max(cb.index, atPanelPoint);
      if (cb.buckles)
        notes.push(
          'fc ≥ FcE about the bending axis (NDS 2018 3.9.2): the member buckles in plane.',
        );
    }
  } else {
    ratios.bending = fb / dv.fb;
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

  return {
    csi,
    governing,
    ratios,
    slenderness: { strong: column.slendernessStrong, weak: column.slendernessWeak },
    stresses: { axial: axial >= 0 ? fa : -fa, bending: fb },
    capacities: {
      ftPrime: dv.ft,
      fcPrime: column.fcPrime,
      fbPrime: dv.fb,
      cp: column.cp,
      fcEStrong: column.fcEStrong,
    },
    ...(notes.length > 0 ? { note: notes.join(' ') } : {}),
  };
}
