import type { Joint, Member, Support, TrussModel } from '../../../../../shared/engine/analysis';

/**
 * Truss layouts for tests. Bottom joints are L0…Ln, top joints U…; members take the default id
 * (from + to). Supports: pin at L0, roller (normal y) at Ln. Dimensions are demo values.
 */

const pinAndRoller = (n: number): Support[] => [
  { joint: 'L0', type: 'pin' },
  { joint: `L${n}`, type: 'roller' },
];

const withEa = (members: Member[], ea?: number): Member[] =>
  ea === undefined ? members : members.map((m) => ({ ...m, ea }));

/** King post: tie L0–L1–L2, rafters to the peak U1 above L1, king post L1–U1. */
export function kingPost(span: number, rise: number, ea?: number): TrussModel {
  const joints: Joint[] = [
    { id: 'L0', x: 0, y: 0 },
    { id: 'L1', x: span / 2, y: 0 },
    { id: 'L2', x: span, y: 0 },
    { id: 'U1', x: span / 2, y: rise },
  ];
  const members: Member[] = [
    { from: 'L0', to: 'L1' },
    { from: 'L1', to: 'L2' },
    { from: 'L0', to: 'U1' },
    { from: 'U1', to: 'L2' },
    { from: 'L1', to: 'U1' },
  ];
  return { joints, members: withEa(members, ea), supports: pinAndRoller(2) };
}

/**
 * Parallel-chord Pratt with `n` (even) panels of width a and height h: inclined end posts
 * L0–U1 and Ln–U(n−1), verticals Lk–Uk, diagonals Uk–L(k+1) left of midspan and Uk–L(k−1) right.
 */
export function parallelPratt(n: number, a: number, h: number, ea?: number): TrussModel {
  const joints: Joint[] = [];
  for (let k = 0; k <= n; k++) joints.push({ id: `L${k}`, x: k * a, y: 0 });
  for (let k = 1; k < n; k++) joints.push({ id: `U${k}`, x: k * a, y: h });
  const members: Member[] = [];
  for (let k = 0; k < n; k++) members.push({ from: `L${k}`, to: `L${k + 1}` });
  for (let k = 1; k < n - 1; k++) members.push({ from: `U${k}`, to: `U${k + 1}` });
  members.push({ from: 'L0', to: 'U1' }, { from: `U${n - 1}`, to: `L${n}` });
  for (let k = 1; k < n; k++) members.push({ from: `L${k}`, to: `U${k}` });
  for (let k = 1; k < n / 2; k++) members.push({ from: `U${k}`, to: `L${k + 1}` });
  for (let k = n / 2 + 1; k < n; k++) members.push({ from: `U${k}`, to: `L${k - 1}` });
  return { joints, members: withEa(members, ea), supports: pinAndRoller(n) };
}

/**
 * Pitched (triangular) truss with `n` (even) bottom panels over `span`; top joints U1…U(n−1)
 * above L1…L(n−1) on straight rafters rising to `rise` at midspan. `howe`: diagonals rise toward
 * midspan (Lk–U(k+1)); `pratt`: they fall toward midspan (Uk–L(k+1)).
 */
export function pitchedTruss(
  n: number,
  span: number,
  rise: number,
  style: 'howe' | 'pratt',
  ea?: number,
): TrussModel {
  const a = span / n;
  const joints: Joint[] = [];
  for (let k = 0; k <= n; k++) joints.push({ id: `L${k}`, x: k * a, y: 0 });
  for (let k = 1; k < n; k++) {
    joints.push({ id: `U${k}`, x: k * a, y: (rise * Math.min(k, n - k)) / (n / 2) });
  }
  const top = (k: number) => (k === 0 || k === n ? `L${k}` : `U${k}`);
  const members: Member[] = [];
  for (let k = 0; k < n; k++) members.push({ from: `L${k}`, to: `L${k + 1}` });
  for (let k = 0; k < n; k++) members.push({ from: top(k), to: top(k + 1) });
  for (let k = 1; k < n; k++) members.push({ from: `L${k}`, to: `U${k}` });
  for (let k = 1; k < n / 2; k++) {
    const mirror = n - k;
    if (style === 'howe') {
      members.push(
        { from: `L${k}`, to: `U${k + 1}` },
        { from: `L${mirror}`, to: `U${mirror - 1}` },
      );
    } else {
      members.push(
        { from: `U${k}`, to: `L${k + 1}` },
        { from: `U${mirror}`, to: `L${mirror - 1}` },
      );
    }
  }
  return { joints, members: withEa(members, ea), supports: pinAndRoller(n) };
}

/**
 * Warren with `n` bottom panels of width a; top joint Uk at x = (k + ½)a and height heights[k]
 * (k = 0…n−1), diagonals Lk–Uk–L(k+1), top chord Uk–U(k+1).
 */
export function warren(n: number, a: number, heights: readonly number[], ea?: number): TrussModel {
  const joints: Joint[] = [];
  for (let k = 0; k <= n; k++) joints.push({ id: `L${k}`, x: k * a, y: 0 });
  for (let k = 0; k < n; k++) joints.push({ id: `U${k}`, x: (k + 0.5) * a, y: heights[k] });
  const members: Member[] = [];
  for (let k = 0; k < n; k++) {
    members.push({ from: `L${k}`, to: `L${k + 1}` });
    members.push({ from: `L${k}`, to: `U${k}` }, { from: `U${k}`, to: `L${k + 1}` });
    if (k + 1 < n) members.push({ from: `U${k}`, to: `U${k + 1}` });
  }
  return { joints, members: withEa(members, ea), supports: pinAndRoller(n) };
}

/** Downward load P at each listed joint. */
export const downAt = (joints: readonly string[], p: number) =>
  joints.map((joint) => ({ joint, fy: -p }));

/** Looks up a member's force by id. */
export const forceOf = (r: { members: { id: string; force: number }[] }, id: string): number => {
  const f = r.members.find((m) => m.id === id);
  if (!f) throw new Error(`no member ${id}`);
  return f.force;
};
