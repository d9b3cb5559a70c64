import type { EngineDesignInput } from './input';
import { lumberLabel } from '../lumber';
import { checkBearing } from '../members/bearing';
import { DEMO_PLATE_CATALOG } from '../plates';
import { generateProfile } from '../profiles';
import type { TrussProfile } from '../profiles/types';
import { KPA_PER_PSF } from '../units';
import { ENGINE_VERSION } from '../version';
import {
  chordShearChecks,
  KCR_SEASONED_DRY,
  upliftChecks,
  upliftWarning,
  type AdditionalChecks,
} from './additionalChecks';
import { bracingText, chordBracingNote } from './bracing';
import { DESIGN_CAUTIONS } from './cautions';
import { designLoads } from './combinedLoads';
import type { MemberDemands } from './demands';
import type { Sized } from './frameSizing';
import { girderNotes } from './girder';
import { designPlates } from './jointPlates';
import { plyFastening } from './plyFastening';
import { sizeForService } from './serviceSizing';
import type { GroupChoice, SizingGroup } from './sizing';
import type {
  DesignBearing,
  DesignCombination,
  DesignMember,
  DesignOptions,
  DesignPiece,
  DesignReaction,
  TrussDesign,
} from './types';

/**
 * Tallest heel analysed as a standard heel: 8 in (common practice). Such a heel is modelled with
 * the pointed line-model heel at the bearing; taller heels get the heel post and heel webs.
 */
export const STANDARD_HEEL_MAX_MM = 8 * 25.4;

function designMembers(
  profile: TrussProfile,
  demands: MemberDemands,
  combos: DesignCombination[],
  sized: Sized,
  input: EngineDesignInput,
): DesignMember[] {
  const pieceOf = new Map<string, string>();
  for (const p of profile.pieces) for (const id of p.members) pieceOf.set(id, p.id);
  const m = profile.members.length;
  return profile.members.map((mb, k) => {
    const forces = combos.map((_, i) => demands.axial[i * m + k]);
    let maxMoment = 0;
    let maxShear = 0;
    for (let i = 0; i < combos.length; i++) {
      maxMoment = Math.max(maxMoment, demands.moment[i * m + k]);
      maxShear = Math.max(maxShear, demands.shear[i * m + k]);
    }
    const v = sized.verdictOf[k];
    return {
      id: mb.id,
      from: mb.from,
      to: mb.to,
      role: mb.role,
      piece: pieceOf.get(mb.id)!,
      length: mb.length,
      lumber: sized.lumberOf[k],
      braced: sized.bracedOf[k],
      forces,
      maxTension: Math.max(0, ...forces),
      maxCompression: Math.max(0, ...forces.map((f) => -f)),
      maxMoment,
      maxShear,
      csi: v.csi,
      governingCombination: combos[v.combination].name,
      governingCheck: v.governing,
      bracing: bracingText(mb, sized.bracedOf[k], sized.lumberOf[k], input),
      ...(v.note && { note: v.note }),
    };
  });
}

function designPieces(profile: TrussProfile, sized: Sized): DesignPiece[] {
  const index = new Map(profile.members.map((mb, k) => [mb.id, k]));
  const failing = new Set(
    sized.groups.filter((g) => !g.choice.pass).flatMap((g) => g.group.pieces),
  );
  return profile.pieces.map((p) => {
    const ks = p.members.map((id) => index.get(id)!);
    return {
      mark: p.id,
      role: p.role,
      lumber: sized.lumberOf[ks[0]],
      length: p.length,
      members: p.members,
      splices: p.spliceAt ?? [],
      csi: Math.max(...ks.map((k) => sized.verdictOf[k].csi)),
      failing: failing.has(p),
    };
  });
}

function designReactions(demands: MemberDemands): DesignReaction[] {
  const s = demands.supports.length;
  return demands.supports.map((joint, j) => {
    const vertical = Array.from({ length: demands.combinations }, (_, i) => demands.ry[i * s + j]);
    const horizontal = Array.from(
      { length: demands.combinations },
      (_, i) => demands.rx[i * s + j],
    );
    return {
      joint,
      maxDown: Math.max(0, ...vertical),
      maxUp: Math.max(0, ...vertical.map((r) => -r)),
      maxHorizontal: Math.max(0, ...horizontal.map(Math.abs)),
      vertical,
      horizontal,
    };
  });
}

function designBearings(
  profile: TrussProfile,
  reactions: DesignReaction[],
  sized: Sized,
  input: EngineDesignInput,
): DesignBearing[] {
  return reactions.map((r) => {
    const k = profile.members.findIndex(
      (mb) => mb.role === 'bottomChord' && (mb.from === r.joint || mb.to === r.joint),
    );
    const result = checkBearing({
      lumberId: sized.lumberOf[k],
      plies: input.plies,
      reaction: r.maxDown,
      bearingLength: input.bearingWidth,
    });
    return {
      joint: r.joint,
      lumber: sized.lumberOf[k],
      width: input.bearingWidth,
      reaction: r.maxDown,
      stress: result.stress,
      capacity: result.fcPerpPrime,
      ratio: result.ratio,
      pass: result.ratio <= 1,
    };
  });
}

/** The readable reason a sizing group fails, e.g. "Top chord: no allowed lumber passes; …". */
function sizingWarning(
  group: SizingGroup,
  choice: GroupChoice,
  combos: DesignCombination[],
  fixed: boolean,
) {
  const what = `${lumberLabelSafe(choice.lumber)}${choice.braced ? ' with a mid-length brace' : ''}`;
  const why = `CSI ${choice.worst.csi.toFixed(2)} (${choice.worst.governing}, ${combos[choice.worst.combination].name})`;
  return fixed
    ? `${group.label}: the required ${what} does not pass at ${why}.`
    : `${group.label}: no allowed lumber passes; best is ${what} at ${why}.`;
}

const lumberLabelSafe = (id: string) => {
  try {
    return lumberLabel(id);
  } catch {
    return id;
  }
};

/**
 * Designs one truss (SI in and out; pure): profile, loads and ASD combinations, member forces,
 * NDS member checks with auto-sizing per piece, bearing, deflection and plates. A design that
 * merely fails comes back with `ok: false` and the reasons in `warnings`; only a request that
 * cannot be designed at all throws (EngineError `invalid`, or `geometry` from the profile).
 */
export function designTruss(input: EngineDesignInput, options: DesignOptions = {}): TrussDesign {
  const notes: string[] = [];
  const warnings: string[] = [];
  const requestedHeel = input.profile.heelHeight;
  const standardHeel = requestedHeel > 0 && requestedHeel <= STANDARD_HEEL_MAX_MM;
  const analysedHeel = standardHeel ? 0 : requestedHeel;
  if (standardHeel) {
    notes.push(
      'Standard heel (8 in. or less): analysed with the pointed line-model heel at the bearing.',
    );
  }
  if (analysedHeel > 0) {
    notes.push(
      "Raised heel: a heel post at the bearing with the top chord bearing over it, a heel web from the bearing up to the top chord and a web down to the first bottom-chord panel point; the bottom chord's end panel ties the heel.",
    );
  }
  const profile = generateProfile({ ...input.profile, heelHeight: analysedHeel });
  const loads = designLoads(input, profile, options.edition ?? '7-16');
  const combos: DesignCombination[] = loads.combinations.map((c) => ({ name: c.name, cd: c.cd }));
  const webIds = new Set(profile.members.filter((mb) => mb.role === 'web').map((mb) => mb.id));
  const unknownBraces = input.webBraces.filter((id) => !webIds.has(id));
  if (unknownBraces.length > 0) {
    warnings.push(`Web brace ignored, no such web in this truss: ${unknownBraces.join(', ')}.`);
  }
  const { demands, ctx, sized, passes, settled, state, raised } = sizeForService(
    profile,
    loads.combinations,
    loads.cases,
    input,
    options,
  );
  if (!settled) {
    warnings.push(
      `Sizing did not settle in ${passes} frame analyses: the last choice is analysed and ` +
        'checked as it is; review the chord and web sizes.',
    );
  }
  for (const { group, choice } of sized.groups) {
    if (choice.pass) continue;
    const key = group.role === 'web' ? 'webs' : group.role;
    warnings.push(sizingWarning(group, choice, combos, input.lumber[key]?.length === 1));
  }

  const members = designMembers(profile, demands, combos, sized, input);
  const pieces = designPieces(profile, sized);
  const reactions = designReactions(demands);
  const bearing = designBearings(profile, reactions, sized, input);
  for (const b of bearing.filter((x) => !x.pass)) {
    warnings.push(
      `Bearing at ${b.joint}: ratio ${b.ratio.toFixed(2)} on a ${lumberLabelSafe(b.lumber)} ` +
        'bottom chord; use a wider bearing or a bearing block.',
    );
  }
  const deflection = state.deflection;
  for (const d of [deflection.live, deflection.total]) {
    if (d && !d.pass) {
      warnings.push(
        `Deflection under ${d.load}: span/${Math.round(d.ratio)} at ${d.joint}, limit span/${d.limit}.`,
      );
    }
  }
  const catalog = options.plateCatalog ?? DEMO_PLATE_CATALOG;
  const plates = designPlates(profile, demands, ctx.cds, sized.lumberOf, catalog, input.plies);
  const plyConnections = plyFastening(
    profile,
    sized.lumberOf,
    input.plies,
    input.pointLoads ?? [],
    loads.combinations,
  );
  for (const c of plyConnections.filter((x) => !x.pass)) {
    warnings.push(`Ply fastening fails: ${c.text}`);
  }
  for (const p of plates.filter((x) => !x.ok)) warnings.push(`Plate at ${p.joint}: ${p.message}.`);
  const additional: AdditionalChecks = {
    shear: chordShearChecks(profile, demands, combos, sized.lumberOf, input.plies),
    uplift: upliftChecks(reactions, combos),
    longTermDeflection: state.longTerm,
    deflection: state.service,
    ...(raised.length > 0 && { deflectionSizing: raised }),
  };
  const service = additional.deflection;
  const serviceChecks = [
    service.midPanel.live,
    service.midPanel.total,
    service.overhangTip?.live,
    service.overhangTip?.total,
  ].filter((d) => d !== undefined);
  for (const d of serviceChecks.filter((x) => !x.pass)) {
    const of = d.joint.includes('tip') ? 'twice the overhang' : 'span';
    warnings.push(
      `Deflection under ${d.load} at the ${d.joint}: ${of}/${Math.round(d.ratio)}, limit ${of}/${d.limit}.`,
    );
  }
  for (const s of additional.shear.filter((x) => !x.pass)) {
    warnings.push(
      `Shear in ${s.member}: fv/Fv′ = ${s.ratio.toFixed(2)} under ${s.combination} (NDS 2018 §3.4.2).`,
    );
  }
  warnings.push(...additional.uplift.map(upliftWarning));
  const creep = additional.longTermDeflection;
  if (!creep.pass) {
    warnings.push(
      `Long-term deflection under ${creep.load} (NDS 2018 §3.5.2): span/${Math.round(creep.ratio)} at ${creep.joint}, limit span/${creep.limit}.`,
    );
  }

  notes.push(
    `Load combinations: ASCE ${loads.edition} §2.4.1 allowable stress design, each with the CD of its shortest load.`,
    ...(loads.snow !== undefined
      ? [
          `Roof snow ps = ${loads.snow.toFixed(3)} kPa (${(loads.snow / KPA_PER_PSF).toFixed(1)} psf) from the ground snow load, ASCE ${loads.edition}.`,
        ]
      : []),
    ...loads.notes,
    chordBracingNote(input),
    options.amplifyPanelPointMoment
      ? 'Panel-point moments are checked with the NDS 2018 §3.9.2 amplifier 1/(1 − fc/FcE1) as well (the stricter plant setting).'
      : 'Panel-point moments are checked without the NDS 2018 §3.9.2 amplifier (common practice: the chord is held in plane at a panel point); span moments are amplified. A stricter plant setting amplifies both.',
    'Forces, moments and shears from a plane frame (direct stiffness method, each member with its E, A and I): chords continuous through the panel points within each piece of lumber and hinged at splices, at the peak and at the heel, webs pinned at both ends, roof and ceiling loads as line loads on the chord members (live and snow on the horizontal projection, dead along the member). Members are checked with the larger of the span and panel-point moments.',
    ...(profile.overhangs.some((o) => o.horizontal > 0)
      ? [
          "Heel with an overhang: the top chord is one piece of lumber from the overhang's tip through the heel into the first panel, so it is continuous there and the overhang's moment bends the first top-chord panel and turns the heel (which moves the tip); the bottom chord is pinned at the heel, since the heel plate joins the chords for their forces and is not designed for moment (common practice). Counting no restraint from the bottom chord gives the heel its largest rotation: it errs on the safe side for the top chord's heel moment and for a tip whose movement the heel's rotation governs (on a long first panel the panel's sag turns the heel and lifts the tip).",
        ]
      : []),
    `Frame analysed ${passes === 1 ? 'once' : `${passes} times`}, until the lumber it was analysed with is the lumber sizing chose (stiffness sets the force distribution).`,
    'Sizing counts every deflection check (panel points, long-term, mid-panel, overhang tip): when the lumber that passes strength fails one, the chord whose next stiffer allowed lumber cuts the excess most is raised and the truss sized again; webs are not raised for deflection.',
    ...[...new Map(raised.map((r) => [r.group, r])).values()].map(
      (r) =>
        `${r.group}: at least ${lumberLabelSafe(r.lumber)} for deflection (governed by ${r.check}; a cheaper lumber passes strength only).`,
    ),
    ...(input.plies >= 2
      ? []
      : [
          ctx.repetitive
            ? 'Repetitive member factor Cr = 1.15 on chord bending (spacing 24 in. o.c. or less).'
            : 'No repetitive member factor: spacing over 24 in. o.c.',
        ]),
    'Deflection of the bottom-chord panel points from the same frame (axial and bending strain; no joint slip or creep).',
    "Deflection at mid-length of each bottom-chord panel: the panel points' drop plus the panel's own bending (Euler–Bernoulli, end moments from the frame); at an overhang tip: the heel's drop and rotation plus the cantilever's bending, against twice the overhang's run over the limit (IBC Table 1604.3 footnote for cantilevers, from memory).",
    ...(service.rollerMovement
      ? [
          `Roller bearing ${service.rollerMovement.joint} moves ${(service.rollerMovement.movement / 25.4).toFixed(2)} in (${service.rollerMovement.movement.toFixed(1)} mm) ${service.rollerMovement.movement >= 0 ? 'outward' : 'inward'} relative to the pinned bearing under ${service.rollerMovement.load}: the bearing must let it slide that far, or the walls take the thrust.`,
        ]
      : []),
    `Long-term deflection ${KCR_SEASONED_DRY}·Δ(dead) + Δ(live) against the total-load limit: creep factor Kcr = ${KCR_SEASONED_DRY} for seasoned lumber in dry service (NDS 2018 §3.5.2).`,
    "Chord shear fv = 1.5V/A ≤ Fv′ = Fv·CD (NDS 2018 §3.4.2) with V the largest shear along each chord member in the frame, taken at the panel point (loads within d of it are not neglected), and on the member that carries an overhang at least the overhang's root shear at the bearing (its whole load square to the chord); it counts in the member's CSI.",
    'Plates: tooth holding with |F|/CD of each combination (tooth values take CD), the value for each member by its angle to the plate (AA/EA/AE/EE, straight-line between) and to the grain (Hankinson), the top chord at a heel reduced by HR = 0.85 − 0.05(12 tan θ − 2), 0.65…0.85 (ANSI/TPI 1-2014, from memory), θ the angle between the chords (a scissor’s sloped bottom chord makes a pointed heel less steep than the roof); a chord’s load on the plate is its axial force and end shear as one vector; at a heel the chords share their overlap on its bisector, and the top chord’s contact includes its overhang beyond the heel (the same board); the steel with the full signed forces of each combination (steel capacities take no load-duration factor) in tension, shear and (T/Tc)² + (V/Vc)² ≤ 1 across the heel or splice line, the chord face at a panel point (the webs together) and the line through a peak (members along it not credited).',
    ...(catalog.demo ? [catalog.label] : []),
    ...girderNotes(input.plies),
    ...plyConnections.map((c) => c.text),
  );
  const ok =
    sized.groups.every((g) => g.choice.pass) &&
    bearing.every((b) => b.pass) &&
    deflection.total.pass &&
    (deflection.live?.pass ?? true) &&
    plates.every((p) => p.ok) &&
    plyConnections.every((c) => c.pass) &&
    additional.shear.every((x) => x.pass) &&
    additional.longTermDeflection.pass &&
    serviceChecks.every((d) => d.pass);
  return {
    joints: profile.joints,
    span: profile.params.span,
    rise: profile.rise,
    heelHeight: { requested: requestedHeel, analysed: analysedHeel },
    members,
    pieces,
    reactions,
    combinations: combos,
    deflection,
    plates,
    demoPlates: catalog.demo,
    bearing,
    additional,
    warnings,
    notes,
    cautions: [...DESIGN_CAUTIONS],
    engineVersion: ENGINE_VERSION,
    ...(plyConnections.length > 0 && { plyConnections }),
    ok,
  };
}
