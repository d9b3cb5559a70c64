import type { CreationAttributes, Model, ModelStatic, Transaction } from 'sequelize';
import type { User } from '../models';
import { audit } from './audit';

/** A one-per-plant settings document's row: its plant, its JSON data and who saved it last. */
type PlantDocument<D> = Model & { id: number; plantId: number; data: D; updatedBy: number | null };

/**
 * Store a plant's one settings document, replacing the previous one under a row lock, and audit
 * the before and after as `<kind>.saved`.
 */
export async function savePlantDocument<D, R extends PlantDocument<D>>(
  model: ModelStatic<R>,
  kind: string,
  actor: User,
  data: D,
  t: Transaction,
): Promise<R> {
  const existing = await model.findOne({
    where: { plantId: actor.plantId } as never,
    transaction: t,
    lock: t.LOCK.UPDATE,
  });
  const before = existing?.data ?? null;
  let row: R;
  if (existing) {
    await existing.update({ data, updatedBy: actor.id } as Partial<R>, { transaction: t });
    row = existing;
  } else {
    const values = { plantId: actor.plantId, data, updatedBy: actor.id };
    row = await model.create(values as unknown as CreationAttributes<R>, { transaction: t });
  }
  await audit(t, {
    plantId: actor.plantId,
    actorId: actor.id,
    action: `${kind}.saved`,
    subjectType: kind,
    subjectId: row.id,
    data: { before, after: data },
  });
  return row;
}
