import { EngineError } from '../errors';
import { TOLERANCE } from '../units';
import {
  DEFAULT_STOCK_LENGTH,
  FLAT_DEPTH_RANGE,
  FLAT_PANEL_RANGE,
  HEEL_RANGE,
  MIN_MEMBER_LENGTH,
  OVERHANG_RANGE,
  PITCH_RANGE,
  SCISSOR_MIN_PITCH_DIFFERENCE,
  SPAN_RANGE,
  describeLength,
  type Range,
} from './limits';
import { PROFILE_KIND_LABELS } from './kinds';
import type { ProfileKind, ProfileParams } from './types';

const fail = (message: string, details: Record<string, unknown>): never => {
  throw new EngineError('geometry', message, details);
};

const requireFinite = (field: string, value: unknown, what: string): number => {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    fail(`${what} must be a number; got ${String(value)}.`, { field, value });
  }
  return value as number;
};

const requireLengthIn = (field: string, value: number, range: Range, what: string): void => {
  // The engine's one tolerance: a limit reached through a unit conversion (4 ft = 1219.2 mm)
  // may arrive a rounding error outside it.
  const slack = TOLERANCE * Math.max(Math.abs(range.min), Math.abs(range.max));
  if (value < range.min - slack || value > range.max + slack) {
    fail(
      `${what} ${describeLength(value)} is outside the allowed ${describeLength(range.min)} – ` +
        `${describeLength(range.max)}.`,
      { field, value, min: range.min, max: range.max },
    );
  }
};

/**
 * Checks the parameters that matter for `params.kind` and returns the stock length to use.
 * Parameters meaningless for the kind (pitch and heel for flat, depth and panels for pitched
 * kinds, bottomPitch outside scissor) are ignored. Throws EngineError('geometry') with a message in
 * the user's terms.
 */
export const validateProfileParams = (params: ProfileParams): number => {
  const kind: ProfileKind = params.kind;
  if (!(kind in SPAN_RANGE)) fail(`Unknown truss profile "${String(kind)}".`, { field: 'kind' });
  const name = PROFILE_KIND_LABELS[kind];

  const span = requireFinite('span', params.span, 'Span');
  requireLengthIn('span', span, SPAN_RANGE[kind], `Span for a ${name} truss:`);

  for (const side of ['overhangLeft', 'overhangRight'] as const) {
    const what = side === 'overhangLeft' ? 'Left overhang' : 'Right overhang';
    requireLengthIn(side, requireFinite(side, params[side], what), OVERHANG_RANGE, what);
  }

  let stock = DEFAULT_STOCK_LENGTH;
  if (params.maxStockLength !== undefined) {
    stock = requireFinite('maxStockLength', params.maxStockLength, 'Longest stock length');
    if (stock <= MIN_MEMBER_LENGTH) {
      fail(`Longest stock length ${describeLength(stock)} is too short to cut chords from.`, {
        field: 'maxStockLength',
        value: stock,
      });
    }
  }

  if (kind === 'flat') {
    validateFlat(params);
    return stock;
  }

  const pitch = requireFinite('pitch', params.pitch, 'Pitch');
  if (pitch < PITCH_RANGE.min || pitch > PITCH_RANGE.max) {
    fail(
      `Pitch ${pitch}/12 is outside the ${PITCH_RANGE.min}/12 – ${PITCH_RANGE.max}/12 this product ` +
        `builds (${PITCH_RANGE.min}/12 is the flattest pitched truss).`,
      { field: 'pitch', value: pitch, min: PITCH_RANGE.min, max: PITCH_RANGE.max },
    );
  }

  const heel = requireFinite('heelHeight', params.heelHeight, 'Heel height');
  if (heel < 0) fail('Heel height cannot be negative.', { field: 'heelHeight', value: heel });
  if (heel > HEEL_RANGE.max) {
    fail(
      `Heel height ${describeLength(heel)} is taller than the ${describeLength(HEEL_RANGE.max)} ` +
        `a raised heel allows.`,
      { field: 'heelHeight', value: heel, max: HEEL_RANGE.max },
    );
  }
  if (heel > 0 && heel < MIN_MEMBER_LENGTH) {
    fail(
      `Heel height ${describeLength(heel)} is too short for a heel post (at least ` +
        `${describeLength(MIN_MEMBER_LENGTH)}); use 0 for a standard pointed heel.`,
      { field: 'heelHeight', value: heel, min: MIN_MEMBER_LENGTH },
    );
  }

  if (kind === 'scissor') validateScissor(params.bottomPitch, pitch);
  return stock;
};

const validateScissor = (value: number | undefined, pitch: number): void => {
  if (value === undefined)
    fail('A scissor truss needs a bottom-chord pitch.', { field: 'bottomPitch' });
  const bottomPitch = requireFinite('bottomPitch', value, 'Bottom-chord pitch');
  if (bottomPitch < 0) {
    fail('Bottom-chord pitch cannot be negative.', { field: 'bottomPitch', value: bottomPitch });
  }
  const max = pitch - SCISSOR_MIN_PITCH_DIFFERENCE;
  if (bottomPitch >= max) {
    fail(
      `Bottom-chord pitch ${bottomPitch}/12 is too steep for a ${pitch}/12 top chord: keep it ` +
        `below ${Math.max(0, max)}/12 (at least ${SCISSOR_MIN_PITCH_DIFFERENCE}/12 flatter; ` +
        `half the top pitch is typical).`,
      { field: 'bottomPitch', value: bottomPitch, max },
    );
  }
};

const validateFlat = (params: ProfileParams): void => {
  if (params.depth === undefined) fail('A flat truss needs a depth.', { field: 'depth' });
  const depth = requireFinite('depth', params.depth, 'Depth');
  requireLengthIn('depth', depth, FLAT_DEPTH_RANGE, 'Depth of a flat truss:');

  if (params.panels === undefined) fail('A flat truss needs a panel count.', { field: 'panels' });
  const panels = requireFinite('panels', params.panels, 'Panel count');
  if (
    !Number.isInteger(panels) ||
    panels % 2 !== 0 ||
    panels < FLAT_PANEL_RANGE.min ||
    panels > FLAT_PANEL_RANGE.max
  ) {
    fail(
      `A flat truss needs an even number of panels from ${FLAT_PANEL_RANGE.min} to ` +
        `${FLAT_PANEL_RANGE.max}; got ${panels}.`,
      { field: 'panels', value: panels },
    );
  }
};
