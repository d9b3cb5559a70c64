import { EngineError } from '../errors';
import { MM_PER_INCH, TOLERANCE } from '../units';
import { memberContactRegions, regionAreaInPlate, type LocalMember, type Region } from './contact';
import type { Point } from './geometry';
import { governingTooth, toothCasesOf, type ToothCheck } from './teeth';
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

const ratioOf = (demand: number, capacity: number) =>
  demand === 0 ? 0 : capacity > 0 ? demand / capacity : Infinity;

// Slides are tried on a fixed ¼ in grid (common practice: plates are placed to the nearest
// ¼ in). The grid does not depend on the plate, and a larger plate may slide at least as far,
// so every placement of a smaller plate is also one of a larger plate that contains it: a
// larger plate never gives a member less area.
const SLIDE_STEP_MM = 0.25 * MM_PER_INCH;

// Relative slack before the summed-area bound drops a plate: a plate that holds its members
// with areas summing to its own (to rounding) must still be tried.
const AREA_SLACK = 1e-9;

/**
 * How many grid steps the plate may slide across its length axis to either side: as far as it
 * still covers the chord's depth (its edge at the chord's far face), so it reaches further onto
 * the members that need area (common practice). Centred first; otherwise the slide nearest the
 * centre that holds every member. Heels and splices stay centred: their steel checks assume
 * the joint line through the centre.
 */
const slideSteps = (kind: PlateJoint['kind'], chordHalf: number, halfWidth: number): number => {
  if (kind === 'heel' || kind === 'splice' || chordHalf <= 0) return 0;
  return Math.max(0, Math.floor((halfWidth - chordHalf) / SLIDE_STEP_MM + TOLERANCE));
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

interface PlateFrame {
  /** Grid steps the plate may slide to either side (0: it stays centred). */
  steps: number;
  endExclusion: number;
  edgeExclusion: number;
}

/** A plate placement that holds every member. */
interface Fit {
  offset: number;
  checks: MemberPlateCheck[];
}
type Placement = Fit | { failure: { member: string; ratio: number } };

/** One plate tried at one joint: what every step of its placement needs. */
interface Trial {
  joint: PlateJoint;
  regions: Region[];
  /** Member indices in the order to check them; the member that fails moves to the front. */
  order: number[];
  plate: PlateSpec;
  /** Tooth capacity per mm² of contact, both faces, N/mm², per member (its governing case). */
  perArea: number[];
  /** Tooth demand per member, N: the force of its governing case on this plate. */
  demand: number[];
  halfLength: number;
  halfWidth: number;
  /** Per member: its angles, lateral value (MPa) and heel factor, for the report. */
  angles: Omit<MemberPlateCheck, 'member' | 'area' | 'demand' | 'capacity' | 'ratio'>[];
  /** The member failing by the least at an exact slide, for the message. */
  best: { i: number; ratio: number };
}

// Module-level functions, not closures: this runs for every plate of every joint per keystroke.

const capacityOf = (t: Trial, i: number, area: number): number => area * t.perArea[i];

/** Moves order[k] to the front (no spread: this runs for most plates tried). */
const toFront = (order: number[], k: number) => {
  const i = order[k];
  for (let j = k; j > 0; j--) order[j] = order[j - 1];
  order[0] = i;
};

/** Moves member i to the front of the check order and reports it as the plate's failure. */
const failing = (t: Trial, i: number, ratio: number): Placement => {
  toFront(t.order, t.order.indexOf(i));
  return { failure: { member: t.joint.members[i].id, ratio } };
};

/**
 * Every member's check at one slide; or, with `spread` > 0, a bound for every slide within
 * ±spread of `offset` (the plate swept across them: no slide there gives any member more).
 * Undefined as soon as one member fails.
 */
const checksAt = (t: Trial, offset: number, spread: number): MemberPlateCheck[] | undefined => {
  const checks: MemberPlateCheck[] = [];
  for (let k = 0; k < t.order.length; k++) {
    const i = t.order[k];
    const area = regionAreaInPlate(t.regions[i], t.halfLength, t.halfWidth + spread, offset);
    const demand = t.demand[i];
    const capacity = capacityOf(t, i, area);
    const ratio = ratioOf(demand, capacity);
    if (ratio > 1) {
      if (spread === 0 && ratio < t.best.ratio) t.best = { i, ratio };
      if (k > 0) toFront(t.order, k);
      return undefined;
    }
    // Every field written out: spreading the check and the angles in cost more than the rest.
    const a = t.angles[i];
    checks.push({
      member: t.joint.members[i].id,
      area,
      demand,
      capacity,
      ratio,
      plateToLoad: a.plateToLoad,
      loadToGrain: a.loadToGrain,
      lateralValue: a.lateralValue,
      heelFactor: a.heelFactor,
    });
  }
  return checks;
};

/**
 * Slides of k1…k2 grid steps to one side: the one nearest the centre that holds every member,
 * found by halving the range wherever its swept bound still holds (branch and bound).
 */
const nearestSlide = (t: Trial, side: number, k1: number, k2: number): Fit | undefined => {
  if (k1 > k2) return undefined;
  const mid = ((k1 + k2) / 2) * SLIDE_STEP_MM * side;
  if (k1 === k2) {
    const checks = checksAt(t, mid, 0);
    return checks ? { offset: mid, checks } : undefined;
  }
  if (!checksAt(t, mid, ((k2 - k1) / 2) * SLIDE_STEP_MM)) return undefined;
  const m = Math.floor((k1 + k2) / 2);
  return nearestSlide(t, side, k1, m) ?? nearestSlide(t, side, m + 1, k2);
};

/**
 * Tooth holding of every member for one plate, centred or at the slide nearest the centre
 * that holds them all, or the member that fails at the best slide tried (for the message when
 * no plate fits). `exact` (the catalog's last plate, whose failure is reported) skips the
 * bounds that only tell that some member fails, not which fails by the least.
 */
const placePlate = (
  t: Trial,
  local: LocalMember[],
  frame: PlateFrame,
  exact: boolean,
): Placement => {
  const { steps } = frame;
  const plateArea = 4 * t.halfLength * t.halfWidth;
  // Cheap bound, for every slide at once: a member's band (its depth less the edge margins)
  // holds no more than out to the far corner of the plate slid furthest, nor the whole plate.
  const reachInPlate =
    Math.hypot(t.halfLength, t.halfWidth + steps * SLIDE_STEP_MM) - frame.endExclusion;
  let needed = 0;
  for (const i of t.order) {
    const band = 2 * Math.max(0, local[i].halfDepth - frame.edgeExclusion) * reachInPlate;
    const area = Math.min(plateArea, Math.max(0, band));
    if (t.demand[i] > capacityOf(t, i, area)) {
      return failing(t, i, Infinity);
    }
    if (t.demand[i] > 0) needed += t.demand[i] / t.perArea[i];
  }
  if (!exact) {
    // The members' contact regions are disjoint, so together they hold no more than the plate.
    if (needed > plateArea * (1 + AREA_SLACK)) return failing(t, t.order[0], Infinity);
    // No slide within ±steps gives any member more than the plate swept across all of them.
    if (steps > 0 && !checksAt(t, 0, steps * SLIDE_STEP_MM))
      return failing(t, t.order[0], Infinity);
  }
  const centred = checksAt(t, 0, 0);
  if (centred) return { offset: 0, checks: centred };
  const up = nearestSlide(t, 1, 1, steps);
  const nearer = up ? Math.round(Math.abs(up.offset) / SLIDE_STEP_MM) - 1 : steps;
  return nearestSlide(t, -1, 1, nearer) ?? up ?? failing(t, t.best.i, t.best.ratio);
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
  const kept = given.members.flatMap((m, i) => (m.partOf === undefined ? [i] : []));
  const joint =
    kept.length < given.members.length
      ? { ...given, members: kept.map((i) => given.members[i]) }
      : given;
  const axis = plateAxis(joint, options);
  const allLocal: LocalMember[] = given.members.map((m) => {
    const [x, y] = unit(m.direction, `Member ${m.id}`);
    return {
      role: m.role,
      direction: [x * axis[0] + y * axis[1], -x * axis[1] + y * axis[0]],
      halfDepth: m.depth / 2,
      ...(m.length !== undefined && { length: m.length }),
    };
  });
  const { plates, reach } = sortedPlates(catalog);
  const chordHalf = chordHalfDepth(allLocal);
  const endExclusion = options.endExclusion ?? END_EXCLUSION_MM;
  const edgeExclusion = options.edgeExclusion ?? EDGE_EXCLUSION_MM;
  const allRegions = memberContactRegions(allLocal, { endExclusion, edgeExclusion, reach });
  const regions = kept.map((i) =>
    allRegions[i].concat(
      ...given.members.flatMap((p, j) => (p.partOf === given.members[i].id ? [allRegions[j]] : [])),
    ),
  );
  const local = kept.map((i) => allLocal[i]);
  // Most loaded members first: they fail soonest, so a too-small plate is dropped early.
  const teeth = joint.members.map((m, i) => toothCasesOf(joint, m, local[i].direction));
  const largest = teeth.map((cases) => Math.max(...cases.map((c) => c.force)));
  const order: number[] = joint.members.map((_, i) => i).sort((a, b) => largest[b] - largest[a]);
  let failure = { member: '', ratio: 0 };
  const sections = steelSections(joint.kind, local, joint.members);

  // Per set of lateral values: each member's governing tooth case, its demand and capacity per area.
  const toothOf: { angles: ToothCheck[]; demand: number[]; perArea: number[] }[] = [];
  const slides = new Map<number, number>();
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
    let steps = slides.get(halfWidth);
    if (steps === undefined)
      slides.set(halfWidth, (steps = slideSteps(joint.kind, chordHalf, halfWidth)));
    // The steel is checked first on the last plate only, whose failure is the one reported;
    // elsewhere after the teeth, which drop most plates for less work (the same plate is chosen).
    const steelFirst = last ? steelChecks(sections, plate, halfLength, halfWidth) : undefined;
    const badSteelFirst = steelFirst?.find((s) => s.ratio > 1);
    if (badSteelFirst) {
      failure = steelFailure(badSteelFirst);
      continue;
    }
    const trial: Trial = {
      joint,
      regions,
      order,
      plate,
      perArea: tooth.perArea,
      demand: tooth.demand,
      angles: tooth.angles,
      halfLength,
      halfWidth,
      best: { i: order[0], ratio: Infinity },
    };
    const fit = placePlate(trial, local, { steps, endExclusion, edgeExclusion }, last);
    if ('failure' in fit) {
      failure = fit.failure;
      continue;
    }
    const steel = steelFirst ?? steelChecks(sections, plate, halfLength, halfWidth);
    const badSteel = steel.find((s) => s.ratio > 1);
    if (badSteel) {
      failure = steelFailure(badSteel);
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
