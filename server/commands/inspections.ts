import { Op } from 'sequelize';
import type { InspectionInput } from '../../shared/api/production';
import { inspectionsDue, weekStart } from '../../shared/engine/schedule';
import { Inspection, Order, OrderLine, User } from '../models';
import { badRequest, notFound } from '../errors';
import { audit } from './audit';
import { settingsFor } from './productionSettings';
import { plantToday } from './schedule';

/** Log one inspection; it passes only when every check passes. Audited. */
export async function recordInspection(actor: User, input: InspectionInput) {
  const { settings } = await settingsFor(actor.plantId);
  if (!settings.tables.some((t) => t.id === input.tableId))
    throw badRequest('That station is not in the production settings.', {
      tableId: 'Unknown station',
    });
  if (input.lineId !== null) {
    const line = await OrderLine.findByPk(input.lineId, {
      attributes: ['id', 'orderId'],
      include: [{ model: Order, as: 'order', attributes: ['plantId'] }],
    });
    if (!line || line.order!.plantId !== actor.plantId) throw notFound('Truss line');
  }
  return Inspection.sequelize!.transaction(async (t) => {
    const row = await Inspection.create(
      {
        plantId: actor.plantId,
        tableId: input.tableId,
        orderLineId: input.lineId,
        truss: input.truss,
        checks: input.checks,
        passed: Object.values(input.checks).every(Boolean),
        notes: input.notes || null,
        inspectorId: actor.id,
      },
      { transaction: t },
    );
    await audit(t, {
      plantId: actor.plantId,
      actorId: actor.id,
      action: 'inspection.recorded',
      subjectType: 'inspection',
      subjectId: row.id,
      data: { tableId: row.tableId, truss: row.truss, passed: row.passed },
    });
    return row;
  });
}

/** The quality page: what each station still owes this week and the latest records. */
export async function inspectionLog(plantId: number, today = plantToday()) {
  const { settings } = await settingsFor(plantId);
  const since = weekStart(today);
  const thisWeek = await Inspection.findAll({
    where: { plantId, createdAt: { [Op.gte]: new Date(`${since}T00:00:00Z`) } },
    attributes: ['tableId'],
  });
  const done = new Map<number, number>();
  for (const i of thisWeek) done.set(i.tableId, (done.get(i.tableId) ?? 0) + 1);
  const recent = await Inspection.findAll({
    where: { plantId },
    include: [{ model: User, as: 'inspector', attributes: ['name'] }],
    order: [['createdAt', 'DESC']],
    limit: 50,
  });
  const names = new Map(settings.tables.map((t) => [t.id, t.name]));
  return {
    weekOf: since,
    stations: inspectionsDue(settings.tables, done).map((d) => ({
      ...d,
      name: names.get(d.tableId) ?? `Table ${d.tableId}`,
    })),
    records: recent.map((r) => ({
      id: r.id,
      at: r.createdAt.toISOString(),
      tableId: r.tableId,
      station: names.get(r.tableId) ?? `Table ${r.tableId}`,
      truss: r.truss,
      checks: r.checks,
      passed: r.passed,
      notes: r.notes,
      inspector: r.inspector?.name ?? null,
    })),
  };
}
