import {
  DEFAULT_DESIGN_RULES,
  type DesignRules,
  type DesignRulesDetail,
} from '../../shared/api/plant';
import type { DesignOptions } from '../../shared/engine/design';
import { Plant } from '../models';

/** A plant's design rules with their version (defaults for a plant that never set them). */
export function designRulesOf(plant: Plant): DesignRulesDetail {
  const stored = plant.settings?.designRules ?? {};
  return {
    amplifyPanelPointMoment:
      stored.amplifyPanelPointMoment ?? DEFAULT_DESIGN_RULES.amplifyPanelPointMoment,
    version: stored.version ?? 0,
  };
}

/** The design rules of a plant by id, for commands that hold only the order. */
export async function loadDesignRules(plantId: number): Promise<DesignRules> {
  const plant = await Plant.findByPk(plantId);
  if (!plant) return DEFAULT_DESIGN_RULES;
  const { amplifyPanelPointMoment } = designRulesOf(plant);
  return { amplifyPanelPointMoment };
}

/** The engine's options for a plant's rules. */
export const engineOptionsOf = (rules: DesignRules): DesignOptions => ({
  ...(rules.amplifyPanelPointMoment && { amplifyPanelPointMoment: true }),
});
