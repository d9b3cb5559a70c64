import type { AreaLoads, DesignCriteria } from '../../shared/api/jobs';
import { jobDesignLoads } from '../../shared/api/jobLoads';
import type { PlantDetail } from '../../shared/api/plant';
import type { Plant } from '../models';
import { designRulesOf } from '../services/designRules';

/** Typical residential loads, 20/10/0/10 psf (DESIGN.md §1, common practice); kPa by exact conversion. */
export const DEFAULT_LOADS: Record<'imperial' | 'metric', AreaLoads> = {
  imperial: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
  metric: { tcll: 0.96, tcdl: 0.48, bcll: 0, bcdl: 0.48 },
};

/** A job's loads for its trusses: the plant's defaults with the job's overrides, snow and wind. */
export const jobDesignLoadsOf = (plant: Plant, criteria: DesignCriteria) =>
  jobDesignLoads(plantDefaultLoads(plant), criteria);

export const plantDefaultLoads = (plant: Plant): AreaLoads => ({
  ...DEFAULT_LOADS[plant.units],
  ...(plant.settings?.defaultLoads ?? {}),
});

export function presentPlant(plant: Plant, demo: boolean): PlantDetail {
  return {
    id: plant.id,
    name: plant.name,
    units: plant.units,
    demo,
    address: plant.address,
    defaultLoads: plantDefaultLoads(plant),
    designRules: { amplifyPanelPointMoment: designRulesOf(plant).amplifyPanelPointMoment },
  };
}
