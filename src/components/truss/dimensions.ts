import { csiBand } from './csi';
import { overhangTips } from './geometry';
import type { DrawingModel } from './model';
import { formatLength, formatPitch, type PlantUnits } from './quantities';

/** One horizontal dimension of the chain under the truss, mm along x. */
export interface ChainSegment {
  key: 'overhangLeft' | 'span' | 'overhangRight';
  from: number;
  to: number;
  label: string;
}

/**
 * The chain of horizontal dimensions under the truss: left overhang, span (out-to-out of
 * bearings), right overhang; zero-length and undrawn overhangs are left out.
 */
export function chainDimensions(model: DrawingModel, units: PlantUnits): ChainSegment[] {
  // Only overhangs that are drawn get a dimension (a mono's tall end has no sloping cantilever).
  const drawn = overhangTips(model);
  const width = (side: 'left' | 'right') => {
    const t = drawn.find((o) => o.side === side);
    return t ? Math.abs(t.tip.x - t.heel.x) : 0;
  };
  const left = width('left');
  const right = width('right');
  const segments: ChainSegment[] = [];
  if (left > 0) {
    segments.push({ key: 'overhangLeft', from: -left, to: 0, label: formatLength(left, units) });
  }
  segments.push({ key: 'span', from: 0, to: model.span, label: formatLength(model.span, units) });
  if (right > 0) {
    segments.push({
      key: 'overhangRight',
      from: model.span,
      to: model.span + right,
      label: formatLength(right, units),
    });
  }
  return segments;
}

/** One bay of the panel-point chain: between neighbouring bottom-chord panel points, mm along x. */
export interface PanelSegment {
  key: string;
  from: number;
  to: number;
  label: string;
}

/**
 * The chain of bottom-chord panel points, left to right, as the shop drawing dimensions them
 * (centre lines, feet-inches-sixteenths or mm). Empty when the chord has a single bay, which the
 * span already states.
 */
export function panelChain(model: DrawingModel, units: PlantUnits): PanelSegment[] {
  const ids = new Set(
    model.members.filter((m) => m.role === 'bottomChord').flatMap((m) => [m.from, m.to]),
  );
  const xs = [
    ...new Set(model.joints.filter((j) => ids.has(j.id)).map((j) => Math.round(j.x * 2) / 2)),
  ].sort((a, b) => a - b);
  if (xs.length < 3) return [];
  return xs.slice(1).map((x, i) => ({
    key: `panel-${i}`,
    from: xs[i],
    to: x,
    label: formatLength(x - xs[i], units),
  }));
}

/** Height of the highest joint above the bearings, mm. */
export function overallHeight(model: DrawingModel): number {
  return Math.max(0, ...model.joints.map((j) => j.y));
}

/** The pitch symbol's text: rise over 12, or null for a flat truss. */
export function pitchSymbol(model: DrawingModel): { rise: string; run: string } | null {
  if (model.pitch === undefined || model.pitch <= 0) return null;
  return { rise: formatPitch(model.pitch).replace('/12', ''), run: '12' };
}

/**
 * A one-line description for the drawing's accessible name, e.g. `Fink (W) truss drawing,
 * 28'-0" out to out, 6/12, all members pass`. It avoids the words of the form's field labels
 * ("Span", "Pitch", "Mark") so a label lookup finds the field, not the drawing.
 */
export function drawingTitle(kindLabel: string, model: DrawingModel, units: PlantUnits): string {
  const parts = [`${kindLabel} truss drawing`, `${formatLength(model.span, units)} out to out`];
  if (model.pitch !== undefined) parts.push(formatPitch(model.pitch));
  if (model.heelHeight > 0) parts.push(`${formatLength(model.heelHeight, units)} heel`);
  const failing = model.members.filter((m) => m.csi !== undefined && csiBand(m.csi).fails).length;
  if (model.members.some((m) => m.csi !== undefined)) {
    parts.push(
      failing > 0 ? `${failing} of ${model.members.length} members fail` : 'all members pass',
    );
  }
  return parts.join(', ');
}
