import { designInputSchema, toEngineInput, type DesignInput } from '../../../shared/api/design';
import {
  designTruss,
  presentDesign,
  type DesignOptions,
  type PresentedDesign,
} from '../../../shared/engine/design';
import { generateProfile } from '../../../shared/engine/profiles';
import type { ProfileParams } from '../../../shared/engine/profiles/types';
import { drawingFromDesign, presentedToMm } from './from-design';
import type { DrawingModel, DrawingOverhang } from './model';
import { withPointLoads } from './point-loads';

/** A design run in the browser: the presented result and its drawing. */
export interface DesignRun {
  presented: PresentedDesign;
  drawing: DrawingModel;
}

/**
 * The overhangs of the analysed line model. The engine analyses a standard heel as pointed, so
 * the profile is regenerated with the analysed heel height to find the joint each overhang
 * leaves from; a profile the generator refuses simply has no overhangs drawn.
 */
export function overhangsOf(params: ProfileParams, analysedHeel: number): DrawingOverhang[] {
  try {
    return generateProfile({ ...params, heelHeight: analysedHeel }).overhangs.map((o) => ({
      side: o.side,
      heelJoint: o.heelJoint,
      horizontal: o.horizontal,
      member: o.member,
    }));
  } catch {
    return [];
  }
}

/**
 * Runs the full engine on a checked input, in the user's units, with the plant's design rules
 * (the same options the server designs with). Throws EngineError.
 */
export function runDesign(input: DesignInput, options: DesignOptions = {}): DesignRun {
  const engine = toEngineInput(input);
  const design = designTruss(engine, options);
  const presented = presentDesign(design, input.units);
  const drawing = drawingFromDesign(presented, {
    overhangs: overhangsOf(engine.profile, design.heelHeight.analysed),
    pitch: input.profile === 'flat' ? undefined : input.pitch,
  });
  return { presented, drawing: withPointLoads(drawing, input) };
}

/**
 * The drawing of a stored line: its server result drawn as is, with the overhangs and pitch
 * read from the stored design input (absent when that input no longer parses).
 */
export function drawingOfStoredLine(
  designInput: Record<string, unknown>,
  result: PresentedDesign,
): DrawingModel {
  const parsed = designInputSchema.safeParse(designInput);
  if (!parsed.success) return drawingFromDesign(result, { overhangs: [] });
  const engine = toEngineInput(parsed.data);
  const analysed = presentedToMm(result, result.heelHeight.analysed.value);
  const drawing = drawingFromDesign(result, {
    overhangs: overhangsOf(engine.profile, analysed),
    pitch: parsed.data.profile === 'flat' ? undefined : parsed.data.pitch,
  });
  return withPointLoads(drawing, parsed.data);
}
