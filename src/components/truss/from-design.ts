import type { PresentedDesign } from '../../../shared/engine/design';
import type { MemberRole } from '../../../shared/engine/profiles/types';
import { MM_PER_INCH, N_PER_LBF } from '../../../shared/engine/units';
import type { DrawingModel, DrawingOverhang } from './model';

/** A presented length value (in or mm) back to mm. */
export function presentedToMm(design: PresentedDesign, value: number): number {
  return design.units.length === 'in' ? value * MM_PER_INCH : value;
}

/** A presented force (lbf or kN) back to N. */
export function presentedToN(design: PresentedDesign, value: number): number {
  return design.units.force === 'lbf' ? value * N_PER_LBF : value * 1000;
}

const ROLES = new Set<MemberRole>(['topChord', 'bottomChord', 'web']);

/**
 * The drawing of a presented design (the server's stored result or the browser's own run).
 * Each member shows the force of its governing combination. The presented design carries no
 * overhang geometry or pitch, so the caller passes them from the design input.
 */
export function drawingFromDesign(
  design: PresentedDesign,
  extra: { overhangs: DrawingOverhang[]; pitch?: number },
): DrawingModel {
  const mm = (v: number) => presentedToMm(design, v);
  const combos = design.combinations.map((c) => c.name);
  return {
    joints: design.joints.map((j) => ({ id: j.id, x: mm(j.x), y: mm(j.y) })),
    members: design.members.map((m) => {
      const k = combos.indexOf(m.governingCombination);
      const governing = k >= 0 ? m.forces[k] : undefined;
      return {
        id: m.id,
        from: m.from,
        to: m.to,
        role: ROLES.has(m.role as MemberRole) ? (m.role as MemberRole) : 'web',
        piece: m.piece,
        lumber: m.lumber,
        force: governing === undefined ? undefined : presentedToN(design, governing),
        csi: m.csi,
        combination: m.governingCombination,
        check: m.governingCheck,
        braced: m.braced,
      };
    }),
    // The engine's convention (profiles/types.ts): the first bearing is pinned, the other rolls.
    supports: design.reactions.map((r, i) => ({
      joint: r.joint,
      type: i === 0 ? 'pin' : 'roller',
    })),
    overhangs: extra.overhangs,
    span: mm(design.span.value),
    rise: mm(design.rise.value),
    pitch: extra.pitch,
    heelHeight: mm(design.heelHeight.requested.value),
  };
}

/** True when `value` looks like a presented design (the stored `result` of a line). */
export function isPresentedDesign(value: unknown): value is PresentedDesign {
  if (!value || typeof value !== 'object') return false;
  const v = value as Record<string, unknown>;
  return (
    Array.isArray(v.joints) &&
    Array.isArray(v.members) &&
    Array.isArray(v.reactions) &&
    Array.isArray(v.combinations) &&
    typeof v.units === 'object' &&
    v.units !== null &&
    typeof v.span === 'object'
  );
}
