import { describe, expect, it } from 'vitest';
import { calculixMissing, calculixWorkDir } from '../../../support/calculix';
import { runCalculixFrame, type CcxFrame, type CcxMember } from '../../../support/calculixFrame';
import type { DesignInputDraft } from '../../../../shared/api/design';
import { designTruss } from '../../../../shared/engine/design';
import { parseLumberId, sectionProperties } from '../../../../shared/engine/lumber';
import { generateProfile } from '../../../../shared/engine/profiles';
import { engineInput } from './support/inputs';

/**
 * A designed truss with point loads against CalculiX B31 beams. The CalculiX model is built
 * here: each loaded chord member is split at its load into two elements continuous through the
 * split, the point load (dead + roof live, lb → N) is a nodal force there, the area loads are
 * line loads worked out by hand (dead along the member, roof live on the horizontal projection),
 * chords are hinged where their pieces end and webs pinned. Only the geometry and the chosen
 * lumber's E, b, d come from the engine. D + Lr: axial forces within 2 %, chord moments
 * (under the load, at the panel points) within 2 % of the largest.
 */
const work = calculixWorkDir('spanwise-point-loads-ccx-');
const N_PER_LB = 4.4482216152605;
const psf = (v: number) => ((v * N_PER_LB) / 304.8 ** 2) * 24 * 25.4;

const draft: DesignInputDraft = {
  units: 'imperial',
  profile: 'fink',
  span: 28 * 12,
  pitch: 6,
  spacing: 24,
  plies: 2,
  loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
  lumber: { topChord: '2x6 DFL-2', bottomChord: '2x8 DFL-2', webs: '2x4 DFL-2' },
  pointLoads: [
    // Between panel points: bottom chord 10 ft from the left heel, top chord at 3 ft.
    { x: 120, chord: 'bottom', dead: 300, live: 500, kind: 'roofLive' },
    { x: 36, chord: 'top', dead: 200, live: 300, kind: 'roofLive' },
  ],
};

describe('point loads between panel points against CalculiX (D + Lr)', () => {
  if (calculixMissing()) return;
  it('axial forces and chord moments within 2 %', () => {
    const input = engineInput(draft);
    const design = designTruss(input);
    const profile = generateProfile({ ...input.profile, heelHeight: design.heelHeight.analysed });
    const i = design.combinations.findIndex((c) => c.name === 'D + Lr');
    const joints = new Map(profile.joints.map((j) => [j.id, { ...j }]));
    // Hinges where a chord piece ends (heel, peak, splice), by hand from the pieces.
    const ends = new Set<string>();
    for (const piece of profile.pieces.filter((p) => p.role !== 'web')) {
      const count = new Map<string, number>();
      for (const id of piece.members) {
        const m = profile.members.find((x) => x.id === id)!;
        for (const j of [m.from, m.to]) count.set(j, (count.get(j) ?? 0) + 1);
      }
      for (const [j, n] of count) if (n === 1) ends.add(`${piece.id}:${j}`);
    }
    const pieceOf = new Map(profile.pieces.flatMap((p) => p.members.map((m) => [m, p.id])));
    const members: CcxMember[] = [];
    const jointLoads: CcxFrame['jointLoads'] = [];
    const split = new Map<string, [string, string]>();
    design.members.forEach((dm) => {
      const m = profile.members.find((x) => x.id === dm.id)!;
      const s = sectionProperties(parseLumberId(dm.lumber).size, 2);
      // E of No.2 Douglas Fir-Larch, NDS 2018 Supplement Table 4A: 1,600,000 psi.
      const e = 1_600_000 * 0.006894757293168;
      const a = joints.get(m.from)!;
      const b = joints.get(m.to)!;
      const cos = Math.abs(b.x - a.x) / Math.hypot(b.x - a.x, b.y - a.y);
      const wy =
        m.role === 'topChord'
          ? -(psf(10) + psf(20) * cos)
          : m.role === 'bottomChord'
            ? -psf(10)
            : 0;
      const web = m.role === 'web';
      const hinge = (j: string) => web || ends.has(`${pieceOf.get(m.id)}:${j}`);
      const base = { b: s.b, d: s.d, e, wx: 0, wy };
      const load = draft.pointLoads!.find((l) => {
        const x = l.x * 25.4;
        const role = l.chord === 'top' ? 'topChord' : 'bottomChord';
        return m.role === role && x > Math.min(a.x, b.x) + 1 && x < Math.max(a.x, b.x) - 1;
      });
      if (!load) {
        members.push({
          id: m.id,
          from: m.from,
          to: m.to,
          ...base,
          releaseStart: hinge(m.from),
          releaseEnd: hinge(m.to),
        });
        return;
      }
      const x = load.x * 25.4;
      const t = (x - a.x) / (b.x - a.x);
      const id = `P${m.id}`;
      joints.set(id, { id, x, y: a.y + t * (b.y - a.y) });
      jointLoads.push({ joint: id, fy: -(load.dead + load.live!) * N_PER_LB });
      members.push(
        {
          id: `${m.id}1`,
          from: m.from,
          to: id,
          ...base,
          releaseStart: hinge(m.from),
          releaseEnd: false,
        },
        {
          id: `${m.id}2`,
          from: id,
          to: m.to,
          ...base,
          releaseStart: false,
          releaseEnd: hinge(m.to),
        },
      );
      split.set(m.id, [`${m.id}1`, `${m.id}2`]);
    });
    expect(split.size).toBe(2);
    const ccx = runCalculixFrame(work, 'point-loads', {
      joints: [...joints.values()],
      members,
      supports: profile.supports.map((s) => ({ joint: s.joint, type: s.type })),
      jointLoads,
    });
    const largestN = Math.max(...design.members.map((m) => Math.abs(m.forces[i])));
    const largestM = Math.max(...design.members.map((m) => m.maxMoment));
    for (const dm of design.members) {
      const halves = split.get(dm.id);
      const r = halves
        ? {
            axial: (ccx.members.get(halves[0])!.axial + ccx.members.get(halves[1])!.axial) / 2,
            under: Math.abs(ccx.members.get(halves[0])!.endMoment),
          }
        : { axial: ccx.members.get(dm.id)!.axial, under: 0 };
      expect(dm.forces[i], `${dm.id} axial`).toBeWithin(r.axial, {
        rel: 0.02,
        abs: 0.02 * largestN,
      });
      if (halves) {
        expect(r.under).toBeGreaterThan(0.1 * largestM);
        // The moment under the load governs these members (the largest |M| along them).
        expect(dm.maxMoment, `${dm.id} moment under the load`).toBeWithin(r.under, {
          rel: 0.02,
          abs: 0.02 * largestM,
        });
      }
    }
    for (const [j, sp] of profile.supports.entries()) {
      expect(design.reactions[j].vertical[i]).toBeWithin(ccx.reactions.get(sp.joint)!.ry, {
        rel: 0.005,
      });
    }
  });
});
