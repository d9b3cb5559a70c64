import type { BuilderQuote } from '../../../shared/api/portal';
import type { DrawingModel } from '../../components/truss/model';

/**
 * The drawing model of a quoted truss: the quote keeps joints in its own units (inches or mm) and
 * the drawing wants mm. Geometry only: no forces, no bearings marked.
 */
export function drawingFromQuote(
  d: BuilderQuote['designs'][number],
  units: 'imperial' | 'metric',
): DrawingModel {
  const k = units === 'imperial' ? 25.4 : 1;
  const joints = d.joints.map((j) => ({ id: j.id, x: j.x * k, y: j.y * k }));
  const xs = joints.map((j) => j.x);
  const ys = joints.map((j) => j.y);
  return {
    joints,
    members: d.members.map((m) => ({
      id: `${m.from}${m.to}`,
      from: m.from,
      to: m.to,
      role: m.role as DrawingModel['members'][number]['role'],
    })),
    supports: [],
    overhangs: [],
    span: Math.max(...xs) - Math.min(...xs),
    rise: Math.max(...ys) - Math.min(...ys),
    heelHeight: 0,
  };
}

/** Whole days from today to a YYYY-MM-DD date (negative once past). */
export function daysLeft(date: string, today = new Date()) {
  const t = Date.UTC(today.getFullYear(), today.getMonth(), today.getDate());
  return Math.round((Date.parse(`${date}T00:00:00Z`) - t) / 86_400_000);
}
