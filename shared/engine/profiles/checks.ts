import type { Joint } from '../analysis/types';
import { EngineError } from '../errors';
import { MIN_JOINT_ANGLE_DEG, MIN_MEMBER_LENGTH, describeLength } from './limits';
import type { ProfileMember } from './types';

const MIN_ANGLE_RAD = (MIN_JOINT_ANGLE_DEG * Math.PI) / 180;

/**
 * Refuses members the shop cannot build: any member shorter than MIN_MEMBER_LENGTH, and any two
 * members meeting at a joint at less than MIN_JOINT_ANGLE_DEG (a panel with nearly parallel
 * members). Throws EngineError('geometry') naming the members.
 */
export const checkMemberGeometry = (joints: Joint[], members: ProfileMember[]): void => {
  for (const m of members) {
    if (m.length < MIN_MEMBER_LENGTH) {
      const what = m.role === 'web' ? 'Web' : 'Chord panel';
      throw new EngineError(
        'geometry',
        `${what} ${m.id} would be only ${describeLength(m.length)} long; the shortest member ` +
          `the shop builds is ${describeLength(MIN_MEMBER_LENGTH)}. Increase the span, pitch ` +
          `or heel, or choose a profile with fewer panels.`,
        { member: m.id, length: m.length, min: MIN_MEMBER_LENGTH },
      );
    }
  }

  const byId = new Map<string, Joint>();
  for (const j of joints) byId.set(j.id, j);
  // Unit direction of every member end, grouped by joint.
  const rays = new Map<string, Array<{ member: string; ux: number; uy: number }>>();
  for (const m of members) {
    const a = byId.get(m.from) as Joint;
    const b = byId.get(m.to) as Joint;
    const ux = (b.x - a.x) / m.length;
    const uy = (b.y - a.y) / m.length;
    for (const [joint, sx] of [
      [m.from, 1],
      [m.to, -1],
    ] as const) {
      let list = rays.get(joint);
      if (!list) rays.set(joint, (list = []));
      list.push({ member: m.id, ux: sx * ux, uy: sx * uy });
    }
  }
  for (const [joint, list] of rays) {
    for (let i = 0; i < list.length; i++) {
      for (let k = i + 1; k < list.length; k++) {
        const p = list[i];
        const q = list[k];
        const angle = Math.atan2(Math.abs(p.ux * q.uy - p.uy * q.ux), p.ux * q.ux + p.uy * q.uy);
        if (angle < MIN_ANGLE_RAD) {
          throw new EngineError(
            'geometry',
            `Members ${p.member} and ${q.member} meet at joint ${joint} at only ` +
              `${((angle * 180) / Math.PI).toFixed(1)}°, too close to parallel to build or ` +
              `analyse (at least ${MIN_JOINT_ANGLE_DEG}°). Change the span, pitch or heel.`,
            { joint, members: [p.member, q.member], angleDeg: (angle * 180) / Math.PI },
          );
        }
      }
    }
  }
};
