import { describe, expect, it } from 'vitest';
import { calculixMissing, calculixWorkDir } from '../../../support/calculix';
import { runCalculixFrame, type CcxFrame, type CcxMember } from '../../../support/calculixFrame';
import { designTruss } from '../../../../shared/engine/design';
import { designLoads } from '../../../../shared/engine/design/combinedLoads';
import { memberDemands } from '../../../../shared/engine/design/demands';
import {
  designFrame,
  frameLoadsOf,
  memberSection,
} from '../../../../shared/engine/design/frameModel';
import { solveFrame } from '../../../../shared/engine/frame';
import { sectionProperties, parseLumberId } from '../../../../shared/engine/lumber';
import { generateProfile } from '../../../../shared/engine/profiles';
import type { TrussProfile } from '../../../../shared/engine/profiles/types';
import type { DesignInputDraft } from '../../../../shared/api/design';
import { engineInput } from './support/inputs';

/**
 * Designed trusses against CalculiX beam elements (B31, hinges by *EQUATION; see
 * tests/support/calculixFrame.ts). The loads on the CalculiX model are worked out here from the
 * request's area loads, by hand: dead load along the member, roof live load on the horizontal
 * projection, the overhang as real cantilever elements beyond the heel. Only the geometry and
 * the chosen lumber's E, b and d come from the engine. Axial forces of every member and the
 * chord moments must agree within 2 % (values under 2 % of the model's largest are compared to
 * that floor instead).
 */

const work = calculixWorkDir('spanwise-design-frame-ccx-');

// 1 psf = 4.4482216152605 N / (0.3048 m)² = 47.880259 Pa = 4.7880259e-5 N/mm²; × spacing (mm).
const N_PER_MM2_PER_PSF = 4.4482216152605 / 304.8 ** 2;
const SPACING_MM = 24 * 25.4;
const psf = (v: number) => v * N_PER_MM2_PER_PSF * SPACING_MM;

interface Case {
  name: string;
  draft: DesignInputDraft;
}

const cases: Case[] = [
  {
    name: 'fink-overhangs',
    draft: {
      units: 'imperial',
      profile: 'fink',
      span: 28 * 12,
      pitch: 6,
      overhang: 24,
      spacing: 24,
      loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
    },
  },
  {
    name: 'howe',
    draft: {
      units: 'imperial',
      profile: 'howe',
      span: 32 * 12,
      pitch: 5,
      overhang: 12,
      spacing: 24,
      loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
    },
  },
  {
    name: 'scissor',
    draft: {
      units: 'imperial',
      profile: 'scissor',
      span: 32 * 12,
      pitch: 6,
      bottomPitch: 3,
      overhang: 12,
      spacing: 24,
      loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
    },
  },
  {
    name: 'double-fink',
    draft: {
      units: 'imperial',
      profile: 'doubleFink',
      span: 56 * 12,
      pitch: 6,
      spacing: 24,
      loads: { tcll: 35, tcdl: 10, bcll: 0, bcdl: 10 },
    },
  },
  {
    name: 'fink-raised-heel',
    draft: {
      units: 'imperial',
      profile: 'fink',
      span: 28 * 12,
      pitch: 6,
      heelHeight: 12,
      overhang: 18,
      spacing: 24,
      loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
    },
  },
];

/** Joints of a chord piece that end it (they belong to one of its members only). */
function pieceEnds(profile: TrussProfile, members: string[]): Set<string> {
  const count = new Map<string, number>();
  for (const id of members) {
    const m = profile.members.find((x) => x.id === id)!;
    for (const j of [m.from, m.to]) count.set(j, (count.get(j) ?? 0) + 1);
  }
  return new Set([...count].filter(([, n]) => n === 1).map(([j]) => j));
}

/** The CalculiX model of a designed truss under D + Lr, loads by hand. */
function handModel(profile: TrussProfile, lumber: string[], draft: DesignInputDraft): CcxFrame {
  const loads = draft.loads!;
  const joint = new Map(profile.joints.map((j) => [j.id, j]));
  const pitch = draft.pitch!;
  const overhangMm = typeof draft.overhang === 'number' ? draft.overhang * 25.4 : 0;
  const heels = new Set(
    overhangMm > 0 ? [profile.topChordJoints[0], profile.topChordJoints.at(-1)!] : [],
  );
  const released = new Map<string, { start: boolean; end: boolean }>();
  for (const m of profile.members) released.set(m.id, { start: true, end: true });
  for (const piece of profile.pieces.filter((p) => p.role !== 'web')) {
    const ends = pieceEnds(profile, piece.members);
    for (const id of piece.members) {
      const m = profile.members.find((x) => x.id === id)!;
      const hinge = (j: string) => ends.has(j) && !(piece.role === 'topChord' && heels.has(j));
      released.set(id, { start: hinge(m.from), end: hinge(m.to) });
    }
  }
  const gravity = (m: { from: string; to: string; role: string }) => {
    const a = joint.get(m.from) ?? tips.get(m.from)!;
    const b = joint.get(m.to)!;
    const cos = Math.abs(b.x - a.x) / Math.hypot(b.x - a.x, b.y - a.y);
    // Dead along the member; live per horizontal run is cosθ per unit length of member.
    if (m.role === 'topChord') return -(psf(loads.tcdl!) + psf(loads.tcll!) * cos);
    if (m.role === 'bottomChord') return -(psf(loads.bcdl!) + psf(loads.bcll!) * cos);
    return 0;
  };
  const section = (id: string) => {
    const s = sectionProperties(parseLumberId(id).size, 1);
    return { b: s.b, d: s.d, e: memberSection(id, 1).e };
  };
  const members: CcxMember[] = profile.members.map((m, k) => ({
    id: m.id,
    from: m.from,
    to: m.to,
    ...section(lumber[k]),
    releaseStart: released.get(m.id)!.start,
    releaseEnd: released.get(m.id)!.end,
    wx: 0,
    wy: gravity(m),
  }));
  const joints = [...profile.joints];
  const tips = new Map<string, { id: string; x: number; y: number }>();
  if (overhangMm > 0) {
    const topLumber = lumber[profile.members.findIndex((m) => m.role === 'topChord')];
    for (const [heel, dir] of [
      [profile.topChordJoints[0], -1],
      [profile.topChordJoints.at(-1)!, 1],
    ] as const) {
      const h = joint.get(heel)!;
      const tip = {
        id: `tip${heel}`,
        x: h.x + dir * overhangMm,
        y: h.y - (overhangMm * pitch) / 12,
      };
      joints.push(tip);
      tips.set(tip.id, tip);
      const overhang = { from: tip.id, to: heel, role: 'topChord' };
      members.push({
        id: `overhang${heel}`,
        ...overhang,
        ...section(topLumber),
        releaseStart: false,
        releaseEnd: false,
        wx: 0,
        wy: gravity(overhang),
      });
    }
  }
  return {
    joints,
    members,
    supports: profile.supports.map((s) => ({ joint: s.joint, type: s.type })),
  };
}

describe('designed trusses as frames against CalculiX B31 beams (D + Lr, loads by hand)', () => {
  if (calculixMissing()) return;
  for (const c of cases) {
    it(`${c.name}: axial forces and chord moments within 2 %`, () => {
      const input = engineInput(c.draft);
      const design = designTruss(input);
      const profile = generateProfile({ ...input.profile, heelHeight: design.heelHeight.analysed });
      const lumber = design.members.map((m) => m.lumber);
      const combos = designLoads(input, profile, '7-16').combinations;
      const i = combos.findIndex((x) => x.name === 'D + Lr');
      expect(i).toBeGreaterThanOrEqual(0);
      const frame = designFrame(profile, lumber, input.plies);
      const demands = memberDemands(profile, combos, frame);
      const ccx = runCalculixFrame(work, c.name, handModel(profile, lumber, c.draft));

      const m = profile.members.length;
      const largestN = Math.max(
        ...profile.members.map((_, k) => Math.abs(demands.axial[i * m + k])),
      );
      const largestM = Math.max(...profile.members.map((_, k) => demands.moment[i * m + k]));
      // The engine's end moments, signed, from the same solve as its demands.
      const c0 = combos[i];
      const ends = solveFrame(
        frame,
        frameLoadsOf(profile, c0.jointLoads, c0.transverse, c0.overhangMoment),
      );
      profile.members.forEach((mb, k) => {
        const r = ccx.members.get(mb.id)!;
        expect(demands.axial[i * m + k], `${mb.id} axial`).toBeWithin(r.axial, {
          rel: 0.02,
          abs: 0.02 * largestN,
        });
        if (mb.role === 'web') return;
        const e = ends.members[k];
        expect(e.startMoment, `${mb.id} start moment`).toBeWithin(r.startMoment, {
          rel: 0.02,
          abs: 0.02 * largestM,
        });
        expect(e.endMoment, `${mb.id} end moment`).toBeWithin(r.endMoment, {
          rel: 0.02,
          abs: 0.02 * largestM,
        });
        expect(demands.spanMoment[i * m + k], `${mb.id} span moment`).toBeWithin(r.spanMoment, {
          rel: 0.02,
          abs: 0.02 * largestM,
        });
      });
      for (const [j, sp] of profile.supports.entries()) {
        expect(demands.ry[i * profile.supports.length + j]).toBeWithin(
          ccx.reactions.get(sp.joint)!.ry,
          {
            rel: 0.005,
          },
        );
      }
    });
  }
});
