import type { DesignInputDraft } from '../../../../../shared/api/design';
import { memberSection } from '../../../../../shared/engine/design/frameModel';
import { parseLumberId, sectionProperties } from '../../../../../shared/engine/lumber';
import type { TrussProfile } from '../../../../../shared/engine/profiles/types';
import type { CcxFrame, CcxMember } from '../../../../support/calculixFrame';

// 1 psf = 4.4482216152605 N / (0.3048 m)² = 47.880259 Pa = 4.7880259e-5 N/mm²; × spacing (mm).
const N_PER_MM2_PER_PSF = 4.4482216152605 / 304.8 ** 2;
export const SPACING_MM = 24 * 25.4;
export const psf = (v: number) => v * N_PER_MM2_PER_PSF * SPACING_MM;

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
export function handModel(
  profile: TrussProfile,
  lumber: string[],
  draft: DesignInputDraft,
): CcxFrame {
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
