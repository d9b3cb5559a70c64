import { EngineError } from '../errors';
import { MM_PER_INCH, TOLERANCE } from '../units';
import { memberContactRegions, type LocalMember, type Region } from './contact';
import { placePlate, slideSteps, type PlateFrame, type Trial } from './placement';
import type { Point } from './geometry';
import { governingTooth, toothCasesOf, type ToothCase, type ToothCheck } from './teeth';
import { steelChecks, steelSections } from './steel';
import type {
  Direction,
  JointPlateDesign,
  MemberPlateCheck,
  PlateCatalog,
  PlateDesignOptions,
  PlateJoint,
  PlateSpec,
  SteelCheck,
} from './types';

// ½ in end and ¼ in edge distance without tooth credit: common practice (ANSI/TPI 1 wording
// not verified, see references §4).
const END_EXCLUSION_MM = 0.5 * MM_PER_INCH;
const EDGE_EXCLUSION_MM = 0.25 * MM_PER_INCH;
const PLATES_PER_JOINT = 2;

/** Unit vector of d; the message names `what` and `id` (built only when it is thrown). */
const unit = (d: Direction, what: string, id: string): Point => {
  const len = Math.hypot(d.x, d.y);
  if (!Number.isFinite(len) || len < TOLERANCE) {
    throw new EngineError('invalid', `${what} ${id} needs a direction`, { direction: d });
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
  if (options.orientation) return unit(options.orientation, 'Plate at joint', joint.id);
  const bottom = joint.members.filter((m) => m.role === 'bottomChord');
  const chords = bottom.length > 0 ? bottom : joint.members.filter((m) => m.role !== 'web');
  const first = chords[0] ?? joint.members[0];
  let [x, y] = unit(first.direction, 'Member', first.id);
  if (chords.length === 2) {
    const [x2, y2] = unit(chords[1].direction, 'Member', chords[1].id);
    const len = Math.hypot(x - x2, y - y2);
    if (len > TOLERANCE) [x, y] = [(x - x2) / len, (y - y2) / len];
  }
  // A plate is symmetric: keep its axis pointing right (or up) so the reported angle is stable.
  return x < -TOLERANCE || (Math.abs(x) <= TOLERANCE && y < 0) ? [-x, -y] : [x, y];
};

/** Largest half depth of the chords at a joint, mm (0 when only webs meet). */
const chordHalfDepth = (local: LocalMember[]) => {
  let half = 0;
  for (const m of local) if (m.role !== 'web' && m.halfDepth > half) half = m.halfDepth;
  return half;
};

/** A catalog plate with the numbers every trial needs, worked out once per catalog. */
interface CatalogPlate {
  spec: PlateSpec;
  halfLength: number;
  halfWidth: number;
  /** Index of its set of four lateral values (tooth values depend on the plate only through it). */
  lateralSet: number;
}

// Each catalog sorted once (catalogs are immutable values), with the reach its largest plate needs.
const sortedCatalogs = new WeakMap<PlateCatalog, { plates: CatalogPlate[]; reach: number }>();
const sortedPlates = (catalog: PlateCatalog) => {
  let entry = sortedCatalogs.get(catalog);
  if (!entry) {
    const specs = [...catalog.plates].sort(byAreaThenGauge);
    // Far enough for the corner of any plate slid by up to its own half width.
    const reach =
      Math.max(...specs.map((p) => Math.hypot(2 * p.width, p.length))) * (MM_PER_INCH / 2) + 1;
    const sets = new Map<string, number>();
    const plates = specs.map((spec) => {
      const lv = spec.lateralValue;
      const key = `${lv.aa}/${lv.ea}/${lv.ae}/${lv.ee}`;
      let lateralSet = sets.get(key);
      if (lateralSet === undefined) sets.set(key, (lateralSet = sets.size));
      return {
        spec,
        halfLength: (spec.length * MM_PER_INCH) / 2,
        halfWidth: (spec.width * MM_PER_INCH) / 2,
        lateralSet,
      };
    });
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

/** How a failing steel section is named in a message. */
const LINE_TEXT: Record<SteelCheck['line'], string> = {
  heel: 'across the heel line',
  splice: 'across the splice',
  chordFace: "across the chord's face",
  joint: 'across the joint line',
};

const steelFailure = (s: SteelCheck) => ({
  member: `${s.member} (steel ${s.kind} ${LINE_TEXT[s.line]})`,
  ratio: s.ratio,
});

/** Largest ratio of the tooth and steel checks, at least 0 (as Math.max over all of them). */
const largestRatio = (checks: MemberPlateCheck[], steel: SteelCheck[]) => {
  let r = 0;
  for (const c of checks) r = Math.max(r, c.ratio);
  for (const s of steel) r = Math.max(r, s.ratio);
  return r;
};

/** The check with the largest ratio (teeth win a tie: they are listed first). */
const governing = (
  checks: MemberPlateCheck[],
  steel: SteelCheck[],
): JointPlateDesign['governs'] => {
  let g: JointPlateDesign['governs'] = { check: 'teeth', member: '', ratio: -1 };
  for (const c of checks)
    if (c.ratio > g.ratio) g = { check: 'teeth', member: c.member, ratio: c.ratio };
  for (const s of steel)
    if (s.ratio > g.ratio) g = { check: s.kind, member: s.member, ratio: s.ratio };
  return g;
};

/**
 * Chooses the plate for one joint: the smallest catalog plate (by area, then gauge) that, on
 * both faces, holds every member's force by tooth holding, 2 · area · lateral value · CD ≥ |F|
 * (the value by the plate-to-load and load-to-grain angles, `lateralValue`; the top chord at a
 * heel reduced by `heelReduction`), and whose steel carries the full forces across every section
 * of `steelSections` in tension, shear and both combined. The plate is
 * aligned with the bottom chord (or the spliced chord; square to the bisector where two chords
 * meet at an angle), centred on the joint or, at a panel point, slid across its axis. Throws
 * EngineError `no_plate_fits` naming the joint and the member (or steel check) that fails on the
 * largest plate.
 */
export const designJointPlate = (
  given: PlateJoint,
  catalog: PlateCatalog,
  options: PlateDesignOptions = {},
): JointPlateDesign => {
  checkJointInput(given, catalog);
  const cd = options.cd ?? 1;
  // Board parts (an overhang beyond a heel) lend their wood to the member they continue and
  // leave the checks; everything but the contact regions sees the members proper only.
  // Plain loops, no spreads: this runs for every joint of every design.
  const kept: number[] = [];
  for (let i = 0; i < given.members.length; i++) {
    if (given.members[i].partOf === undefined) kept.push(i);
  }
  const joint =
    kept.length < given.members.length
      ? { ...given, members: kept.map((i) => given.members[i]) }
      : given;
  const axis = plateAxis(joint, options);
  const allLocal: LocalMember[] = [];
  for (const m of given.members) {
    const [x, y] = unit(m.direction, 'Member', m.id);
    const lm: LocalMember = {
      role: m.role,
      direction: [x * axis[0] + y * axis[1], -x * axis[1] + y * axis[0]],
      halfDepth: m.depth / 2,
    };
    if (m.length !== undefined) lm.length = m.length;
    allLocal.push(lm);
  }
  const { plates, reach } = sortedPlates(catalog);
  const chordHalf = chordHalfDepth(allLocal);
  const endExclusion = options.endExclusion ?? END_EXCLUSION_MM;
  const edgeExclusion = options.edgeExclusion ?? EDGE_EXCLUSION_MM;
  const allRegions = memberContactRegions(allLocal, { endExclusion, edgeExclusion, reach });
  const regions: Region[] = [];
  const local: LocalMember[] = [];
  for (const i of kept) {
    let region = allRegions[i];
    for (let j = 0; j < given.members.length; j++) {
      if (given.members[j].partOf === given.members[i].id) region = region.concat(allRegions[j]);
    }
    regions.push(region);
    local.push(allLocal[i]);
  }
  // Most loaded members first: they fail soonest, so a too-small plate is dropped early.
  const teeth: ToothCase[][] = [];
  const largest: number[] = [];
  const order: number[] = [];
  for (let i = 0; i < joint.members.length; i++) {
    const cases = toothCasesOf(joint, joint.members[i], local[i].direction);
    let most = -Infinity;
    for (const c of cases) if (c.force > most) most = c.force;
    teeth.push(cases);
    largest.push(most);
    order.push(i);
  }
  order.sort((a, b) => largest[b] - largest[a]);
  const mostLoadedFirst = order.slice();
  let failure = { member: '', ratio: 0 };
  const sections = steelSections(joint.kind, local, joint.members);

  // Per set of lateral values: each member's governing tooth case, its demand and capacity per area.
  const toothOf: { angles: ToothCheck[]; demand: number[]; perArea: number[] }[] = [];
  // One trial and one frame per joint, refilled for each plate: most plates are dropped at once.
  const trial: Trial = {
    joint,
    regions,
    order,
    plate: plates[0].spec,
    perArea: [],
    demand: [],
    angles: [],
    halfLength: 0,
    halfWidth: 0,
    bestI: order[0],
    bestRatio: Infinity,
    failMember: '',
    failRatio: 0,
  };
  const frame: PlateFrame = { steps: 0, endExclusion, edgeExclusion };
  for (let p = 0; p < plates.length; p++) {
    const { spec: plate, halfLength, halfWidth, lateralSet } = plates[p];
    const last = p === plates.length - 1;
    let tooth = toothOf[lateralSet];
    if (!tooth) {
      const governs = teeth.map((cases) => governingTooth(plate, cases));
      const angles = governs.map((g) => g.angles);
      tooth = {
        angles,
        demand: governs.map((g) => g.demand),
        perArea: angles.map((v) => PLATES_PER_JOINT * v.lateralValue * v.heelFactor * cd),
      };
      toothOf[lateralSet] = tooth;
    }
    trial.plate = plate;
    trial.perArea = tooth.perArea;
    trial.demand = tooth.demand;
    trial.angles = tooth.angles;
    trial.halfLength = halfLength;
    trial.halfWidth = halfWidth;
    trial.bestI = order[0];
    trial.bestRatio = Infinity;
    frame.steps = slideSteps(joint.kind, chordHalf, halfWidth);
    // The last plate's failure is the one reported: checked in the joint's own order, so the
    // member named does not depend on which smaller plates the search dropped, and how.
    if (last) for (let k = 0; k < order.length; k++) order[k] = mostLoadedFirst[k];
    const fit = placePlate(trial, local, frame, last);
    // The steel only where the teeth hold (they drop most plates for less work), and on the last
    // plate, whose steel failure is reported before its teeth's.
    const steel = fit || last ? steelChecks(sections, plate, halfLength, halfWidth) : undefined;
    const badSteel = steel?.find((s) => s.ratio > 1);
    if (badSteel) {
      failure = steelFailure(badSteel);
      continue;
    }
    if (!fit || !steel) {
      if (last) failure = { member: trial.failMember, ratio: trial.failRatio };
      continue;
    }
    const { checks, offset } = fit;
    return {
      joint: joint.id,
      plate,
      count: PLATES_PER_JOINT,
      angle: Math.atan2(axis[1], axis[0]),
      offset,
      members: checks,
      steel,
      ratio: largestRatio(checks, steel),
      governs: governing(checks, steel),
      demo: catalog.demo,
    };
  }
  throw new EngineError(
    'no_plate_fits',
    `No plate in "${catalog.id}" fits joint ${joint.id}: ${failure.member} needs more than the largest plate gives`,
    { joint: joint.id, member: failure.member, ratio: failure.ratio },
  );
};
