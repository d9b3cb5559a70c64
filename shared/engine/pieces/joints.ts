/**
 * Stage 2: cut the boards where they meet at each joint. At a joint the higher-ranked board runs
 * through (a chord through its webs; a top chord over a bottom chord at a heel; a vertical through
 * a diagonal), and each board ending there is cut back to the near edge of every higher board it
 * still overlaps: first the one its centre line runs into first on its way to the joint, then
 * whichever it still overlaps most. Boards of equal rank that end at the same joint
 * and still overlap are mitred: both are cut on the line through the crossing of their facing
 * edges and the crossing of their far edges (a plumb cut at a symmetric peak, a square butt at a
 * splice). Common practice.
 */
import type { Board } from './boards';
import { add, clip, crossing, dot, overlapArea, sideOf, sub, type HalfPlane } from './polygon';
import type { XY } from './types';

/** Overlap below this is touching, mm² (a thousandth of a square millimetre). */
const TOUCH = 1e-3;

/** A point on a board's strip centre, half-way along its piece. */
const middle = (b: Board): XY => add(add(b.start, b.u, b.span / 2), b.n, (b.t0 + b.t1) / 2);

/** The half-plane beyond `q`'s near edge as seen from `p`: where `p` may stay. */
const beyondEdge = (p: Board, q: Board): HalfPlane => {
  const far = middle(p);
  const t = dot(sub(far, q.start), q.n);
  const edge = t >= (q.t0 + q.t1) / 2 ? q.t1 : q.t0;
  return sideOf(
    add(q.start, q.n, edge),
    q.n,
    add(q.start, q.n, edge + (t >= (q.t0 + q.t1) / 2 ? 1 : -1)),
  );
};

/** The mitre line of two boards meeting at `joint`, as the half-plane each keeps. */
const mitre = (p: Board, q: Board, joint: XY): [HalfPlane, HalfPlane] | undefined => {
  const fp = middle(p);
  const fq = middle(q);
  if (Math.abs(p.u[0] * q.u[1] - p.u[1] * q.u[0]) < 1e-9) {
    // Collinear (a splice): a square butt at the joint.
    return [sideOf(joint, p.u, fp), sideOf(joint, p.u, fq)];
  }
  const edges = (b: Board, toward: XY): [XY, XY] => {
    const t = dot(sub(toward, b.start), b.n);
    const facing = t >= (b.t0 + b.t1) / 2 ? b.t1 : b.t0;
    const away = facing === b.t1 ? b.t0 : b.t1;
    return [add(b.start, b.n, facing), add(b.start, b.n, away)];
  };
  const [pFace, pAway] = edges(p, fq);
  const [qFace, qAway] = edges(q, fp);
  const inner = crossing(pFace, p.u, qFace, q.u);
  const outer = crossing(pAway, p.u, qAway, q.u);
  if (!inner || !outer) return undefined;
  const w = sub(outer, inner);
  if (Math.hypot(w[0], w[1]) < 1e-9) return undefined;
  const normal: XY = [-w[1], w[0]];
  const hp = sideOf(inner, normal, fp);
  const hq = sideOf(inner, normal, fq);
  // Both middles on one side: not a mitre (the boards cross); leave it to the caller.
  if (hp.a * hq.a + hp.b * hq.b > 0) return undefined;
  return [hp, hq];
};

/**
 * How far along the segment a → b it first enters the convex ring (Cyrus–Beck), as a fraction;
 * undefined when it misses.
 */
const entry = (a: XY, b: XY, ring: readonly XY[]): number | undefined => {
  let lo = 0;
  let hi = 1;
  const d = sub(b, a);
  for (let i = 0; i < ring.length; i++) {
    const p = ring[i];
    const q = ring[(i + 1) % ring.length];
    // Inside is left of each edge of a counter-clockwise ring: n·(x − p) ≥ 0 with n = (−ey, ex).
    const n: XY = [-(q[1] - p[1]), q[0] - p[0]];
    const num = dot(n, sub(a, p));
    const den = dot(n, d);
    if (Math.abs(den) < 1e-15) {
      if (num < 0) return undefined;
    } else if (den > 0) lo = Math.max(lo, -num / den);
    else hi = Math.min(hi, -num / den);
    if (lo > hi) return undefined;
  }
  return lo;
};

/** The higher board `p` runs into first along its centre line toward `joint`, else the one it overlaps most. */
const firstInWay = (p: Board, higher: Board[], joint: XY): Board | undefined => {
  const overlapping = higher
    .map((q) => ({ q, area: overlapArea(p.ring, q.ring) }))
    .filter((o) => o.area > TOUCH);
  if (overlapping.length === 0) return undefined;
  const from = middle(p);
  const toward = sub(joint, from);
  const length = Math.hypot(toward[0], toward[1]);
  // Past the joint by the full reach of any cut (boards are at most a few hundred mm deep).
  const to = add(from, toward, 1 + 10_000 / Math.max(length, 1));
  let best: { q: Board; at: number } | undefined;
  for (const { q } of overlapping) {
    const at = entry(from, to, q.ring);
    if (at !== undefined && (!best || at < best.at)) best = { q, at };
  }
  return best?.q ?? overlapping.sort((x, y) => y.area - x.area)[0].q;
};

/** Cuts every board at every joint it ends at (stage 2); the boards' rings are replaced. */
export const cutAtJoints = (boards: Board[], joints: ReadonlyMap<string, XY>): void => {
  for (const [id, point] of joints) {
    const here = boards.filter((b) => b.joints.includes(id));
    const ending = (b: Board) => b.joints[0] === id || b.joints[b.joints.length - 1] === id;
    const ranks = [...new Set(here.map((b) => b.rank))].sort((a, b) => b - a);
    for (const rank of ranks) {
      const level = here.filter((b) => b.rank === rank && ending(b));
      const higher = here.filter((b) => b.rank > rank);
      for (const p of level) {
        // Each cut can only shrink the overlap with the others, so this ends.
        for (let guard = 0; guard < higher.length; guard++) {
          const q = firstInWay(p, higher, point);
          if (!q) break;
          p.ring = clip(p.ring, beyondEdge(p, q));
        }
      }
      for (let i = 0; i < level.length; i++) {
        for (let j = i + 1; j < level.length; j++) {
          const [p, q] = [level[i], level[j]];
          if (overlapArea(p.ring, q.ring) <= TOUCH) continue;
          const cut = mitre(p, q, point);
          if (cut) {
            p.ring = clip(p.ring, cut[0]);
            q.ring = clip(q.ring, cut[1]);
          } else {
            q.ring = clip(q.ring, beyondEdge(q, p));
          }
        }
      }
    }
  }
};
