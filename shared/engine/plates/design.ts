import { EngineError } from '../errors';
import { MM_PER_INCH, N_PER_LBF, TOLERANCE } from '../units';
import { memberContactRegions, regionAreaInPlate, type LocalMember, type Region } from './contact';
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

/**
 * Plate length axis: along the bottom chord (else the top chord, else the first member). Where
 * two such chords meet at an angle (a peak, a scissor's bottom-chord peak) the axis is square to
 * their bisector, d₁ − d₂, so the plate sits symmetric on the joint; on a straight chord that is
 * the chord's own line.
 */
const plateAxis = (joint: PlateJoint, options: PlateDesignOptions): Point => {
  if (options.orientation) return unit(options.orientation, `Plate at joint ${joint.id}`);
  const bottom = joint.members.filter((m) => m.role === 'bottomChord');
  const chords = bottom.length > 0 ? bottom : joint.members.filter((m) => m.role !== 'web');
  const first = chords[0] ?? joint.members[0];
  let [x, y] = unit(first.direction, `Member ${first.id}`);
  if (chords.length === 2) {
    const [x2, y2] = unit(chords[1].direction, `Member ${chords[1].id}`);
    const len = Math.hypot(x - x2, y - y2);
    if (len > TOLERANCE) [x, y] = [(x - x2) / len, (y - y2) / len];
  }
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

// Slides are tried on a fixed ¼ in grid (common practice: plates are placed to the nearest
// ¼ in). The grid does not depend on the plate, and a larger plate may slide at least as far,
// so every placement of a smaller plate is also one of a larger plate that contains it: a
// larger plate never gives a member less area.
const SLIDE_STEP_MM = 0.25 * MM_PER_INCH;
const CENTRED = [0];

/**
 * Where to try the plate centre across its length axis, mm: on the joint first, then slid
 * ¼ in at a time to either side, as far as the plate still covers the chord's depth (its edge
 * at the chord's far face), so the plate reaches further onto the members that need area
 * (common practice). Heels and splices stay centred: their steel checks assume the joint line
 * through the centre.
 */
const plateOffsets = (kind: PlateJoint['kind'], chordHalf: number, halfWidth: number) => {
  if (kind === 'heel' || kind === 'splice' || chordHalf <= 0) return CENTRED;
  const steps = Math.floor((halfWidth - chordHalf) / SLIDE_STEP_MM + TOLERANCE);
  if (steps <= 0) return CENTRED;
  const out = [0];
  for (let k = 1; k <= steps; k++) out.push(k * SLIDE_STEP_MM, -k * SLIDE_STEP_MM);
  return out;
};

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
    // Far enough for the corner of any plate slid by up to its own half width.
    const reach =
      Math.max(...plates.map((p) => Math.hypot(2 * p.width, p.length))) * (MM_PER_INCH / 2) + 1;
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

interface PlateFrame {
  halfLength: number;
  halfWidth: number;
  /** Slides to try, in order, mm. */
  offsets: readonly number[];
  endExclusion: number;
  edgeExclusion: number;
}

type Placement =
  { offset: number; checks: MemberPlateCheck[] } | { failure: { member: string; ratio: number } };

/**
 * Tooth holding of every member for one plate at the first slide that holds them all, or the
 * member that fails at the best slide tried (for the message when no plate fits).
 */
const placePlate = (
  joint: PlateJoint,
  local: LocalMember[],
  regions: Region[],
  order: readonly number[],
  plate: PlateSpec,
  cd: number,
  frame: PlateFrame,
): Placement => {
  const { halfLength, halfWidth, offsets } = frame;
  const capacityOf = (i: number, area: number) =>
    PLATES_PER_JOINT *
    area *
    (lateralValueAtAngle(plate, joint.members[i].loadToGrain ?? 0) / MM2_PER_IN2) *
    cd *
    N_PER_LBF;
  // Bounds over every slide at once: no slide gives a member more than the plate swept across
  // all of them covers, nor more than its band (depth less edge margins) out to the far corner.
  const slid = halfWidth + Math.max(...offsets.map(Math.abs));
  const reachInPlate = Math.hypot(halfLength, slid) - frame.endExclusion;
  for (const i of order) {
    const demand = Math.abs(joint.members[i].force);
    const band = 2 * Math.max(0, local[i].halfDepth - frame.edgeExclusion) * reachInPlate;
    if (demand > capacityOf(i, Math.min(4 * halfLength * halfWidth, Math.max(0, band)))) {
      return { failure: { member: joint.members[i].id, ratio: Infinity } };
    }
    const swept = capacityOf(i, regionAreaInPlate(regions[i], halfLength, slid));
    if (demand > swept) return { failure: { member: joint.members[i].id, ratio: demand / swept } };
  }
  let best = { member: '', ratio: Infinity };
  for (const offset of offsets) {
    const checks: MemberPlateCheck[] = [];
    for (const i of order) {
      const area = regionAreaInPlate(regions[i], halfLength, halfWidth, offset);
      const c = check(Math.abs(joint.members[i].force), capacityOf(i, area));
      if (c.ratio > 1) {
        if (c.ratio < best.ratio) best = { member: joint.members[i].id, ratio: c.ratio };
        break;
      }
      checks.push({ member: joint.members[i].id, area, ...c });
    }
    if (checks.length === order.length) return { offset, checks };
  }
  return { failure: best };
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
    const fit = placePlate(joint, local, regions, order, plate, cd, {
      halfLength,
      halfWidth,
      offsets: plateOffsets(joint.kind, chordHalf, halfWidth),
      endExclusion,
      edgeExclusion,
    });
    if ('failure' in fit) {
      failure = fit.failure;
      continue;
    }
    const { checks, offset } = fit;
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
