import { EngineError } from '../errors';
import { TOLERANCE } from '../units';
import type { JointLoad, Member, TrussModel } from './types';

/** What is wrong with one part of a model; `validateModel` reports all of them at once. */
export interface ValidationIssue {
  kind:
    | 'no_joints'
    | 'no_supports'
    | 'unknown_joint'
    | 'duplicate_joint'
    | 'duplicate_member'
    | 'self_member'
    | 'zero_length_member'
    | 'coincident_joints'
    | 'non_finite'
    | 'non_positive_ea'
    | 'duplicate_support'
    | 'bad_support';
  message: string;
  /** Ids involved (joints, members or both). */
  ids: string[];
}

/** A member's id: its own, or its two joint ids joined ("AB"). */
export const memberId = (member: Member): string => member.id ?? member.from + member.to;

const isFiniteNumber = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

/** Largest extent of the joints' bounding box: the scale that "coincident" is measured against. */
export function modelSize(joints: TrussModel['joints']): number {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const j of joints) {
    minX = Math.min(minX, j.x);
    maxX = Math.max(maxX, j.x);
    minY = Math.min(minY, j.y);
    maxY = Math.max(maxY, j.y);
  }
  return joints.length === 0 ? 0 : Math.max(maxX - minX, maxY - minY);
}

/** Loads: every joint must exist and every component must be a finite number. */
export function loadIssues(loads: readonly JointLoad[], jointIds: { has(id: string): boolean }) {
  const issues: ValidationIssue[] = [];
  loads.forEach((load, i) => {
    if (!jointIds.has(load.joint)) {
      issues.push({
        kind: 'unknown_joint',
        message: `load ${i + 1} is on unknown joint "${load.joint}"`,
        ids: [load.joint],
      });
    }
    for (const key of ['fx', 'fy'] as const) {
      const v = load[key];
      if (v !== undefined && !isFiniteNumber(v)) {
        issues.push({
          kind: 'non_finite',
          message: `load ${i + 1} on joint "${load.joint}" has ${key} = ${String(v)}`,
          ids: [load.joint],
        });
      }
    }
  });
  return issues;
}

function jointIssues(model: TrussModel): ValidationIssue[] {
  const issues: ValidationIssue[] = [];
  const seen = new Set<string>();
  for (const j of model.joints) {
    if (seen.has(j.id)) {
      issues.push({
        kind: 'duplicate_joint',
        message: `joint id "${j.id}" is used twice`,
        ids: [j.id],
      });
    }
    seen.add(j.id);
    if (!isFiniteNumber(j.x) || !isFiniteNumber(j.y)) {
      issues.push({
        kind: 'non_finite',
        message: `joint "${j.id}" has coordinates (${String(j.x)}, ${String(j.y)})`,
        ids: [j.id],
      });
    }
  }
  const finite = model.joints.filter((j) => isFiniteNumber(j.x) && isFiniteNumber(j.y));
  const limit = TOLERANCE * modelSize(finite);
  // Sweep along x so the pair test stays near-linear for large models.
  const sorted = [...finite].sort((a, b) => a.x - b.x);
  for (let a = 0; a < sorted.length; a++) {
    for (let b = a + 1; b < sorted.length && sorted[b].x - sorted[a].x <= limit; b++) {
      const p = sorted[a];
      const q = sorted[b];
      if (p.id !== q.id && Math.hypot(q.x - p.x, q.y - p.y) <= limit) {
        issues.push({
          kind: 'coincident_joints',
          message: `joints "${p.id}" and "${q.id}" are at the same point`,
          ids: [p.id, q.id],
        });
      }
    }
  }
  return issues;
}

const unknownEnd = (id: string, end: string): ValidationIssue => ({
  kind: 'unknown_joint',
  message: `member "${id}" refers to unknown joint "${end}"`,
  ids: [id, end],
});

function memberIssues(model: TrussModel, byId: ReadonlyMap<string, { x: number; y: number }>) {
  const issues: ValidationIssue[] = [];
  const seen = new Set<string>();
  const finite = model.joints.filter((j) => isFiniteNumber(j.x) && isFiniteNumber(j.y));
  const limit = TOLERANCE * modelSize(finite);
  for (const m of model.members) {
    const id = memberId(m);
    if (seen.has(id)) {
      issues.push({
        kind: 'duplicate_member',
        message: `member id "${id}" is used twice`,
        ids: [id],
      });
    }
    seen.add(id);
    const a = byId.get(m.from);
    const b = byId.get(m.to);
    if (!a) issues.push(unknownEnd(id, m.from));
    if (!b) issues.push(unknownEnd(id, m.to));
    if (m.from === m.to) {
      issues.push({
        kind: 'self_member',
        message: `member "${id}" runs from joint "${m.from}" to itself`,
        ids: [id, m.from],
      });
    } else if (a && b && Math.hypot(b.x - a.x, b.y - a.y) <= limit) {
      issues.push({
        kind: 'zero_length_member',
        message: `member "${id}" has zero length`,
        ids: [id],
      });
    }
    if (m.ea !== undefined) {
      if (!isFiniteNumber(m.ea)) {
        issues.push({
          kind: 'non_finite',
          message: `member "${id}" has ea = ${String(m.ea)}`,
          ids: [id],
        });
      } else if (m.ea <= 0) {
        issues.push({
          kind: 'non_positive_ea',
          message: `member "${id}" has ea = ${m.ea}; it must be positive`,
          ids: [id],
        });
      }
    }
  }
  return issues;
}

function supportIssues(model: TrussModel, jointIds: ReadonlySet<string>) {
  const issues: ValidationIssue[] = [];
  if (model.supports.length === 0) {
    issues.push({ kind: 'no_supports', message: 'the truss has no supports', ids: [] });
  }
  const seen = new Set<string>();
  for (const s of model.supports) {
    if (!jointIds.has(s.joint)) {
      issues.push({
        kind: 'unknown_joint',
        message: `support on unknown joint "${s.joint}"`,
        ids: [s.joint],
      });
    }
    if (seen.has(s.joint)) {
      issues.push({
        kind: 'duplicate_support',
        message: `joint "${s.joint}" has more than one support`,
        ids: [s.joint],
      });
    }
    seen.add(s.joint);
    // Runtime guard for callers outside the type system (JSON from a form or file).
    const badType = s.type !== 'pin' && s.type !== 'roller';
    const badNormal = s.normal !== undefined && s.normal !== 'x' && s.normal !== 'y';
    if (badType || badNormal) {
      issues.push({
        kind: 'bad_support',
        message: `support on joint "${s.joint}" must be a pin or a roller with normal x or y`,
        ids: [s.joint],
      });
    }
  }
  return issues;
}

/** Every problem in a model, in a stable order (joints, members, supports, loads). */
export function modelIssues(model: TrussModel): ValidationIssue[] {
  if (model.joints.length === 0) {
    return [{ kind: 'no_joints', message: 'the truss has no joints', ids: [] }];
  }
  const byId = new Map(model.joints.map((j) => [j.id, j]));
  const jointIds = new Set(byId.keys());
  return [
    ...jointIssues(model),
    ...memberIssues(model, byId),
    ...supportIssues(model, jointIds),
    ...loadIssues(model.loads ?? [], jointIds),
  ];
}

/** Throws the collected issues as one EngineError `invalid`; a no-op when there are none. */
export function throwIfIssues(issues: ValidationIssue[], what: string): void {
  if (issues.length === 0) return;
  const shown = issues.slice(0, 5).map((i) => i.message);
  const more = issues.length > 5 ? `; and ${issues.length - 5} more` : '';
  throw new EngineError('invalid', `Invalid ${what}: ${shown.join('; ')}${more}.`, { issues });
}

/**
 * Checks a truss model before analysis. Throws EngineError `invalid` listing every problem
 * (`details.issues`): unknown or duplicate ids, zero-length or self members, coincident joints,
 * non-finite numbers, non-positive `ea`, no supports, two supports on one joint.
 */
export function validateModel(model: TrussModel): void {
  throwIfIssues(modelIssues(model), 'truss model');
}
