import type { DesignInput } from '../../../shared/api/design';
import { MM_PER_INCH } from '../../../shared/engine/units';
import type { DrawingModel } from './model';

const CASE = { roofLive: 'Lr', snow: 'S', floor: 'L' } as const;
const ROLE = { top: 'topChord', bottom: 'bottomChord' } as const;

/**
 * The drawing with the request's point loads marked: each at its horizontal position on its
 * chord (y read off the chord member under it), labelled "D 400 + Lr 600 lb". A load no chord
 * spans is left out (the engine reports it).
 */
export function withPointLoads(drawing: DrawingModel, input: DesignInput): DrawingModel {
  if (!input.pointLoads || input.pointLoads.length === 0) return drawing;
  const at = new Map(drawing.joints.map((j) => [j.id, j]));
  const unit = input.units === 'imperial' ? 'lb' : 'kN';
  const pointLoads = input.pointLoads.flatMap((l) => {
    const x = input.units === 'imperial' ? l.x * MM_PER_INCH : l.x;
    for (const m of drawing.members) {
      if (m.role !== ROLE[l.chord]) continue;
      const a = at.get(m.from);
      const b = at.get(m.to);
      if (!a || !b || Math.abs(b.x - a.x) < 1) continue;
      const t = (x - a.x) / (b.x - a.x);
      if (t < -1e-6 || t > 1 + 1e-6) continue;
      const parts = [`D ${l.dead}`, ...(l.live > 0 ? [`${CASE[l.kind]} ${l.live}`] : [])];
      return [
        { x, y: a.y + t * (b.y - a.y), chord: l.chord, text: `${parts.join(' + ')} ${unit}` },
      ];
    }
    return [];
  });
  return { ...drawing, pointLoads };
}
