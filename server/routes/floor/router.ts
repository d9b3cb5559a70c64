import { Router } from 'express';
import { Op } from 'sequelize';
import { z } from 'zod';
import { requireUser } from '../../middleware/auth';
import { validate } from '../../middleware/validate';
import { authorize } from '../../policies/predicates';
import { productionPolicy } from '../../policies/production';
import { lineCounts, recordProgress } from '../../commands/progress';
import { plantToday } from '../../commands/schedule';
import { settingsFor } from '../../commands/productionSettings';
import { Customer, Order, OrderLine, SchedulePlacement } from '../../models';
import { inspectionSchema, progressSchema, type FloorDay } from '../../../shared/api/production';
import { inspectionLog, recordInspection } from '../../commands/inspections';
import { renderDailySheet, type LumberByLine } from '../../services/dailySheet';
import { handle } from '../load';

const dayQuery = z.object({
  date: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date like 2027-03-01')
    .optional(),
});

/** Today's work per table, with each line's stage counts. */
export async function floorDay(plantId: number, date: string): Promise<FloorDay> {
  const { settings } = await settingsFor(plantId);
  const placements = await SchedulePlacement.findAll({
    where: { plantId, onDate: date },
    order: [['id', 'ASC']],
  });
  const lines = await OrderLine.findAll({
    where: { id: { [Op.in]: [...new Set(placements.map((p) => p.orderLineId))] } },
    attributes: { exclude: ['designInput', 'designResult'] },
    include: [
      {
        model: Order,
        as: 'order',
        attributes: ['id', 'number', 'customerId'],
        include: [{ model: Customer, as: 'customer', attributes: ['name'] }],
      },
    ],
  });
  const byId = new Map(lines.map((l) => [l.id, l]));
  return {
    date,
    tables: settings.tables.map((t) => ({
      id: t.id,
      name: t.name,
      lines: placements
        .filter((p) => p.tableId === t.id && byId.has(p.orderLineId))
        .map((p) => {
          const l = byId.get(p.orderLineId)!;
          return {
            lineId: l.id,
            orderId: l.order!.id,
            orderNumber: l.order!.number,
            customer: l.order!.customer?.name ?? '',
            mark: l.mark,
            description: l.description,
            quantity: l.quantity,
            plannedToday: p.quantity,
            counts: lineCounts(l),
          };
        }),
    })),
  };
}

/** The shop floor: today's work per table and progress taps. */
export function floorRouter() {
  const router = Router();

  router.get(
    '/today',
    requireUser,
    validate(dayQuery, 'query'),
    authorize(productionPolicy.floor),
    handle(async (req, res) => {
      const date = (res.locals.query as { date?: string }).date ?? plantToday();
      res.json(await floorDay(req.user!.plantId, date));
    }),
  );

  router.post(
    '/progress',
    requireUser,
    validate(progressSchema),
    authorize(productionPolicy.floor),
    handle(async (req, res) => {
      const { line, order, replayed } = await recordProgress(req.user!, res.locals.body);
      res.status(replayed ? 200 : 201).json({
        lineId: line.id,
        quantity: line.quantity,
        counts: lineCounts(line),
        orderStatus: order.status,
        replayed,
      });
    }),
  );

  router.get(
    '/sheet.pdf',
    requireUser,
    validate(dayQuery, 'query'),
    authorize(productionPolicy.floor),
    handle(async (req, res) => {
      const date = (res.locals.query as { date?: string }).date ?? plantToday();
      const day = await floorDay(req.user!.plantId, date);
      const ids = day.tables.flatMap((t) => t.lines.map((l) => l.lineId));
      const rows = await OrderLine.findAll({
        where: { id: { [Op.in]: ids } },
        attributes: ['id', 'designResult'],
      });
      const lumber: LumberByLine = new Map();
      for (const r of rows) {
        const pieces = (r.designResult.pieces ?? []) as { lumber: string }[];
        const count = new Map<string, number>();
        for (const p of pieces) count.set(p.lumber, (count.get(p.lumber) ?? 0) + 1);
        lumber.set(
          r.id,
          [...count].map(([k, n]) => `${k} × ${n}`),
        );
      }
      res
        .type('application/pdf')
        .set('Content-Disposition', `inline; filename="daily-sheet-${date}.pdf"`)
        .send(await renderDailySheet(day, lumber));
    }),
  );

  router.get(
    '/inspections',
    requireUser,
    authorize(productionPolicy.floor),
    handle(async (req, res) => {
      res.json(await inspectionLog(req.user!.plantId));
    }),
  );

  router.post(
    '/inspections',
    requireUser,
    validate(inspectionSchema),
    authorize(productionPolicy.floor),
    handle(async (req, res) => {
      await recordInspection(req.user!, res.locals.body);
      res.status(201).json(await inspectionLog(req.user!.plantId));
    }),
  );

  return router;
}
