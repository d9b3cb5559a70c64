import type { Joint } from '../analysis/types';
import { checkMemberGeometry } from './checks';
import { jointLabel, memberId } from './labels';
import type { Layout } from './layout';
import { spliceRun } from './pieces';
import type {
  MemberRole,
  Overhang,
  Piece,
  ProfileMember,
  ProfileParams,
  TrussProfile,
} from './types';

interface Edge {
  a: number;
  b: number;
  role: MemberRole;
}

/**
 * Turns a layout into the labelled profile.
 *
 * Order, documented for users and tests:
 * - joints A, B, C …: bottom-chord joints left to right, then the remaining top-chord joints
 *   left to right (a pointed heel is a bottom-chord joint);
 * - members: top chord left to right, bottom chord left to right, then webs by the x of their
 *   mid-point (then its y), each named by its two joint labels in label order;
 * - pieces: TC1 … along the top chord left to right, BC1 … along the bottom chord, W1 … one per
 *   web in member order.
 */
export const assembleProfile = (
  params: ProfileParams,
  layout: Layout,
  stock: number,
): TrussProfile => {
  const { points, top, bottom } = layout;
  const order = new Array<number>(points.length).fill(-1);
  let next = 0;
  for (const i of bottom) if (order[i] < 0) order[i] = next++;
  for (const i of top) if (order[i] < 0) order[i] = next++;
  for (let i = 0; i < points.length; i++) if (order[i] < 0) order[i] = next++;

  const labels = order.map(jointLabel);
  const joints: Joint[] = new Array<Joint>(points.length);
  for (let i = 0; i < points.length; i++) {
    joints[order[i]] = { id: labels[i], x: points[i].x, y: points[i].y };
  }

  const chordEdges = (chain: number[], role: MemberRole): Edge[] =>
    chain.slice(1).map((b, k) => ({ a: chain[k], b, role }));
  const midX = (e: Edge) => points[e.a].x + points[e.b].x;
  const midY = (e: Edge) => points[e.a].y + points[e.b].y;
  const webEdges = layout.webs
    .map(([a, b]): Edge => ({ a, b, role: 'web' }))
    .sort((e, f) => midX(e) - midX(f) || midY(e) - midY(f));
  const edges = [...chordEdges(top, 'topChord'), ...chordEdges(bottom, 'bottomChord'), ...webEdges];

  const members: ProfileMember[] = edges.map(({ a, b, role }) => {
    const [lo, hi] = order[a] < order[b] ? [a, b] : [b, a];
    const length = Math.hypot(points[hi].x - points[lo].x, points[hi].y - points[lo].y);
    return { id: memberId(labels[lo], labels[hi]), from: labels[lo], to: labels[hi], role, length };
  });
  checkMemberGeometry(joints, members);

  const topCount = top.length - 1;
  const topMembers = members.slice(0, topCount);
  const bottomMembers = members.slice(topCount, topCount + bottom.length - 1);
  const webMembers = members.slice(topCount + bottom.length - 1);

  // Overhangs continue the end top-chord members at their slope: length along = run × secant.
  const secant = (a: number, b: number) =>
    Math.hypot(points[b].x - points[a].x, points[b].y - points[a].y) /
    Math.abs(points[b].x - points[a].x);
  const overhangs: Overhang[] = [];
  if (params.overhangLeft > 0) {
    overhangs.push({
      side: 'left',
      heelJoint: labels[top[0]],
      horizontal: params.overhangLeft,
      slopeLength: params.overhangLeft * secant(top[0], top[1]),
      member: topMembers[0].id,
    });
  }
  if (params.overhangRight > 0) {
    overhangs.push({
      side: 'right',
      heelJoint: labels[top[topCount]],
      horizontal: params.overhangRight,
      slopeLength: params.overhangRight * secant(top[topCount - 1], top[topCount]),
      member: topMembers[topCount - 1].id,
    });
  }
  const extraLeft = overhangs.find((o) => o.side === 'left')?.slopeLength ?? 0;
  const extraRight = overhangs.find((o) => o.side === 'right')?.slopeLength ?? 0;
  const topLabels = top.map((i) => labels[i]);
  const bottomLabels = bottom.map((i) => labels[i]);

  const pieces: Piece[] = [
    ...chordPieces(
      'TC',
      'topChord',
      topMembers,
      topLabels,
      layout.topBreaks,
      stock,
      extraLeft,
      extraRight,
    ),
    ...chordPieces(
      'BC',
      'bottomChord',
      bottomMembers,
      bottomLabels,
      layout.bottomBreaks,
      stock,
      0,
      0,
    ),
    ...webMembers.map((m, k): Piece => ({
      id: `W${k + 1}`,
      role: 'web',
      members: [m.id],
      length: m.length,
    })),
  ];

  return {
    params: { ...params, maxStockLength: stock },
    joints,
    members,
    supports: [
      { joint: labels[bottom[0]], type: 'pin' },
      { joint: labels[bottom[bottom.length - 1]], type: 'roller', normal: 'y' },
    ],
    pieces,
    overhangs,
    topChordJoints: topLabels,
    bottomChordJoints: bottomLabels,
    rise: layout.rise,
  };
};

/**
 * Pieces of one chord: it breaks where it changes direction (`breaks`, positions in the chord's
 * joint list), each run is spliced to fit the stock, and the overhangs ride on the end pieces.
 */
const chordPieces = (
  prefix: 'TC' | 'BC',
  role: MemberRole,
  members: ProfileMember[],
  jointIds: string[],
  breaks: number[],
  stock: number,
  extraLeft: number,
  extraRight: number,
): Piece[] => {
  const pieces: Piece[] = [];
  const bounds = [0, ...breaks, members.length];
  for (let r = 0; r + 1 < bounds.length; r++) {
    const from = bounds[r];
    const run = members.slice(from, bounds[r + 1]);
    const lengths = run.map((m) => m.length);
    if (from === 0) lengths[0] += extraLeft;
    if (bounds[r + 1] === members.length) lengths[lengths.length - 1] += extraRight;
    const cuts = spliceRun(
      lengths,
      stock,
      run.map((m) => m.id),
    );
    const ends = [0, ...cuts, run.length];
    for (let c = 0; c + 1 < ends.length; c++) {
      const spliceAt: string[] = [];
      if (c > 0) spliceAt.push(jointIds[from + ends[c]]);
      if (c + 2 < ends.length) spliceAt.push(jointIds[from + ends[c + 1]]);
      const piece: Piece = {
        id: `${prefix}${pieces.length + 1}`,
        role,
        members: run.slice(ends[c], ends[c + 1]).map((m) => m.id),
        length: lengths.slice(ends[c], ends[c + 1]).reduce((sum, l) => sum + l, 0),
      };
      if (spliceAt.length > 0) piece.spliceAt = spliceAt;
      pieces.push(piece);
    }
  }
  return pieces;
};
