import { formatFeetInches, formatMm } from '../format';
import { MM_PER_INCH, MPA_PER_PSI, N_PER_LBF } from '../units';
import { plateGovernsText } from '../plates/report';
import type { AdditionalChecks, ShearCheck, UpliftCheck } from './additionalChecks';
import type { DeflectionCheck, TrussDesign } from './types';

/** Unit system of a presented design. */
export type PresentUnits = 'imperial' | 'metric';

/** A length in the presented unit (in or mm) with the shop's text beside it. */
export interface PresentedLength {
  /** Inches (imperial) or mm (metric). */
  value: number;
  /** Feet-inches-sixteenths (e.g. `12'-0 1/2"`) or mm (e.g. `3658 mm`). */
  text: string;
}

/** Units of every number in a presented design. */
export interface PresentedUnits {
  system: PresentUnits;
  /** "in" or "mm". */
  length: 'in' | 'mm';
  /** "lbf" or "kN". */
  force: 'lbf' | 'kN';
  /** "lbf·ft" or "kN·m". */
  moment: 'lbf·ft' | 'kN·m';
  /** "psi" or "MPa". */
  stress: 'psi' | 'MPa';
  /** "in²" or "mm²". */
  area: 'in²' | 'mm²';
}

/** A deflection check in presented units (`max` in in or mm; `ratio` null when Δ ≤ 0). */
export interface PresentedDeflection {
  load: string;
  max: number;
  joint: string;
  ratio: number | null;
  limit: number;
  pass: boolean;
}

/**
 * A design in the user's units for the CLI and the API: lengths in inches with feet-inches text
 * (imperial) or mm (metric), forces lbf or kN, moments lbf·ft or kN·m, stresses psi or MPa.
 * Field meanings are those of `TrussDesign`; `units` names every unit.
 */
export interface PresentedDesign {
  units: PresentedUnits;
  ok: boolean;
  engineVersion: string;
  span: PresentedLength;
  rise: PresentedLength;
  heelHeight: { requested: PresentedLength; analysed: PresentedLength };
  joints: { id: string; x: number; y: number }[];
  combinations: { name: string; cd: number }[];
  members: {
    id: string;
    from: string;
    to: string;
    role: string;
    piece: string;
    length: PresentedLength;
    lumber: string;
    braced: boolean;
    /** Axial force per combination (tension +), same order as `combinations`. */
    forces: number[];
    maxTension: number;
    maxCompression: number;
    maxMoment: number;
    /** Largest shear along the member. */
    maxShear: number;
    csi: number;
    governingCombination: string;
    governingCheck: string;
    bracing: string;
    note?: string;
  }[];
  pieces: {
    mark: string;
    role: string;
    lumber: string;
    length: PresentedLength;
    members: string[];
    splices: string[];
    csi: number;
    failing: boolean;
  }[];
  reactions: {
    joint: string;
    maxDown: number;
    maxUp: number;
    maxHorizontal: number;
    /** Vertical reaction per combination, + up. */
    vertical: number[];
    horizontal: number[];
  }[];
  bearing: {
    joint: string;
    lumber: string;
    width: PresentedLength;
    reaction: number;
    stress: number;
    capacity: number;
    ratio: number;
    pass: boolean;
  }[];
  deflection: {
    liveCase?: string;
    live?: PresentedDeflection;
    total: PresentedDeflection;
    bottomChord: { joint: string; total: number; live: number }[];
  };
  plates: {
    joint: string;
    kind: string;
    ok: boolean;
    /** Catalog id, e.g. "4x6-20"; plate width × length stay in the catalog's inches. */
    plate?: string;
    gauge?: number;
    widthIn?: number;
    lengthIn?: number;
    /** Plate length axis from +x, degrees (counter-clockwise, y up). */
    angleDeg?: number;
    /** Slide of the plate centre from the joint, square to its length axis (+ toward the axis turned +90°), in or mm. */
    offset?: number;
    ratio?: number;
    /** What governs, in words: teeth on a member at its angle, or steel tension/shear/combined. */
    governs?: string;
    /** The same, as data: `check` teeth | tension | shear | combined, the member(s), the ratio. */
    governing?: { check: string; member: string; ratio: number };
    /** Tooth holding per member: angles in degrees, lateral value per face (stress units). */
    members?: {
      member: string;
      area: number;
      demand: number;
      capacity: number;
      ratio: number;
      plateToLoadDeg: number;
      loadToGrainDeg: number;
      lateralValue: number;
      heelFactor: number;
    }[];
    /** Steel per section: `line` heel | splice | chordFace | joint; `member` the crossing members. */
    steel?: {
      kind: string;
      line: string;
      member: string;
      demand: number;
      capacity: number;
      ratio: number;
    }[];
    message?: string;
  }[];
  demoPlates: boolean;
  /** Chord shear, uplift, long-term, mid-panel and overhang-tip deflection, roller movement. */
  additional?: {
    /** Per chord member, as `ShearCheck`: shear in force units, fv and Fv′ in stress units. */
    shear: ShearCheck[];
    /** Bearings with net uplift (force units): what a hold-down must carry. */
    uplift: UpliftCheck[];
    longTermDeflection: PresentedDeflection;
    midPanel: { live?: PresentedDeflection; total: PresentedDeflection };
    overhangTip?: { live?: PresentedDeflection; total: PresentedDeflection };
    /** Horizontal movement of a scissor's roller bearing (in or mm, + outward). */
    rollerMovement?: { joint: string; load: string; movement: number };
  };
  warnings: string[];
  notes: string[];
  cautions: string[];
  /** A girder's ply-to-ply fastening per chord, in words (absent for one ply). */
  plyConnections?: { chord: 'top' | 'bottom'; text: string; ratio: number; pass: boolean }[];
}

const round = (v: number, digits: number) => {
  const f = 10 ** digits;
  // + 0 turns −0 (a support's zero drop, a tiny negative) into 0 for JSON.
  return Math.round(v * f) / f + 0;
};

/**
 * Converts an SI design to the user's units. Imperial: in (3 decimals) with feet-inches text,
 * lbf (1 decimal), lbf·ft, psi; metric: mm (1 decimal), kN (3 decimals), kN·m, MPa. CSIs and
 * ratios keep 3 decimals; an infinite span/Δ becomes null (JSON has no Infinity).
 */
export function presentDesign(design: TrussDesign, units: PresentUnits): PresentedDesign {
  const imperial = units === 'imperial';
  const len = (v: number) => (imperial ? round(v / MM_PER_INCH, 3) : round(v, 1));
  const length = (v: number): PresentedLength => ({
    value: len(v),
    text: imperial ? formatFeetInches(v) : formatMm(v),
  });
  const force = (v: number) => (imperial ? round(v / N_PER_LBF, 1) : round(v / 1000, 3));
  // N·mm → lbf·ft or kN·m.
  const moment = (v: number) =>
    imperial ? round(v / N_PER_LBF / (12 * MM_PER_INCH), 1) : round(v / 1e6, 4);
  const stress = (v: number) => (imperial ? round(v / MPA_PER_PSI, 1) : round(v, 3));
  const area = (v: number) => (imperial ? round(v / MM_PER_INCH ** 2, 3) : round(v, 1));
  const ratio = (v: number) => round(v, 3);
  const deflection = (d: DeflectionCheck): PresentedDeflection => ({
    load: d.load,
    max: imperial ? round(d.max / MM_PER_INCH, 4) : round(d.max, 2),
    joint: d.joint,
    ratio: Number.isFinite(d.ratio) ? Math.round(d.ratio) : null,
    limit: d.limit,
    pass: d.pass,
  });
  const drop = (v: number) => (imperial ? round(v / MM_PER_INCH, 4) : round(v, 2));

  return {
    units: imperial
      ? { system: units, length: 'in', force: 'lbf', moment: 'lbf·ft', stress: 'psi', area: 'in²' }
      : { system: units, length: 'mm', force: 'kN', moment: 'kN·m', stress: 'MPa', area: 'mm²' },
    ok: design.ok,
    engineVersion: design.engineVersion,
    span: length(design.span),
    rise: length(design.rise),
    heelHeight: {
      requested: length(design.heelHeight.requested),
      analysed: length(design.heelHeight.analysed),
    },
    joints: design.joints.map((j) => ({ id: j.id, x: len(j.x), y: len(j.y) })),
    combinations: design.combinations.map((c) => ({ name: c.name, cd: c.cd })),
    members: design.members.map((m) => ({
      id: m.id,
      from: m.from,
      to: m.to,
      role: m.role,
      piece: m.piece,
      length: length(m.length),
      lumber: m.lumber,
      braced: m.braced,
      forces: m.forces.map(force),
      maxTension: force(m.maxTension),
      maxCompression: force(m.maxCompression),
      maxMoment: moment(m.maxMoment),
      maxShear: force(m.maxShear),
      csi: ratio(m.csi),
      governingCombination: m.governingCombination,
      governingCheck: m.governingCheck,
      bracing: m.bracing,
      ...(m.note && { note: m.note }),
    })),
    pieces: design.pieces.map((p) => ({
      mark: p.mark,
      role: p.role,
      lumber: p.lumber,
      length: length(p.length),
      members: p.members,
      splices: p.splices,
      csi: ratio(p.csi),
      failing: p.failing,
    })),
    reactions: design.reactions.map((r) => ({
      joint: r.joint,
      maxDown: force(r.maxDown),
      maxUp: force(r.maxUp),
      maxHorizontal: force(r.maxHorizontal),
      vertical: r.vertical.map(force),
      horizontal: r.horizontal.map(force),
    })),
    bearing: design.bearing.map((b) => ({
      joint: b.joint,
      lumber: b.lumber,
      width: length(b.width),
      reaction: force(b.reaction),
      stress: stress(b.stress),
      capacity: stress(b.capacity),
      ratio: ratio(b.ratio),
      pass: b.pass,
    })),
    deflection: {
      ...(design.deflection.liveCase && { liveCase: design.deflection.liveCase }),
      ...(design.deflection.live && { live: deflection(design.deflection.live) }),
      total: deflection(design.deflection.total),
      bottomChord: design.deflection.bottomChord.map((b) => ({
        joint: b.joint,
        total: drop(b.total),
        live: drop(b.live),
      })),
    },
    plates: design.plates.map((p) => ({
      joint: p.joint,
      kind: p.kind,
      ok: p.ok,
      ...(p.design && {
        plate: p.design.plate.id,
        gauge: p.design.plate.gauge,
        widthIn: p.design.plate.width,
        lengthIn: p.design.plate.length,
        angleDeg: round((p.design.angle * 180) / Math.PI, 2),
        offset: len(p.design.offset),
        ratio: ratio(p.design.ratio),
        governs: plateGovernsText(p.design),
        governing: { ...p.design.governs, ratio: ratio(p.design.governs.ratio) },
        members: p.design.members.map((c) => ({
          member: c.member,
          area: area(c.area),
          demand: force(c.demand),
          capacity: force(c.capacity),
          ratio: ratio(c.ratio),
          plateToLoadDeg: round((c.plateToLoad * 180) / Math.PI, 1),
          loadToGrainDeg: round((c.loadToGrain * 180) / Math.PI, 1),
          lateralValue: stress(c.lateralValue),
          heelFactor: round(c.heelFactor, 3),
        })),
        steel: p.design.steel.map((s) => ({
          kind: s.kind,
          line: s.line,
          member: s.member,
          demand: force(s.demand),
          capacity: force(s.capacity),
          ratio: ratio(s.ratio),
        })),
      }),
      ...(p.message && { message: p.message }),
    })),
    demoPlates: design.demoPlates,
    additional: presentAdditional(design.additional, { force, stress, ratio, deflection, drop }),
    warnings: design.warnings,
    notes: imperial ? design.notes.map(psfFirst) : design.notes,
    ...(design.plyConnections && {
      plyConnections: design.plyConnections.map((c) => ({
        chord: c.chord,
        text: c.text,
        ratio: round(c.ratio, 3),
        pass: c.pass,
      })),
    }),
    cautions: design.cautions,
  };
}

/** The unit converters of one presented design. */
interface Converters {
  force: (v: number) => number;
  stress: (v: number) => number;
  ratio: (v: number) => number;
  deflection: (d: DeflectionCheck) => PresentedDeflection;
  drop: (v: number) => number;
}

function presentAdditional(a: AdditionalChecks, c: Converters): PresentedDesign['additional'] {
  const pair = (p: { live?: DeflectionCheck; total: DeflectionCheck }) => ({
    ...(p.live && { live: c.deflection(p.live) }),
    total: c.deflection(p.total),
  });
  const { midPanel, overhangTip, rollerMovement } = a.deflection;
  return {
    shear: a.shear.map((s) => ({
      member: s.member,
      shear: c.force(s.shear),
      fv: c.stress(s.fv),
      fvPrime: c.stress(s.fvPrime),
      ratio: c.ratio(s.ratio),
      combination: s.combination,
      pass: s.pass,
    })),
    uplift: a.uplift.map((u) => ({
      joint: u.joint,
      force: c.force(u.force),
      combination: u.combination,
    })),
    longTermDeflection: c.deflection(a.longTermDeflection),
    midPanel: pair(midPanel),
    ...(overhangTip && { overhangTip: pair(overhangTip) }),
    ...(rollerMovement && {
      rollerMovement: { ...rollerMovement, movement: c.drop(rollerMovement.movement) },
    }),
  };
}

/**
 * An imperial reader's note leads with psf: "0.958 kPa (20.0 psf)" reads "20.0 psf (0.958 kPa)".
 * The engine writes its notes in SI with the psf beside; only the order changes.
 */
export function psfFirst(note: string): string {
  return note.replace(/(-?\d+(?:\.\d+)?) kPa \((-?\d+(?:\.\d+)?) psf\)/g, '$2 psf ($1 kPa)');
}
