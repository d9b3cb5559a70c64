import type { UpdateDesignRulesInput } from '../../shared/api/plant';
import { AppError } from '../errors';
import { Plant, type User } from '../models';
import { designRulesOf } from '../services/designRules';
import { audit } from './audit';

/**
 * The plant manager changes the plant's design rules: the plant row is locked, the version the
 * manager saw must still be current (409 `stale` otherwise), and the change is audited.
 */
export async function saveDesignRules(actor: User, input: UpdateDesignRulesInput) {
  return Plant.sequelize!.transaction(async (t) => {
    const plant = await Plant.findByPk(actor.plantId, { transaction: t, lock: t.LOCK.UPDATE });
    if (!plant) throw new AppError(404, 'not_found', 'Plant not found.');
    const before = designRulesOf(plant);
    if (before.version !== input.version) {
      throw new AppError(
        409,
        'stale',
        `The design rules changed since you opened them (now version ${before.version}). Reload and try again.`,
        { version: `Current version is ${before.version}` },
      );
    }
    const after = {
      amplifyPanelPointMoment: input.amplifyPanelPointMoment,
      version: before.version + 1,
    };
    await plant.update({ settings: { ...plant.settings, designRules: after } }, { transaction: t });
    await audit(t, {
      plantId: plant.id,
      actorId: actor.id,
      action: 'plant.design_rules_changed',
      subjectType: 'plant',
      subjectId: plant.id,
      data: { before, after },
    });
    return designRulesOf(plant);
  });
}
