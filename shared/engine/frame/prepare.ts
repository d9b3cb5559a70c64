import { choleskyFactor, type CholeskyFactors } from '../analysis/dense';
import { validateModel } from '../analysis/validate';
import { EngineError } from '../errors';
import { TOLERANCE } from '../units';
import { elementStiffness } from './element';
import type { FrameModel } from './types';

/**
 * A frame made ready for many load sets: per member its direction, length and condensed local
 * stiffness, the degree-of-freedom map and the Cholesky factors of the free stiffness matrix.
 * Degrees of freedom of joint j: ux at 3j, uy at 3j + 1, θ at 3j + 2.
 */
export interface PreparedFrame {
  readonly model: FrameModel;
  readonly jointIndex: ReadonlyMap<string, number>;
  readonly memberIndex: ReadonlyMap<string, number>;
  readonly from: Int32Array;
  readonly to: Int32Array;
  readonly length: Float64Array;
  readonly cos: Float64Array;
  readonly sin: Float64Array;
  /** Condensed local stiffness (36 per member) and fixed-end operator G (36 per member). */
  readonly k: Float64Array;
  readonly g: Float64Array;
  /** Free-dof number of each of the 3j degrees of freedom, −1 where restrained or absent. */
  readonly free: Int32Array;
  /** Supported joints with the dofs they restrain. */
  readonly supports: readonly { joint: string; x: boolean; y: boolean }[];
  readonly factors: CholeskyFactors;
  /** Largest extent of the model, mm: turns a moment residual into a force. */
  readonly size: number;
}

function checkSections(model: FrameModel): void {
  const bad = model.members.filter(
    (m) => ![m.e, m.a, m.i].every((v) => Number.isFinite(v) && v > 0),
  );
  if (bad.length > 0) {
    throw new EngineError(
      'invalid',
      `Every frame member needs positive E, A and I; not so for ${bad.map((m) => m.id).join(', ')}.`,
      { members: bad.map((m) => m.id) },
    );
  }
}

/**
 * Validates a frame and factorises its stiffness once. A joint where every member end is
 * released has no rotational stiffness: its rotation is not a degree of freedom (it is
 * indeterminate and irrelevant). Throws EngineError `invalid` for a bad model and `unstable`
 * when the stiffness matrix is singular (a mechanism).
 */
export function prepareFrame(model: FrameModel): PreparedFrame {
  validateModel({
    joints: model.joints,
    members: model.members.map((m) => ({ id: m.id, from: m.from, to: m.to })),
    supports: model.supports,
  });
  checkSections(model);
  const jointIndex = new Map(model.joints.map((j, i) => [j.id, i]));
  const nm = model.members.length;
  const from = new Int32Array(nm);
  const to = new Int32Array(nm);
  const length = new Float64Array(nm);
  const cos = new Float64Array(nm);
  const sin = new Float64Array(nm);
  const k = new Float64Array(36 * nm);
  const g = new Float64Array(36 * nm);
  const turns = new Uint8Array(model.joints.length);
  model.members.forEach((m, e) => {
    const a = jointIndex.get(m.from)!;
    const b = jointIndex.get(m.to)!;
    const dx = model.joints[b].x - model.joints[a].x;
    const dy = model.joints[b].y - model.joints[a].y;
    const L = Math.hypot(dx, dy);
    from[e] = a;
    to[e] = b;
    length[e] = L;
    cos[e] = dx / L;
    sin[e] = dy / L;
    elementStiffness(m.e, m.a, m.i, L, !!m.releaseStart, !!m.releaseEnd, { k, g }, 36 * e);
    if (!m.releaseStart) turns[a] = 1;
    if (!m.releaseEnd) turns[b] = 1;
  });
  const restrained = new Uint8Array(3 * model.joints.length);
  const supports = model.supports.map((s) => {
    const j = jointIndex.get(s.joint)!;
    const x = s.type === 'pin' || s.normal === 'x';
    const y = s.type === 'pin' || s.normal !== 'x';
    if (x) restrained[3 * j] = 1;
    if (y) restrained[3 * j + 1] = 1;
    return { joint: s.joint, x, y };
  });
  const free = new Int32Array(3 * model.joints.length).fill(-1);
  let n = 0;
  for (let d = 0; d < free.length; d++) {
    if (!restrained[d] && (d % 3 !== 2 || turns[(d - 2) / 3])) free[d] = n++;
  }
  const stiffness = new Float64Array(n * n);
  const kg = new Float64Array(36);
  const dofs = new Int32Array(6);
  for (let e = 0; e < nm; e++) {
    globalStiffness(k, 36 * e, cos[e], sin[e], kg);
    for (let r = 0; r < 3; r++) {
      dofs[r] = free[3 * from[e] + r];
      dofs[r + 3] = free[3 * to[e] + r];
    }
    for (let r = 0; r < 6; r++) {
      if (dofs[r] < 0) continue;
      for (let c = 0; c < 6; c++) {
        if (dofs[c] >= 0) stiffness[dofs[r] * n + dofs[c]] += kg[r * 6 + c];
      }
    }
  }
  const factors = choleskyFactor(stiffness, n);
  if (!(factors.minPivotRatio > TOLERANCE)) {
    throw new EngineError(
      'unstable',
      'The frame is unstable (a mechanism): its stiffness matrix is singular.',
      { minPivotRatio: factors.minPivotRatio },
    );
  }
  let minX = Infinity;
  let maxX = -Infinity;
  let minY = Infinity;
  let maxY = -Infinity;
  for (const j of model.joints) {
    minX = Math.min(minX, j.x);
    maxX = Math.max(maxX, j.x);
    minY = Math.min(minY, j.y);
    maxY = Math.max(maxY, j.y);
  }
  return {
    model,
    jointIndex,
    memberIndex: new Map(model.members.map((m, e) => [m.id, e])),
    from,
    to,
    length,
    cos,
    sin,
    k,
    g,
    free,
    supports,
    factors,
    size: Math.max(maxX - minX, maxY - minY, 1),
  };
}

/** Tᵀ·k·T of one member into `out` (6×6), T the rotation of both ends by (c, s). */
export function globalStiffness(
  k: Float64Array,
  at: number,
  c: number,
  s: number,
  out: Float64Array,
) {
  // T per end: [c s 0; −s c 0; 0 0 1], block-diagonal. Tᵀ·k·T block by block.
  const t = [c, s, 0, -s, c, 0, 0, 0, 1];
  for (let bi = 0; bi < 2; bi++) {
    for (let bj = 0; bj < 2; bj++) {
      for (let r = 0; r < 3; r++) {
        for (let col = 0; col < 3; col++) {
          let v = 0;
          for (let p = 0; p < 3; p++) {
            const tpr = t[p * 3 + r];
            if (tpr === 0) continue;
            for (let q = 0; q < 3; q++) {
              v += tpr * k[at + (3 * bi + p) * 6 + 3 * bj + q] * t[q * 3 + col];
            }
          }
          out[(3 * bi + r) * 6 + 3 * bj + col] = v;
        }
      }
    }
  }
}
