/**
 * CalculiX as the independent check of the plane-frame analysis: each member is cut into
 * `SUBDIVISIONS` B31 beam elements (rectangular section, expanded by CalculiX into 3D bricks),
 * line loads go to the nodes by the trapezoid rule (exact panel-point moments on a statically
 * determinate span; a discretisation error O(h²) otherwise), and the plane is kept by fixing
 * the out-of-plane translation of every node.
 *
 * Hinges: a member end that is released gets its own node at the joint, tied to the joint's
 * node by `*EQUATION` on the two in-plane translations only, so it turns freely; continuous
 * member ends share the joint's node (CalculiX couples their rotations through its beam knot).
 * At a support each node is held by the support itself (an equation would hide the reaction).
 * Out of plane only the translation is fixed (fixing rotations trips CalculiX's knot
 * constraints on sloped members).
 *
 * Section forces come from the element stresses (`*EL PRINT S`): CalculiX 2.20 prints the 8
 * integration points of each expanded element, 2 × 2 across the section at ±d/(2√3) and constant
 * along it (its midpoint value). The axial stress σ = t·S·t gives N = mean(σ)·A and
 * M = Δσ/2 · I/(d/(2√3)); along each member M is fitted by least squares with a quadratic
 * (exact for a uniform load), which gives the end moments and the largest interior moment.
 */
import { execFileSync } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { ccx } from './calculix';

export const SUBDIVISIONS = 12;

export interface CcxJoint {
  id: string;
  x: number;
  y: number;
}

/** A member: rectangle b × d (d in the plane), E; global line load wx, wy per mm of its length. */
export interface CcxMember {
  id: string;
  from: string;
  to: string;
  b: number;
  d: number;
  e: number;
  releaseStart: boolean;
  releaseEnd: boolean;
  wx: number;
  wy: number;
}

export interface CcxFrame {
  joints: CcxJoint[];
  members: CcxMember[];
  supports: { joint: string; type: 'pin' | 'roller' }[];
  /** Concentrated loads at joints (global, N), e.g. a point load where a member was split. */
  jointLoads?: { joint: string; fx?: number; fy?: number }[];
}

/** What CalculiX gives per member: axial force at mid-length (tension +), moments sagging + about the downward side. */
export interface CcxMemberResult {
  axial: number;
  startMoment: number;
  endMoment: number;
  /** Largest |M| strictly inside, from the fitted quadratic (0 when the ends govern). */
  spanMoment: number;
}

export interface CcxResult {
  members: Map<string, CcxMemberResult>;
  reactions: Map<string, { rx: number; ry: number }>;
  /** Joint displacements (ux, uy), mm. */
  displacements: Map<string, [number, number]>;
  /** Displacement (ux, uy) of each member's mid-length node, mm. */
  midDisplacements: Map<string, [number, number]>;
}

interface Layout {
  lines: string[];
  /** Node numbers per member along it (SUBDIVISIONS + 1). */
  nodesOf: number[][];
  /** Master node of each joint, and all its nodes (master first). */
  master: Map<string, number>;
  nodesAt: Map<string, number[]>;
  /** Node coordinates by node number. */
  at: Map<number, [number, number]>;
}

function layout(frame: CcxFrame): Layout {
  const joint = new Map(frame.joints.map((j) => [j.id, j]));
  const at = new Map<number, [number, number]>();
  let next = 1;
  const node = (x: number, y: number) => {
    at.set(next, [x, y]);
    return next++;
  };
  // Per joint: one node shared by the continuous member ends, one more per released end.
  const group = new Map<string, number>();
  const nodesAt = new Map<string, number[]>();
  const endNode = (id: string, released: boolean) => {
    const j = joint.get(id)!;
    const list = nodesAt.get(id) ?? [];
    nodesAt.set(id, list);
    if (!released) {
      let n = group.get(id);
      if (n === undefined) {
        group.set(id, (n = node(j.x, j.y)));
        list.unshift(n);
      }
      return n;
    }
    const own = node(j.x, j.y);
    list.push(own);
    return own;
  };
  const nodesOf = new Map<string, number[]>();
  for (const m of frame.members) {
    const a = joint.get(m.from)!;
    const b = joint.get(m.to)!;
    const first = endNode(m.from, m.releaseStart);
    const inner: number[] = [];
    for (let s = 1; s < SUBDIVISIONS; s++) {
      const t = s / SUBDIVISIONS;
      inner.push(node(a.x + t * (b.x - a.x), a.y + t * (b.y - a.y)));
    }
    const last = endNode(m.to, m.releaseEnd);
    nodesOf.set(m.id, [first, ...inner, last]);
  }
  // The first node of a joint is its master; the others follow it in the in-plane translations,
  // except along a support's restrained directions, where each is held by the support itself
  // (CalculiX reports no reaction through an equation).
  const master = new Map<string, number>();
  const equations: string[] = [];
  const held = new Map(frame.supports.map((sp) => [sp.joint, sp.type === 'pin' ? [1, 2] : [2]]));
  for (const [id, list] of nodesAt) {
    master.set(id, list[0]);
    for (const n of list.slice(1)) {
      for (const dof of [1, 2]) {
        if (held.get(id)?.includes(dof)) continue;
        equations.push('2', `${n}, ${dof}, 1.0, ${list[0]}, ${dof}, -1.0`);
      }
    }
  }
  const lines = ['*NODE, NSET=Nall'];
  for (const [n, [x, y]] of at) lines.push(`${n}, ${x}, ${y}, 0`);
  let el = 1;
  frame.members.forEach((m, k) => {
    const ns = nodesOf.get(m.id)!;
    lines.push(`*ELEMENT, TYPE=B31, ELSET=M${k + 1}`);
    for (let s = 0; s < SUBDIVISIONS; s++) lines.push(`${el++}, ${ns[s]}, ${ns[s + 1]}`);
  });
  frame.members.forEach((m, k) => {
    lines.push(`*MATERIAL, NAME=W${k + 1}`, '*ELASTIC', `${m.e}, 0`);
    // Local 1-direction out of the plane (z); the section's d lies in the plane.
    lines.push(
      `*BEAM SECTION, ELSET=M${k + 1}, MATERIAL=W${k + 1}, SECTION=RECT`,
      `${m.b}, ${m.d}`,
      '0, 0, 1',
    );
  });
  if (equations.length > 0) lines.push('*EQUATION', ...equations);
  return { lines, nodesOf: frame.members.map((m) => nodesOf.get(m.id)!), master, nodesAt, at };
}

/** The CalculiX input deck of a frame (exported for inspection in a failing test). */
export function calculixFrameInput(frame: CcxFrame): {
  deck: string;
  layout: Layout;
  loads: Map<number, [number, number]>;
} {
  const l = layout(frame);
  const lines = [...l.lines, '*BOUNDARY', 'Nall, 3, 3'];
  for (const s of frame.supports) {
    for (const n of l.nodesAt.get(s.joint)!)
      lines.push(s.type === 'pin' ? `${n}, 1, 2` : `${n}, 2, 2`);
  }
  lines.push('*STEP', '*STATIC', '*CLOAD');
  const loads = new Map<number, [number, number]>();
  frame.members.forEach((m, k) => {
    const ns = l.nodesOf[k];
    const a = frame.joints.find((j) => j.id === m.from)!;
    const b = frame.joints.find((j) => j.id === m.to)!;
    const h = Math.hypot(b.x - a.x, b.y - a.y) / SUBDIVISIONS;
    ns.forEach((own, s) => {
      const share = s === 0 || s === SUBDIVISIONS ? h / 2 : h;
      // End shares go to the joint's node, so a support's RF accounts for them (below).
      const n = s === 0 ? l.master.get(m.from)! : s === SUBDIVISIONS ? l.master.get(m.to)! : own;
      const cur = loads.get(n) ?? [0, 0];
      loads.set(n, [cur[0] + m.wx * share, cur[1] + m.wy * share]);
    });
  });
  for (const p of frame.jointLoads ?? []) {
    const n = l.master.get(p.joint)!;
    const cur = loads.get(n) ?? [0, 0];
    loads.set(n, [cur[0] + (p.fx ?? 0), cur[1] + (p.fy ?? 0)]);
  }
  for (const [n, [fx, fy]] of loads) {
    if (fx) lines.push(`${n}, 1, ${fx}`);
    if (fy) lines.push(`${n}, 2, ${fy}`);
  }
  lines.push('*NODE PRINT, NSET=Nall', 'U, RF', '*EL PRINT, ELSET=Eall', 'S', '*END STEP', '');
  // An element set of everything for the stress print.
  const names = frame.members.map((_, k) => `M${k + 1}`);
  const all: string[] = [];
  // CalculiX reads at most 16 entries per line.
  for (let k = 0; k < names.length; k += 16) all.push(names.slice(k, k + 16).join(', '));
  const deck = lines.join('\n').replace('*STEP', `*ELSET, ELSET=Eall\n${all.join('\n')}\n*STEP`);
  return { deck, layout: l, loads };
}

function table(dat: string, title: string, cols: number): number[][] {
  const start = dat.indexOf(title);
  if (start < 0) throw new Error(`no "${title}" table in the CalculiX output`);
  const rows: number[][] = [];
  for (const line of dat.slice(start).split('\n').slice(1)) {
    const c = line.trim().split(/\s+/);
    if (c.length !== cols) {
      if (rows.length > 0) break;
      continue;
    }
    rows.push(c.map(Number));
  }
  return rows;
}

/** Least-squares quadratic through (x, y) points: [c0, c1, c2]. */
function quadratic(xs: number[], ys: number[]): [number, number, number] {
  const s = new Array<number>(5).fill(0);
  const t = [0, 0, 0];
  xs.forEach((x, i) => {
    for (let p = 0; p < 5; p++) s[p] += x ** p;
    for (let p = 0; p < 3; p++) t[p] += ys[i] * x ** p;
  });
  const m = [
    [s[0], s[1], s[2], t[0]],
    [s[1], s[2], s[3], t[1]],
    [s[2], s[3], s[4], t[2]],
  ];
  for (let c = 0; c < 3; c++) {
    for (let r = c + 1; r < 3; r++) {
      const f = m[r][c] / m[c][c];
      for (let k = c; k < 4; k++) m[r][k] -= f * m[c][k];
    }
  }
  const out = [0, 0, 0];
  for (let r = 2; r >= 0; r--) {
    let v = m[r][3];
    for (let k = r + 1; k < 3; k++) v -= m[r][k] * out[k];
    out[r] = v / m[r][r];
  }
  return out as [number, number, number];
}

/** Runs CalculiX on a frame and reads member forces, reactions and joint displacements. */
export function runCalculixFrame(work: string, name: string, frame: CcxFrame): CcxResult {
  const { deck, layout: l, loads } = calculixFrameInput(frame);
  writeFileSync(join(work, `${name}.inp`), deck);
  try {
    execFileSync(ccx!, ['-i', name], { cwd: work, timeout: 60000, stdio: 'pipe' });
  } catch (e) {
    const out = String((e as { stdout?: Buffer }).stdout ?? '');
    const errors = out.split('\n').filter((line) => /ERROR|WARNING/.test(line));
    throw new Error(`CalculiX failed on ${name}: ${errors.join(' ') || out.slice(-500)}`, {
      cause: e,
    });
  }
  const dat = readFileSync(join(work, `${name}.dat`), 'utf8');
  const u = new Map(table(dat, 'displacements (vx,vy,vz)', 4).map((r) => [r[0], [r[1], r[2]]]));
  const rf = new Map(table(dat, 'forces (fx,fy,fz)', 4).map((r) => [r[0], [r[1], r[2]]]));
  const stress = table(dat, 'stresses (elem, integ.pnt.', 8);
  const byElement = new Map<number, number[][]>();
  for (const r of stress) {
    const list = byElement.get(r[0]) ?? [];
    list.push(r);
    byElement.set(r[0], list);
  }
  const members = new Map<string, CcxMemberResult>();
  frame.members.forEach((m, k) => {
    const a = frame.joints.find((j) => j.id === m.from)!;
    const b = frame.joints.find((j) => j.id === m.to)!;
    const L = Math.hypot(b.x - a.x, b.y - a.y);
    const c = (b.x - a.x) / L;
    const s = (b.y - a.y) / L;
    const yg = m.d / (2 * Math.sqrt(3));
    const inertia = (m.b * m.d ** 3) / 12;
    const xs: number[] = [];
    const ms: number[] = [];
    const ns: number[] = [];
    for (let e = 0; e < SUBDIVISIONS; e++) {
      const pts = byElement.get(k * SUBDIVISIONS + e + 1)!;
      const axialStress = (p: number[]) => p[2] * c * c + p[3] * s * s + 2 * p[5] * c * s;
      // Points 3, 4, 7, 8 lie on the local +y side (y turned 90° counter-clockwise from the
      // member), 1, 2, 5, 6 on the −y side (checked against the closed forms in the tests).
      const plus = [2, 3, 6, 7].map((i) => axialStress(pts[i]));
      const minus = [0, 1, 4, 5].map((i) => axialStress(pts[i]));
      const mean = (v: number[]) => v.reduce((x, y) => x + y, 0) / v.length;
      ns.push(((mean(plus) + mean(minus)) / 2) * m.b * m.d);
      // Sagging about local y puts tension on the −y side.
      ms.push((((mean(minus) - mean(plus)) / 2) * inertia) / yg);
      xs.push(((e + 0.5) / SUBDIVISIONS) * L);
    }
    // The downward side: local y points down when the member runs right to left.
    const flip = c < 0 || (c === 0 && -s > 0) ? -1 : 1;
    const [c0, c1, c2] = quadratic(xs, ms);
    const mAt = (x: number) => flip * (c0 + c1 * x + c2 * x * x);
    const vertex = c2 !== 0 ? -c1 / (2 * c2) : -1;
    const mid = SUBDIVISIONS / 2;
    members.set(m.id, {
      axial: (ns[mid - 1] + ns[mid]) / 2,
      startMoment: m.releaseStart ? 0 : mAt(0),
      endMoment: m.releaseEnd ? 0 : mAt(L),
      spanMoment: vertex > 0 && vertex < L ? Math.abs(mAt(vertex)) : 0,
    });
  });
  const reactions = new Map<string, { rx: number; ry: number }>();
  for (const sp of frame.supports) {
    // CalculiX's RF is the support force plus the load applied at the node.
    let fx = 0;
    let fy = 0;
    for (const n of l.nodesAt.get(sp.joint)!) {
      const [rx, ry] = rf.get(n)!;
      const [px, py] = loads.get(n) ?? [0, 0];
      fx += rx - px;
      fy += ry - py;
    }
    reactions.set(sp.joint, { rx: sp.type === 'pin' ? fx : 0, ry: fy });
  }
  const displacements = new Map<string, [number, number]>();
  for (const [id, n] of l.master) displacements.set(id, u.get(n)! as [number, number]);
  const midDisplacements = new Map<string, [number, number]>(
    frame.members.map((m, k) => [m.id, u.get(l.nodesOf[k][SUBDIVISIONS / 2])! as [number, number]]),
  );
  return { members, reactions, displacements, midDisplacements };
}
