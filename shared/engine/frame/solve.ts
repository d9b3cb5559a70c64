import { choleskySolve } from '../analysis/dense';
import { RESIDUAL_LIMIT } from '../analysis/solve';
import { EngineError } from '../errors';
import { addPointFixedEnd, addUniformFixedEnd, alongMember, type LocalPoint } from './element';
import type { PreparedFrame } from './prepare';
import type { FrameLoads, FrameMemberResult, FrameResult } from './types';

const NO_POINTS: readonly LocalPoint[] = [];

/** Local loads of one member collected from a load set. */
interface Local {
  px: Float64Array;
  py: Float64Array;
  points: Map<number, LocalPoint[]>;
  q0: Float64Array;
}

/** +1 when the member's local y points to its downward side (away from +y), else −1. */
const downSign = (c: number, s: number) => {
  // Local y = (−s, c); the downward normal has y < 0, or x > 0 on a vertical member.
  const yDown = c < 0 || (c === 0 && -s > 0);
  return yDown ? 1 : -1;
};

/**
 * Scratch arrays of one prepared frame's solves, zeroed and reused by each: a design solves its
 * frame ten times or more, and a typed array of these sizes costs microseconds to allocate (off
 * the JavaScript heap). Nothing a solve returns refers to them.
 */
interface Workspace {
  nodal: Float64Array;
  rhsFull: Float64Array;
  q: Float64Array;
  rhs: Float64Array;
  uFree: Float64Array;
  u: Float64Array;
  balance: Float64Array;
  px: Float64Array;
  py: Float64Array;
  q0: Float64Array;
}

const workspaces = new WeakMap<PreparedFrame, Workspace>();

function workspace(p: PreparedFrame): Workspace {
  let w = workspaces.get(p);
  if (!w) {
    const dofs = 3 * p.model.joints.length;
    const nm = p.from.length;
    w = {
      nodal: new Float64Array(dofs),
      rhsFull: new Float64Array(dofs),
      q: new Float64Array(6 * nm),
      rhs: new Float64Array(p.factors.n),
      uFree: new Float64Array(p.factors.n),
      u: new Float64Array(dofs),
      balance: new Float64Array(dofs),
      px: new Float64Array(nm),
      py: new Float64Array(nm),
      q0: new Float64Array(6 * nm),
    };
    workspaces.set(p, w);
  } else {
    for (const a of Object.values(w)) a.fill(0);
  }
  return w;
}

function localLoads(p: PreparedFrame, loads: FrameLoads, w: Workspace): Local {
  const out: Local = { px: w.px, py: w.py, points: new Map(), q0: w.q0 };
  for (const l of loads.members ?? []) {
    const e = p.memberIndex.get(l.member);
    if (e === undefined) {
      throw new EngineError('invalid', `A load is on member "${l.member}", which does not exist.`, {
        member: l.member,
      });
    }
    const c = p.cos[e];
    const s = p.sin[e];
    const L = p.length[e];
    if (l.kind === 'uniform') {
      const scale = l.per === 'horizontal' ? Math.abs(c) : 1;
      const wx = (l.wx ?? 0) * scale;
      const wy = (l.wy ?? 0) * scale;
      const px = wx * c + wy * s + (l.axial ?? 0);
      const py = -wx * s + wy * c + downSign(c, s) * (l.transverse ?? 0);
      if (![px, py].every(Number.isFinite)) {
        throw new EngineError('invalid', `The load on member "${l.member}" is not finite.`, {
          member: l.member,
        });
      }
      out.px[e] += px;
      out.py[e] += py;
      addUniformFixedEnd(out.q0, 6 * e, L, px, py);
    } else {
      const fx = l.fx ?? 0;
      const fy = l.fy ?? 0;
      if (!(l.at >= 0 && l.at <= L) || ![fx, fy].every(Number.isFinite)) {
        throw new EngineError(
          'invalid',
          `A point load on member "${l.member}" must be finite and lie on the member (0–${L.toFixed(0)} mm).`,
          { member: l.member, at: l.at },
        );
      }
      const px = fx * c + fy * s;
      const py = -fx * s + fy * c;
      addPointFixedEnd(out.q0, 6 * e, L, l.at, px, py);
      const list = out.points.get(e) ?? [];
      list.push({ a: l.at, py });
      out.points.set(e, list);
    }
  }
  return out;
}

/**
 * Solves one load set on a prepared frame (one forward/back substitution on the stored factors):
 * joint displacements, member end forces from k·u plus the fixed-end forces of the member loads,
 * moments and shears along each member, reactions, and an equilibrium check at every free
 * degree of freedom. Throws EngineError `invalid` for a load on an unknown joint or member, and
 * `unstable` when the check fails.
 */
export function solveFrame(p: PreparedFrame, loads: FrameLoads): FrameResult {
  const nm = p.from.length;
  const w = workspace(p);
  const nodal = w.nodal;
  let largest = 0;
  for (const l of loads.joints ?? []) {
    const j = p.jointIndex.get(l.joint);
    const fx = l.fx ?? 0;
    const fy = l.fy ?? 0;
    const m = l.m ?? 0;
    if (j === undefined || !(Number.isFinite(fx) && Number.isFinite(fy) && Number.isFinite(m))) {
      throw new EngineError('invalid', `Invalid load at joint "${l.joint}".`, { joint: l.joint });
    }
    nodal[3 * j] += fx;
    nodal[3 * j + 1] += fy;
    nodal[3 * j + 2] += m;
  }
  const local = localLoads(p, loads, w);
  // Equivalent joint loads: −Tᵀ·G·q₀ of every loaded member.
  const q = w.q;
  const rhsFull = w.rhsFull;
  rhsFull.set(nodal);
  for (let e = 0; e < nm; e++) {
    const at = 6 * e;
    // A member without loads (q₀ = 0, most webs) has G·q₀ = 0 and adds nothing: skip it.
    if (isZero(local.q0, at, 6)) continue;
    for (let r = 0; r < 6; r++) {
      let v = 0;
      for (let c = 0; c < 6; c++) v += p.g[36 * e + r * 6 + c] * local.q0[at + c];
      q[at + r] = v;
    }
    scatter(p, e, q, at, rhsFull, -1);
  }
  for (let d = 0; d < rhsFull.length; d++) {
    if (d % 3 === 2) largest = Math.max(largest, Math.abs(rhsFull[d]) / p.size);
    else largest = Math.max(largest, Math.abs(rhsFull[d]));
  }
  const rhs = w.rhs;
  for (let d = 0; d < p.free.length; d++) if (p.free[d] >= 0) rhs[p.free[d]] = rhsFull[d];
  const uFree = w.uFree;
  choleskySolve(p.factors, rhs, uFree);
  const u = w.u;
  for (let d = 0; d < u.length; d++) if (p.free[d] >= 0) u[d] = uFree[p.free[d]];

  // q = k*·T·u + G·q₀ per member. Σ Tᵀ·q − loads is 0 at a free dof and the reaction at a
  // restrained one.
  // A plain loop: Float64Array.from with a map function is several times slower.
  const balance = w.balance;
  for (let d = 0; d < nodal.length; d++) balance[d] = -nodal[d];
  const members: FrameMemberResult[] = new Array(nm);
  const ul = new Float64Array(6);
  for (let e = 0; e < nm; e++) {
    const at = 6 * e;
    const c = p.cos[e];
    const s = p.sin[e];
    // No per-member arrays here: this loop runs for every member of every load set.
    for (let end = 0; end <= 3; end += 3) {
      const j = end === 0 ? p.from[e] : p.to[e];
      ul[end] = c * u[3 * j] + s * u[3 * j + 1];
      ul[end + 1] = -s * u[3 * j] + c * u[3 * j + 1];
      ul[end + 2] = u[3 * j + 2];
    }
    for (let r = 0; r < 6; r++) {
      let v = q[at + r];
      for (let col = 0; col < 6; col++) v += p.k[36 * e + r * 6 + col] * ul[col];
      q[at + r] = v;
    }
    scatter(p, e, q, at, balance, 1);
    const L = p.length[e];
    const along = alongMember(q, at, L, local.py[e], local.points.get(e) ?? NO_POINTS);
    const sign = downSign(c, s);
    // Sagging about local y is tension on the −y face; flip when local y points down.
    members[e] = {
      id: p.model.members[e].id,
      axial: (q[at + 3] - q[at]) / 2,
      startMoment: -sign * -q[at + 2],
      endMoment: -sign * q[at + 5],
      spanMoment: along.spanMoment,
      maxMoment: along.maxMoment,
      startShear: Math.abs(q[at + 1]),
      endShear: Math.abs(q[at + 4]),
      maxShear: along.maxShear,
    };
  }
  let residual = 0;
  for (let d = 0; d < balance.length; d++) {
    if (p.free[d] < 0) continue;
    const v = Math.abs(balance[d]) / (d % 3 === 2 ? p.size : 1);
    residual = Math.max(residual, v);
  }
  residual /= Math.max(1, largest);
  if (!(residual <= RESIDUAL_LIMIT)) {
    throw new EngineError(
      'unstable',
      `The frame's equilibrium check failed (residual ${residual.toExponential(2)}): it is too ` +
        'close to a mechanism to analyse reliably.',
      { residual },
    );
  }
  return {
    members,
    reactions: p.supports.map((sp) => {
      const j = p.jointIndex.get(sp.joint)!;
      return {
        joint: sp.joint,
        rx: sp.x ? balance[3 * j] : 0,
        ry: sp.y ? balance[3 * j + 1] : 0,
      };
    }),
    displacements: p.model.joints.map((jt, j) => ({
      joint: jt.id,
      ux: u[3 * j],
      uy: u[3 * j + 1],
      rz: u[3 * j + 2],
    })),
    residual,
  };
}

/** True when a[at … at + n − 1] are all 0. */
function isZero(a: Float64Array, at: number, n: number) {
  for (let d = at; d < at + n; d++) if (a[d] !== 0) return false;
  return true;
}

/** Adds sign·Tᵀ·q (member end forces, global) of member e into the joint vector `into`. */
function scatter(
  p: PreparedFrame,
  e: number,
  q: Float64Array,
  at: number,
  into: Float64Array,
  sign: number,
) {
  const c = p.cos[e];
  const s = p.sin[e];
  for (let end = 0; end <= 3; end += 3) {
    const j = end === 0 ? p.from[e] : p.to[e];
    into[3 * j] += sign * (c * q[at + end] - s * q[at + end + 1]);
    into[3 * j + 1] += sign * (s * q[at + end] + c * q[at + end + 1]);
    into[3 * j + 2] += sign * q[at + end + 2];
  }
}
