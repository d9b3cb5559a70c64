import { EngineError } from '../errors';
import { MM_PER_INCH, N_PER_LBF, TOLERANCE } from '../units';
import { memberContactRegions, regionAreaInPlate, type LocalMember } from './contact';
import { centreLineLength, type Point } from './geometry';
import type {
  Direction,
  JointPlateDesign,
  MemberPlateCheck,
  PlateCatalog,
  PlateDesignOptions,
  PlateJoint,
  PlateJointMember,
  PlateSpec,
  SteelCheck,
} from './types';

// ½ in end and ¼ in edge distance without tooth credit: common practice (ANSI/TPI 1 wording
// not verified, see references §4).
const END_EXCLUSION_MM = 0.5 * MM_PER_INCH;
const EDGE_EXCLUSION_MM = 0.25 * MM_PER_INCH;
const MM2_PER_IN2 = MM_PER_INCH * MM_PER_INCH;
const PLATES_PER_JOINT = 2;

const unit = (d: Direction, what: string): Point => {
  const len = Math.hypot(d.x, d.y);
  if (!Number.isFinite(len) || len < TOLERANCE) {
    throw new EngineError('invalid', `${what} needs a direction`, { direction: d });
  }
  return [d.x / len, d.y / len];
};

/** Plate axis: the bottom chord, or at a splice the spliced chord, else the first member. */
const plateAxis = (joint: PlateJoint, options: PlateDesignOptions): Point => {
  if (options.orientation) return unit(options.orientation, `Plate at joint ${joint.id}`);
  const chord =
    joint.members.find((m) => m.role === 'bottomChord') ??
    joint.members.find((m) => m.role !== 'web') ??
    joint.members[0];
  const [x, y] = unit(chord.direction, `Member ${chord.id}`);
  // A plate is symmetric: keep its axis pointing right (or up) so the reported angle is stable.
  return x < -TOLERANCE || (Math.abs(x) <= TOLERANCE && y < 0) ? [-x, -y] : [x, y];
};

/**
 * Lateral value at an angle θ between load and grain by Hankinson's formula,
 * P·Q / (P sin²θ + Q cos²θ) (the NDS uses it for bearing at an angle to grain; applied here by
 * analogy, common practice).
 */
export const lateralValueAtAngle = (plate: PlateSpec, theta: number): number => {
  const p = plate.lateralValue.parallel;
  const q = plate.lateralValue.perpendicular;
  const s = Math.sin(theta);
  const c = Math.cos(theta);
  return (p * q) / (p * s * s + q * c * c);
};

const check = (demand: number, capacity: number) => ({
  demand,
  capacity,
  ratio: demand === 0 ? 0 : capacity > 0 ? demand / capacity : Infinity,
});

/**
 * Steel across the joint line. Splice: the chord force crosses the line square to the chord, in
 * tension over the plate's steel width there. Heel: the top-chord force crosses the line along
 * the bottom chord; its component along that line is steel shear, the rest steel tension.
 * Steel values are not adjusted by CD (common practice: load duration is a wood effect).
 */
const steelChecks = (
  kind: PlateJoint['kind'],
  local: LocalMember[],
  members: PlateJointMember[],
  plate: PlateSpec,
  halfLength: number,
  halfWidth: number,
): SteelCheck[] => {
  const lbfToN = N_PER_LBF / MM_PER_INCH; // (lbf/in) · mm → N
  if (kind === 'splice') {
    const chords = local
      .map((m, i) => ({ m, id: members[i].id, f: Math.abs(members[i].force) }))
      .filter((c) => c.m.role !== 'web');
    if (chords.length === 0) return [];
    const top = chords.reduce((a, b) => (b.f > a.f ? b : a));
    const across: Point = [-top.m.direction[1], top.m.direction[0]];
    const section = centreLineLength(across, halfLength, halfWidth);
    const capacity = PLATES_PER_JOINT * plate.tensionValue * section * lbfToN;
    return [{ kind: 'tension', member: top.id, section, ...check(top.f, capacity) }];
  }
  if (kind === 'heel') {
    const bc = local.find((m) => m.role === 'bottomChord');
    const tcIndex = local.findIndex((m) => m.role === 'topChord');
    if (!bc || tcIndex < 0) return [];
    const line = bc.direction;
    const section = centreLineLength(line, halfLength, halfWidth);
    const f = Math.abs(members[tcIndex].force);
    const d = local[tcIndex].direction;
    const along = Math.abs(d[0] * line[0] + d[1] * line[1]);
    const square = Math.sqrt(Math.max(0, 1 - along * along));
    return [
      {
        kind: 'shear',
        member: members[tcIndex].id,
        section,
        ...check(f * along, PLATES_PER_JOINT * plate.shearValue * section * lbfToN),
      },
      {
        kind: 'tension',
        member: members[tcIndex].id,
        section,
        ...check(f * square, PLATES_PER_JOINT * plate.tensionValue * section * lbfToN),
      },
    ];
  }
  return [];
};

/**
 * Where to try the plate centre across its length axis, mm: on the joint first; at a panel
 * point also slid toward each side until its edge just covers the chord's far face, so the
 * plate reaches further onto webs that leave the chord on one side (common practice). Heels and
 * splices stay centred, since their steel checks assume the joint line through the centre.
 */
const plateOffsets = (kind: PlateJoint['kind'], chordHalf: number, halfWidth: number) => {
  if (kind === 'heel' || kind === 'splice') return CENTRED;
  const slide = halfWidth - chordHalf;
  return chordHalf > 0 && slide > 0 ? [0, slide, -slide] : CENTRED;
};
const CENTRED = [0];

/** Largest half depth of the chords at a joint, mm (0 when only webs meet). */
const chordHalfDepth = (local: LocalMember[]) => {
  let half = 0;
  for (const m of local) if (m.role !== 'web' && m.halfDepth > half) half = m.halfDepth;
  return half;
};

// Each catalog sorted once (catalogs are immutable values), with the reach its largest plate needs.
const sortedCatalogs = new WeakMap<PlateCatalog, { plates: PlateSpec[]; reach: number }>();
const sortedPlates = (catalog: PlateCatalog) => {
  let entry = sortedCatalogs.get(catalog);
  if (!entry) {
    const plates = [...catalog.plates].sort(byAreaThenGauge);
    const reach =
      Math.max(...plates.map((p) => Math.hypot(p.width, p.length))) * (MM_PER_INCH / 2) + 1;
    entry = { plates, reach };
    sortedCatalogs.set(catalog, entry);
  }
  return entry;
};

/** Catalog order to try: smallest area first, then the lighter steel (higher gauge number). */
const byAreaThenGauge = (a: PlateSpec, b: PlateSpec) =>
  a.width * a.length - b.width * b.length || b.gauge - a.gauge;

const checkJointInput = (joint: PlateJoint, catalog: PlateCatalog): void => {
  if (joint.members.length === 0) {
    throw new EngineError('invalid', `Joint ${joint.id} has no members to plate`, {
      joint: joint.id,
    });
  }
  for (const m of joint.members) {
    if (!(m.depth > 0) || !Number.isFinite(m.force)) {
      throw new EngineError(
        'invalid',
        `Member ${m.id} at joint ${joint.id} needs a depth and a force`,
        {
          joint: joint.id,
          member: m.id,
        },
      );
    }
  }
  if (catalog.plates.length === 0) {
    throw new EngineError('no_plate_fits', 'The plate catalog is empty', { joint: joint.id });
  }
};

/**
 * Chooses the plate for one joint: the smallest catalog plate (by area, then gauge) that, on
 * both faces, holds every member's force by tooth holding, 2 · area · lateral value · CD ≥ |F|,
 * and at a heel or splice carries the force across the joint line in the steel. The plate is
 * centred on the joint and aligned with the bottom chord (or the spliced chord). Throws
 * EngineError `no_plate_fits` naming the joint and the member (or steel check) that fails on the
 * largest plate.
 */
export const designJointPlate = (
  joint: PlateJoint,
  catalog: PlateCatalog,
  options: PlateDesignOptions = {},
): JointPlateDesign => {
  checkJointInput(joint, catalog);
  const cd = options.cd ?? 1;
  const axis = plateAxis(joint, options);
  const local: LocalMember[] = joint.members.map((m) => {
    const [x, y] = unit(m.direction, `Member ${m.id}`);
    return {
      role: m.role,
      direction: [x * axis[0] + y * axis[1], -x * axis[1] + y * axis[0]],
      halfDepth: m.depth / 2,
    };
  });
  const { plates, reach } = sortedPlates(catalog);
  const chordHalf = chordHalfDepth(local);
  const endExclusion = options.endExclusion ?? END_EXCLUSION_MM;
  const edgeExclusion = options.edgeExclusion ?? EDGE_EXCLUSION_MM;
  const regions = memberContactRegions(local, { endExclusion, edgeExclusion, reach });
  // Most loaded members first: they fail soonest, so a too-small plate is dropped early.
  const order = joint.members
    .map((_, i) => i)
    .sort((a, b) => Math.abs(joint.members[b].force) - Math.abs(joint.members[a].force));
  let failure = { member: '', ratio: 0 };

  for (const plate of plates) {
    const halfLength = (plate.length * MM_PER_INCH) / 2;
    const halfWidth = (plate.width * MM_PER_INCH) / 2;
    const steel = steelChecks(joint.kind, local, joint.members, plate, halfLength, halfWidth);
    const badSteel = steel.find((s) => s.ratio > 1);
    if (badSteel) {
      failure = {
        member: `${badSteel.member} (steel ${badSteel.kind} across the joint line)`,
        ratio: badSteel.ratio,
      };
      continue;
    }
    let placed: { offset: number; checks: MemberPlateCheck[] } | undefined;
    for (const offset of plateOffsets(joint.kind, chordHalf, halfWidth)) {
      const checks: MemberPlateCheck[] = [];
      let fits = true;
      for (const i of order) {
        const m = joint.members[i];
        const lateral = lateralValueAtAngle(plate, m.loadToGrain ?? 0) / MM2_PER_IN2; // lbf/mm²
        const demand = Math.abs(m.force);
        // Cheap bound first: the member's band (its depth less the edge margins) cannot reach
        // past the plate's far corner, nor hold more than the whole plate.
        const reachInPlate = Math.hypot(halfLength, halfWidth + Math.abs(offset)) - endExclusion;
        const bound = Math.min(
          4 * halfLength * halfWidth,
          2 * Math.max(0, local[i].halfDepth - edgeExclusion) * Math.max(0, reachInPlate),
        );
        if (demand > PLATES_PER_JOINT * bound * lateral * cd * N_PER_LBF) {
          failure = { member: m.id, ratio: Infinity };
          fits = false;
          break;
        }
        const area = regionAreaInPlate(regions[i], halfLength, halfWidth, offset);
        const capacity = PLATES_PER_JOINT * area * lateral * cd * N_PER_LBF;
        const c = check(demand, capacity);
        if (c.ratio > 1) {
          failure = { member: m.id, ratio: c.ratio };
          fits = false;
          break;
        }
        checks.push({ member: m.id, area, ...c });
      }
      if (fits) {
        placed = { offset, checks };
        break;
      }
    }
    if (!placed) continue;
    const { checks, offset } = placed;
    checks.sort(
      (a, b) =>
        joint.members.findIndex((m) => m.id === a.member) -
        joint.members.findIndex((m) => m.id === b.member),
    );
    return {
      joint: joint.id,
      plate,
      count: PLATES_PER_JOINT,
      angle: Math.atan2(axis[1], axis[0]),
      offset,
      members: checks,
      steel,
      ratio: Math.max(0, ...checks.map((c) => c.ratio), ...steel.map((s) => s.ratio)),
      demo: catalog.demo,
    };
  }
  throw new EngineError(
    'no_plate_fits',
    `No plate in "${catalog.id}" fits joint ${joint.id}: ${failure.member} needs more than the largest plate gives`,
    { joint: joint.id, member: failure.member, ratio: failure.ratio },
  );
};
