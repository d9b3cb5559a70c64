import type { TrussModel } from './types';
import { memberId } from './validate';

/**
 * Index form of a validated model. Degrees of freedom: joint i has x at 2i and y at 2i + 1.
 * Unknowns of the equilibrium system: member forces 0…m−1 (tension +), then reactions m…m+r−1.
 */
export interface TrussGeometry {
  readonly jointIds: readonly string[];
  readonly jointIndex: ReadonlyMap<string, number>;
  readonly memberIds: readonly string[];
  readonly memberIndex: ReadonlyMap<string, number>;
  /** Joint indices of each member's ends. */
  readonly from: Int32Array;
  readonly to: Int32Array;
  readonly length: Float64Array;
  /** Direction cosines of the unit vector from `from` to `to`. */
  readonly cos: Float64Array;
  readonly sin: Float64Array;
  /** EA per member, NaN where the model gives none. */
  readonly ea: Float64Array;
  readonly allHaveEa: boolean;
  /** Degree of freedom restrained by each reaction component. */
  readonly reactionDof: Int32Array;
  /** Supported joints in model order, with the index of their x and y reaction (−1: none). */
  readonly supports: readonly { joint: string; rx: number; ry: number }[];
}

/** Builds the index form of a model that `validateModel` has accepted. */
export function trussGeometry(model: TrussModel): TrussGeometry {
  const jointIds = model.joints.map((j) => j.id);
  const jointIndex = new Map(jointIds.map((id, i) => [id, i]));
  const m = model.members.length;
  const from = new Int32Array(m);
  const to = new Int32Array(m);
  const length = new Float64Array(m);
  const cos = new Float64Array(m);
  const sin = new Float64Array(m);
  const ea = new Float64Array(m);
  model.members.forEach((member, k) => {
    const a = jointIndex.get(member.from)!;
    const b = jointIndex.get(member.to)!;
    const dx = model.joints[b].x - model.joints[a].x;
    const dy = model.joints[b].y - model.joints[a].y;
    const len = Math.hypot(dx, dy);
    from[k] = a;
    to[k] = b;
    length[k] = len;
    cos[k] = dx / len;
    sin[k] = dy / len;
    ea[k] = member.ea ?? NaN;
  });
  const dofs: number[] = [];
  const supports = model.supports.map((s) => {
    const j = jointIndex.get(s.joint)!;
    const restrainsX = s.type === 'pin' || s.normal === 'x';
    const restrainsY = s.type === 'pin' || s.normal !== 'x';
    const rx = restrainsX ? m + dofs.push(2 * j) - 1 : -1;
    const ry = restrainsY ? m + dofs.push(2 * j + 1) - 1 : -1;
    return { joint: s.joint, rx, ry };
  });
  const memberIds = model.members.map(memberId);
  return {
    jointIds,
    jointIndex,
    memberIds,
    memberIndex: new Map(memberIds.map((id, i) => [id, i])),
    from,
    to,
    length,
    cos,
    sin,
    ea,
    allHaveEa: model.members.every((mb) => mb.ea !== undefined),
    reactionDof: Int32Array.from(dofs),
    supports,
  };
}

/**
 * The 2j × (m + r) equilibrium matrix A, row-major: A·x + P = 0 is ΣF = 0 at every joint, where
 * x = [member forces; reactions] and P the applied loads. A tension member pulls each end toward
 * the other, so its column holds +e at `from` and −e at `to`.
 */
export function equilibriumMatrix(g: TrussGeometry): Float64Array {
  const rows = 2 * g.jointIds.length;
  const m = g.memberIds.length;
  const cols = m + g.reactionDof.length;
  const a = new Float64Array(rows * cols);
  for (let k = 0; k < m; k++) {
    const i = g.from[k];
    const j = g.to[k];
    a[2 * i * cols + k] = g.cos[k];
    a[(2 * i + 1) * cols + k] = g.sin[k];
    a[2 * j * cols + k] = -g.cos[k];
    a[(2 * j + 1) * cols + k] = -g.sin[k];
  }
  g.reactionDof.forEach((dof, r) => {
    a[dof * cols + m + r] = 1;
  });
  return a;
}
